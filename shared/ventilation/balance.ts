/**
 * Provided net free area split into intake (low) and exhaust (high), and the balance as the
 * intake share of the total. Keeping intake ≥ exhaust is the aim: the 2012+ 1/300 route caps
 * upper vents at 50 % [SOURCES.md §1], BC Housing advises more at the soffit than the ridge
 * when venting can't be balanced [S18], and HVI asks for inlet area for fans [S6].
 */
import { roundTo } from "../units/format";
import type { VentNfa } from "./vent-nfa";

export interface ProvidedNfa {
  /** Passive NFA of low (intake) vents, sq in. */
  intakeSqIn: number;
  /** Passive NFA of high (exhaust) vents, sq in. */
  exhaustSqIn: number;
  /** intake + exhaust, sq in, rounded to 0.01 for display. Powered fans add nothing. */
  totalSqIn: number;
  /** Unrounded sums: what the code checks compare with the exact requirement. */
  exactIntakeSqIn: number;
  exactExhaustSqIn: number;
  exactTotalSqIn: number;
  /** intake ÷ total, 0–1; null when there is no passive vent area. */
  intakeShare: number | null;
  /** Installed powered attic-fan airflow, cfm. */
  poweredCfm: number;
  /** Installed whole-house fan airflow, cfm (blown INTO the attic). */
  wholeHouseFanCfm: number;
  perVent: VentNfa[];
}

/**
 * @example
 * providedNfa([
 *   { ventId: "s", kind: "soffit-continuous", location: "lower", isPowered: false, isWholeHouseFan: false, nfaSqIn: 720, exactNfaSqIn: 720, airflowCfm: 0, explanation: "" },
 *   { ventId: "r", kind: "ridge", location: "upper", isPowered: false, isWholeHouseFan: false, nfaSqIn: 480, exactNfaSqIn: 480, airflowCfm: 0, explanation: "" },
 * ]) // { intakeSqIn: 720, exhaustSqIn: 480, totalSqIn: 1200, intakeShare: 0.6, … }
 */
/**
 * Does the provided area meet a required area? "Not less than" (IRC R806.2): exact figures are
 * compared; the only allowance is for binary floating-point noise (a relative 1e-12), never a
 * rounding of either side.
 *
 * @example
 * meetsRequiredArea(1185.5, 1185.12) // true, though 1,185.5 < the 1,186 sq in bought
 * meetsRequiredArea(1185.119, 1185.12) // false
 */
export function meetsRequiredArea(providedSqIn: number, requiredSqIn: number): boolean {
  return providedSqIn >= requiredSqIn - Math.abs(requiredSqIn) * 1e-12;
}

export function providedNfa(perVent: VentNfa[]): ProvidedNfa {
  let intake = 0;
  let exhaust = 0;
  let poweredCfm = 0;
  let wholeHouseFanCfm = 0;
  for (const v of perVent) {
    if (v.isWholeHouseFan) wholeHouseFanCfm += v.airflowCfm;
    else if (v.isPowered) poweredCfm += v.airflowCfm;
    else if (v.location === "lower") intake += v.exactNfaSqIn;
    else exhaust += v.exactNfaSqIn;
  }
  const intakeSqIn = roundTo(intake, 2);
  const exhaustSqIn = roundTo(exhaust, 2);
  const totalSqIn = roundTo(intake + exhaust, 2);
  return {
    intakeSqIn,
    exhaustSqIn,
    totalSqIn,
    exactIntakeSqIn: intake,
    exactExhaustSqIn: exhaust,
    exactTotalSqIn: intake + exhaust,
    intakeShare: totalSqIn > 0 ? intakeSqIn / totalSqIn : null,
    poweredCfm,
    wholeHouseFanCfm,
    perVent,
  };
}
