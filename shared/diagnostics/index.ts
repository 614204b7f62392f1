export { FAN_SAFETY_CAUTION, ATTIC_SAFETY_CAUTION, ROOF_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "./cautions";
export { FanDiagnosticsSchema, ThermostatTestSchema, type FanDiagnostics, type ThermostatTest } from "./schema";
export {
  checkPowerVerifiedOff,
  interpretWindingResistance,
  interpretThermostatTest,
  interpretBladeSpin,
  diagnoseFan,
  WINDING_PLAUSIBLE_MAX_OHMS,
  WINDING_OPEN_MIN_OHMS,
  SWITCHED_LEG_LIVE_MIN_V,
  SWITCHED_LEG_DEAD_MAX_V,
  TYPICAL_SET_POINT_F,
} from "./fan-diagnostics";
