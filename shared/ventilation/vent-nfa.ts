/**
 * Net free area of each recorded vent. NFA is the open area air can pass through after screens,
 * louvers and baffles (the figure R806.2 counts). Powered fans are mechanical: they are rated in
 * cfm and contribute no NFA here [issue 3; HVI treats them separately, S6].
 */
import { formatNumber, roundTo } from "../units/format";
import { coveringFactor, describeCovering } from "./covering-factors";
import type { Vent, VentLocation } from "./schema";
import { isPoweredKind, isWholeHouseFanKind, type VentKind } from "./vent-kinds";

export interface VentNfa {
  ventId: string;
  /** The estimator's name for the vent, if any ("north gable"); used in sentences instead of the id. */
  label?: string;
  kind: VentKind;
  location: VentLocation;
  /** A powered attic fan (not a whole-house fan). */
  isPowered: boolean;
  /** A whole-house fan: it blows house air into the attic; no net free area. */
  isWholeHouseFan: boolean;
  /** Net free area of the whole entry (all units), sq in, rounded to 0.01 for display; 0 for powered fans. */
  nfaSqIn: number;
  /** The same, unrounded: the figure the code checks compare (a verdict is never rounded). */
  exactNfaSqIn: number;
  /** NFA as if every unit were open, sq in (0.01); differs from nfaSqIn when the condition blocks some. */
  fullNfaSqIn: number;
  /** Share of the vent's area that counts, 0–1, from its condition. */
  openShare: number;
  /** Rated airflow of the whole entry (all units), cfm; 0 for passive vents. */
  airflowCfm: number;
  /** The arithmetic in words, e.g. "40 ft × 18 sq in per ft = 720 sq in". */
  explanation: string;
}

/**
 * @example
 * ventNfa({ id: "g1", kind: "gable-louver", location: "upper", grossWidthIn: 14, grossHeightIn: 24, covering: { mesh: "1/8", louvers: true } }).nfaSqIn
 * // 149.33  (336 sq in ÷ 2.25)
 */
export function ventNfa(vent: Vent): VentNfa {
  const quantity = vent.quantity ?? 1;

  if (isWholeHouseFanKind(vent.kind) || isPoweredKind(vent.kind)) {
    const isWholeHouseFan = isWholeHouseFanKind(vent.kind);
    const airflowCfm = quantity * (vent.cfm ?? 0);
    const rated = timesQuantity(quantity, `${formatNumber(vent.cfm ?? 0)} cfm`);
    const total = quantity > 1 ? ` = ${formatNumber(airflowCfm)} cfm` : "";
    const why = isWholeHouseFan ? "a whole-house fan blows house air into the attic and adds no net free area" : "a powered fan is mechanical and adds no net free area";
    return nfaEntry(vent, !isWholeHouseFan, isWholeHouseFan, 0, 0, 0, 1, airflowCfm, `${rated}${total}; ${why}`);
  }

  let exactSqIn: number;
  let explanation: string;
  if (vent.nfaSqIn !== undefined) {
    exactSqIn = quantity * vent.nfaSqIn;
    explanation = `rated ${timesQuantity(quantity, `${formatNumber(vent.nfaSqIn)} sq in`)}`;
  } else if (vent.nfaSqInPerUnit !== undefined) {
    exactSqIn = quantity * vent.nfaSqInPerUnit;
    explanation = timesQuantity(quantity, `${formatNumber(vent.nfaSqInPerUnit)} sq in`);
  } else if (vent.lengthFt !== undefined && vent.nfaSqInPerFt !== undefined) {
    exactSqIn = quantity * vent.lengthFt * vent.nfaSqInPerFt;
    explanation = timesQuantity(quantity, `${formatNumber(vent.lengthFt)} ft × ${formatNumber(vent.nfaSqInPerFt)} sq in per ft`);
  } else if (vent.grossWidthIn !== undefined && vent.grossHeightIn !== undefined && vent.covering !== undefined) {
    const grossSqIn = vent.grossWidthIn * vent.grossHeightIn;
    const factor = coveringFactor(vent.covering);
    exactSqIn = (quantity * grossSqIn) / factor;
    explanation = timesQuantity(
      quantity,
      `${formatNumber(vent.grossWidthIn)} in × ${formatNumber(vent.grossHeightIn)} in = ${formatNumber(grossSqIn)} sq in gross ÷ ${formatNumber(factor)} (${describeCovering(vent.covering)})`,
    );
  } else {
    // Unreachable for schema-valid input; kept finite on purpose.
    exactSqIn = 0;
    explanation = "no size recorded";
  }
  const fullNfaSqIn = roundTo(exactSqIn, 2);
  if (vent.condition === undefined || vent.condition === "open" || vent.condition === "damaged") {
    // All of it counts (conditionShare's answer for these, without building it for every vent).
    return nfaEntry(vent, false, false, fullNfaSqIn, exactSqIn, fullNfaSqIn, 1, 0, `${explanation} = ${formatNumber(fullNfaSqIn)} sq in`);
  }
  const { openShare, words } = conditionShare(vent, quantity);
  const countedExactSqIn = exactSqIn * openShare;
  const nfaSqIn = roundTo(countedExactSqIn, 2);
  const counted = openShare === 1 ? `${explanation} = ${formatNumber(nfaSqIn)} sq in` : `${explanation} = ${formatNumber(fullNfaSqIn)} sq in; ${words}: ${formatNumber(nfaSqIn)} sq in counted`;
  return nfaEntry(vent, false, false, nfaSqIn, countedExactSqIn, fullNfaSqIn, openShare, 0, counted);
}

