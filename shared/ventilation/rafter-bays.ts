/**
 * Enclosed rafter spaces (cathedral ceilings, ceilings applied directly to the rafters): each bay
 * between two rafters is its own space and needs cross ventilation of its own — intake low and
 * exhaust high in that bay — IRC R806.1 [SOURCES.md S1, S16 quote the text]. The required net free
 * area applies per bay: the bay's share of the ceiling area ÷ the ratio (R806.2).
 *
 * How vents reach bays (stated in the reasons): a linear vent (continuous soffit, ridge, drip edge,
 * fascia) runs across the bays it is long enough to cross, at the bay spacing; an individual vent
 * serves one bay per unit. A bay with no intake or no exhaust is not ventilated at all.
 */
import { formatNumber, SQ_IN_PER_SQ_FT } from "../units/format";
import type { Vent } from "./schema";
import type { VentNfa } from "./vent-nfa";

const LINEAR_KINDS = new Set(["soffit-continuous", "ridge", "drip-edge", "fascia"]);

export interface RafterBayCheck {
  bayCount: number;
  baySpacingIn: number;
  bayAreaSqFt: number;
  /** Exact NFA each bay needs at the requirement's ratio, sq in. */
  requiredPerBaySqIn: number;
  baysWithIntake: number;
  baysWithExhaust: number;
  /** The smallest intake + exhaust NFA any ventilated bay gets, sq in. */
  leastPerBaySqIn: number;
  isMet: boolean;
  reasons: string[];
}

/** How many bays a vent reaches, and the NFA it gives each of them. */
function reach(vent: Vent, nfa: VentNfa, bayCount: number, baySpacingIn: number): { bays: number; perBaySqIn: number } {
  if (nfa.exactNfaSqIn <= 0) return { bays: 0, perBaySqIn: 0 };
  const quantity = vent.quantity ?? 1;
  if (LINEAR_KINDS.has(vent.kind) && vent.lengthFt !== undefined) {
    const bays = Math.min(bayCount, Math.floor((vent.lengthFt * 12 * quantity) / baySpacingIn + 1e-9));
    const perFt = nfa.exactNfaSqIn / (vent.lengthFt * quantity);
    return { bays, perBaySqIn: perFt * (baySpacingIn / 12) };
  }
  const bays = Math.min(bayCount, quantity);
  return { bays, perBaySqIn: nfa.exactNfaSqIn / quantity };
}

/**
 * @example
 * // 10 bays at 24 in under 400 sq ft: 40 sq ft a bay, 38.4 sq in each at 1/150
 * checkRafterBays({ bayCount: 10, baySpacingIn: 24 }, 400, 150, []).requiredPerBaySqIn // 38.4
 */
export function checkRafterBays(
  bays: { bayCount: number; baySpacingIn: number },
  floorAreaSqFt: number,
  ratio: number,
  vents: ReadonlyArray<{ vent: Vent; nfa: VentNfa }>,
): RafterBayCheck {
  const { bayCount, baySpacingIn } = bays;
  const bayAreaSqFt = floorAreaSqFt / bayCount;
  const requiredPerBaySqIn = (bayAreaSqFt * SQ_IN_PER_SQ_FT) / ratio;
  // Bays are filled in order by each vent; the least-served bay is the one that decides.
  const intakePerBay = new Array<number>(bayCount).fill(0);
  const exhaustPerBay = new Array<number>(bayCount).fill(0);
  for (const { vent, nfa } of vents) {
    if (nfa.isPowered || nfa.isWholeHouseFan) continue;
    const r = reach(vent, nfa, bayCount, baySpacingIn);
    const target = vent.location === "lower" ? intakePerBay : exhaustPerBay;
    for (let i = 0; i < r.bays; i += 1) target[i]! += r.perBaySqIn;
  }
  const baysWithIntake = intakePerBay.filter((v) => v > 0).length;
  const baysWithExhaust = exhaustPerBay.filter((v) => v > 0).length;
  const totals = intakePerBay.map((v, i) => v + exhaustPerBay[i]!);
  const leastPerBaySqIn = Math.min(...totals);
  const isCrossVented = baysWithIntake === bayCount && baysWithExhaust === bayCount;
  const isMet = isCrossVented && leastPerBaySqIn >= requiredPerBaySqIn * (1 - 1e-12);
  const reasons = [
    `Enclosed rafter bays: ${formatNumber(bayCount)} bays at ${formatNumber(baySpacingIn)} in, each its own space (IRC R806.1): ${formatNumber(floorAreaSqFt)} sq ft ÷ ${formatNumber(bayCount)} = ${formatNumber(bayAreaSqFt)} sq ft a bay, needing ${formatNumber(bayAreaSqFt)} ÷ ${ratio} × 144 = ${formatNumber(requiredPerBaySqIn)} sq in.`,
    `${formatNumber(baysWithIntake)} of ${formatNumber(bayCount)} bays have intake and ${formatNumber(baysWithExhaust)} have exhaust; the least-vented bay gets ${formatNumber(leastPerBaySqIn)} sq in. A linear vent counts in the bays its length crosses; an individual vent serves one bay.`,
  ];
  return { bayCount, baySpacingIn, bayAreaSqFt, requiredPerBaySqIn, baysWithIntake, baysWithExhaust, leastPerBaySqIn, isMet, reasons };
}
