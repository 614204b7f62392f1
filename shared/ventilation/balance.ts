/**
 * Provided net free area split into intake (low) and exhaust (high), and the balance as the
 * intake share of the total. Keeping intake ≥ exhaust is the aim: the 2012+ 1/300 route caps
 * upper vents at 50 % [TRADE-REFERENCES §1], BC Housing advises more at the soffit than the ridge
 * when venting can't be balanced [SRC 18], and HVI asks for inlet area for fans [SRC 6].
 */
import { roundTo } from "../units/format";
import type { VentNfa } from "./vent-nfa";

export interface ProvidedNfa {
  /** Passive NFA of low (intake) vents, sq in. */
  intakeSqIn: number;
  /** Passive NFA of high (exhaust) vents, sq in. */
  exhaustSqIn: number;
  /** intake + exhaust, sq in. Powered fans add nothing. */
  totalSqIn: number;
  /** intake ÷ total, 0–1; null when there is no passive vent area. */
  intakeShare: number | null;
  /** Installed powered-fan airflow, cfm. */
  poweredCfm: number;
  perVent: VentNfa[];
}

/**
 * @example
 * providedNfa([
 *   { ventId: "s", kind: "soffit-continuous", location: "lower", isPowered: false, nfaSqIn: 720, airflowCfm: 0, explanation: "" },
 *   { ventId: "r", kind: "ridge", location: "upper", isPowered: false, nfaSqIn: 480, airflowCfm: 0, explanation: "" },
 * ]) // { intakeSqIn: 720, exhaustSqIn: 480, totalSqIn: 1200, intakeShare: 0.6, … }
 */
export function providedNfa(perVent: VentNfa[]): ProvidedNfa {
  let intake = 0;
  let exhaust = 0;
  let poweredCfm = 0;
  for (const v of perVent) {
    if (v.isPowered) poweredCfm += v.airflowCfm;
    else if (v.location === "lower") intake += v.nfaSqIn;
    else exhaust += v.nfaSqIn;
  }
  const intakeSqIn = roundTo(intake, 2);
  const exhaustSqIn = roundTo(exhaust, 2);
  const totalSqIn = roundTo(intake + exhaust, 2);
  return {
    intakeSqIn,
    exhaustSqIn,
    totalSqIn,
    intakeShare: totalSqIn > 0 ? intakeSqIn / totalSqIn : null,
    poweredCfm,
    perVent,
  };
}