/** "6 × 25 sq in" for several units, the size alone for one. */
function timesQuantity(quantity: number, each: string): string {
  return quantity > 1 ? `${formatNumber(quantity)} × ${each}` : each;
}

/**
 * One entry as a plain literal (object spreads cost microseconds each in Node 20, issue 17); the
 * label, when there is one, sits after the location, as it always has in the JSON.
 */
function nfaEntry(
  vent: Vent,
  isPowered: boolean,
  isWholeHouseFan: boolean,
  nfaSqIn: number,
  exactNfaSqIn: number,
  fullNfaSqIn: number,
  openShare: number,
  airflowCfm: number,
  explanation: string,
): VentNfa {
  return vent.label
    ? { ventId: vent.id, kind: vent.kind, location: vent.location, label: vent.label, isPowered, isWholeHouseFan, nfaSqIn, exactNfaSqIn, fullNfaSqIn, openShare, airflowCfm, explanation }
    : { ventId: vent.id, kind: vent.kind, location: vent.location, isPowered, isWholeHouseFan, nfaSqIn, exactNfaSqIn, fullNfaSqIn, openShare, airflowCfm, explanation };
}

const BLOCKED_BY_WORDS: Record<NonNullable<Vent["blockedBy"]>, string> = {
  insulation: "insulation",
  paint: "paint",
  debris: "debris",
  nest: "a nest",
  other: "something",
};

/**
 * How much of a vent counts, from its condition: blocked or painted over → none; partly blocked →
 * the open units ("4 of 10 blocked" → 6/10) or the open share; open or damaged → all of it (a
 * damaged vent still passes air; its finding asks for the repair).
 *
 * @example
 * conditionShare({ id: "s", kind: "soffit-individual", location: "lower", nfaSqInPerUnit: 50, quantity: 10, condition: "partly-blocked", blockedQuantity: 4, blockedBy: "insulation" }, 10)
 * // { openShare: 0.6, words: "4 of 10 blocked by insulation, so 6 of 10 count" }
 */
export function conditionShare(vent: Vent, quantity: number): { openShare: number; words: string } {
  const by = vent.blockedBy ? ` by ${BLOCKED_BY_WORDS[vent.blockedBy]}` : "";
  switch (vent.condition) {
    case "blocked":
      return { openShare: 0, words: `blocked${by}, so none of it counts` };
    case "painted-over":
      return { openShare: 0, words: "painted over, so none of it counts" };
    case "partly-blocked":
      if (vent.blockedQuantity !== undefined) {
        const blocked = Math.min(vent.blockedQuantity, quantity);
        return { openShare: (quantity - blocked) / quantity, words: `${formatNumber(blocked)} of ${formatNumber(quantity)} blocked${by}, so ${formatNumber(quantity - blocked)} of ${formatNumber(quantity)} count` };
      }
      if (vent.blockedShare !== undefined) {
        return { openShare: 1 - vent.blockedShare, words: `${formatNumber(vent.blockedShare * 100)} % blocked${by}, so ${formatNumber((1 - vent.blockedShare) * 100)} % counts` };
      }
      return { openShare: 1, words: "" };
    default:
      return { openShare: 1, words: "" };
  }
}
