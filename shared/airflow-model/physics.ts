/**
 * Physical constants and the model's stated assumptions, each with where it comes from. The model
 * works in SI inside (Pa, m, m³/s) and answers in the trade's units (cfm, sq in, ft, °F).
 *
 * Sources:
 * - ASHRAE Handbook — Fundamentals (1997), ch. 25 "Ventilation and infiltration": the orifice
 *   equation Q = C_D·A·√(2·ΔP/ρ) and the stack-flow equation 37, Q = C_D·A·√(2·g·ΔH_NPL·(T_i − T_o)/T_i),
 *   with ΔH_NPL the height from the middle of the lower opening to the neutral pressure level.
 *   (Equation and variables verified against a published quotation of that page; the chapter is
 *   ch. 16 in later editions.)
 * - Values marked "from memory" were not checked against a source here; they are stated in every
 *   result's assumptions so the reader can judge them.
 */
import { CU_M_PER_CU_FT, M_PER_FT, SQ_CM_PER_SQ_IN } from "../units/format";

/** Standard gravity, m/s² (exact by definition, CGPM 1901). */
export const GRAVITY_M_PER_S2 = 9.80665;
/** Specific gas constant of dry air, J/(kg·K). */
export const DRY_AIR_GAS_CONSTANT = 287.05;
/** Sea-level standard atmosphere, Pa. */
export const SEA_LEVEL_PRESSURE_PA = 101_325;

export const SQ_M_PER_SQ_IN = SQ_CM_PER_SQ_IN / 10_000;
export const CU_M_PER_S_PER_CFM = CU_M_PER_CU_FT / 60;
export const M_PER_S_PER_MPH = 0.44704; // exact: 1 mi = 1609.344 m, 1 h = 3600 s
export { M_PER_FT };

/**
 * Discharge coefficient of a vent, applied to its net free area. 0.61 is the classic sharp-edged
 * orifice value (the jet contracts to about 61 % of the hole: the vena contracta); ASHRAE's
 * natural-ventilation examples use 0.6–0.65 for openings in walls (from memory). Vent openings
 * are short, sharp-edged slots and holes, and NFA already takes screens and louvres out of the
 * gross area, so the plain-orifice figure is the fitting one: a higher figure (a rounded nozzle,
 * 0.9+) would overstate every vent.
 */
export const VENT_DISCHARGE_COEFFICIENT = 0.61;

/**
 * An effective leakage area (ELA) is, by its definition in blower-door practice, the area of a
 * hole with a discharge coefficient of 1 that passes the same air at 4 Pa (the LBL convention,
 * ASHRAE Fundamentals ch. 25 — from memory). So ceiling and house leakage enter the orifice
 * equation with C_D·A = ELA.
 */
export const ELA_REFERENCE_PA = 4;
/** Flow exponent of a house's cracks and gaps in a blower-door test; 0.65 is the usual default (from memory). */
export const LEAKAGE_FLOW_EXPONENT = 0.65;
export const BLOWER_DOOR_TEST_PA = 50;

/**
 * Leakage when neither a leakage area nor a blower-door figure was entered, per sq ft of ceiling
 * (common practice estimates; not from a source):
 * - the ceiling of a house whose attic floor was never air-sealed: 0.025 sq in per sq ft (a
 *   1,500 sq ft ceiling ≈ 38 sq in, about the top plates, light boxes, the hatch and plumbing holes);
 * - an air-sealed ceiling: 0.008 sq in per sq ft;
 * - the rest of the house (walls, windows, doors, floor): 0.05 sq in per sq ft of ceiling.
 * Together about 110 sq in for 1,500 sq ft, a blower-door figure near 2,000 CFM50: an older,
 * ordinary house, neither tight nor very leaky.
 */
export const DEFAULT_CEILING_ELA_SQ_IN_PER_SQ_FT = 0.025;
export const DEFAULT_SEALED_CEILING_ELA_SQ_IN_PER_SQ_FT = 0.008;
export const DEFAULT_HOUSE_ELA_SQ_IN_PER_SQ_FT = 0.05;
/** Share of a blower-door figure taken to be in the ceiling when only CFM50 is known (common practice: about a third). */
export const CEILING_SHARE_OF_HOUSE_LEAKAGE = 1 / 3;

/** One storey, floor to ceiling, when the house height is not given (ft). */
export const DEFAULT_HOUSE_HEIGHT_FT = 8;
/** Rise from the ceiling plane to the ridge when the roof's pitch was not recorded (ft): a 24 ft span at 6/12. */
export const DEFAULT_RISE_FT = 6;
/** Where a high vent that is not at the ridge sits, as a share of the rise, when its height was not recorded. */
export const DEFAULT_HIGH_VENT_SHARE_OF_RISE = 0.75;
/** Attic mean height used for the volume when pitch or span is missing (ft): HVI's area rule implies 4.2 ft (TRADE-REFERENCES §3). */
export const DEFAULT_ATTIC_MEAN_HEIGHT_FT = 4.2;

/**
 * A straight-line fan curve: the rated cfm at no back-pressure, falling to nothing at 0.2 in. of
 * water (about 50 Pa). That is a typical shape for the propeller fans of attic ventilators (from
 * memory); a fan's own published curve would be better and is not in the survey.
 */
export const FAN_SHUTOFF_PA = 49.8;
/** Thermostat set point assumed when a thermostat-controlled fan has none recorded (°F, common practice). */
export const DEFAULT_FAN_SET_POINT_F = 100;

/**
 * Wind pressure coefficients by roof position, wind square to the eaves (from memory: typical
 * low-rise values of the kind ASHRAE Fundamentals' chapter on airflow around buildings plots).
 * Vents whose side is not recorded are split half windward, half leeward.
 */
export const WIND_PRESSURE_COEFFICIENTS = {
  eaveWindward: 0.5,
  eaveLeeward: -0.3,
  ridge: -0.6,
  slopeWindward: -0.2,
  slopeLeeward: -0.5,
  gableEnd: -0.5,
  wallWindward: 0.6,
  wallLeeward: -0.3,
} as const;

/**
 * How far below outdoors the room with a natural-draft (atmospheric) appliance may be pulled
 * before it risks spilling flue gas: the combustion-appliance-zone (CAZ) limits of home-
 * performance testing (BPI's combustion safety tables, from memory; not verified here):
 * an orphan natural-draft water heater −2 Pa; natural-draft furnace or boiler sharing a vent with
 * a water heater −3 Pa; a natural-draft appliance alone −5 Pa; fan-assisted −15 Pa. The survey
 * records only "an atmospheric appliance", so the strictest, −2 Pa, applies.
 */
export const CAZ_LIMIT_NATURAL_DRAFT_PA = -2;

/** Air density from temperature at sea-level pressure (ideal gas), kg/m³. */
export function airDensityKgPerM3(tempF: number): number {
  return SEA_LEVEL_PRESSURE_PA / (DRY_AIR_GAS_CONSTANT * kelvinFromF(tempF));
}

export function kelvinFromF(tempF: number): number {
  return ((tempF - 32) * 5) / 9 + 273.15;
}
