export { FAN_SAFETY_CAUTION, ATTIC_SAFETY_CAUTION, ROOF_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION, CAPACITOR_CAUTION } from "./cautions";
export { FanDiagnosticsSchema, ThermostatTestSchema, CapacitorReadingSchema, type FanDiagnostics, type ThermostatTest, type CapacitorReading } from "./schema";
export {
  checkPowerVerifiedOff,
  interpretWindingResistance,
  interpretWindingToGround,
  interpretCapacitor,
  interpretThermostatTest,
  interpretBladeSpin,
  diagnoseFan,
  WINDING_SHORT_BELOW_OHMS,
  WINDING_PLAUSIBLE_MAX_OHMS,
  WINDING_OPEN_MIN_OHMS,
  GROUND_INSULATION_MIN_OHMS,
  DEFAULT_CAPACITOR_TOLERANCE_PERCENT,
  SWITCHED_LEG_LIVE_MIN_V,
  SWITCHED_LEG_DEAD_MAX_V,
  TYPICAL_SET_POINT_F,
} from "./fan-diagnostics";
export { fanControlFindings, COLD_CLIMATE_MIN_ZONE, SET_POINT_LOW_F, SET_POINT_HIGH_F } from "./fan-controls";
