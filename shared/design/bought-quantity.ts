/**
 * What is bought for a designed quantity: linear products come in pieces (`soldInLengthFt`, e.g.
 * ridge vent in 4 ft pieces), so the length is rounded up to whole pieces; a linear product with
 * no piece length is bought by the whole foot; "each" items in whole units (common practice: you
 * can cut a piece shorter, you can't buy part of one). Float noise below 1e-9 is ignored so that
 * 40 ft of 4 ft pieces is 10 pieces, never 11.
 */
import type { CatalogItem } from "../schemas/catalog";
import { formatNumber } from "../units/format";

const NOISE = 1e-9;

/**
 * @example
 * piecesToBuy(38, 4) // 10  (38 ÷ 4 = 9.5 → 10 pieces = 40 ft)
 * piecesToBuy(40, 4) // 10
 */
export function piecesToBuy(lengthFt: number, soldInLengthFt: number): number {
  if (!(soldInLengthFt > 0)) throw new RangeError("A piece length must be more than 0 ft.");
  if (!(lengthFt > 0)) return 0;
  return Math.ceil(lengthFt / soldInLengthFt - NOISE);
}

export interface BoughtQuantity {
  /** How many are bought: pieces, whole feet, whole units, or hours as given. */
  count: number;
  /** "pieces of 4 ft", "ft", "each" or "h". */
  unitWords: string;
  /** The designed length covered by what is bought, ft (linear items only). */
  boughtLengthFt: number | null;
  /** e.g. "38 ft needed ÷ 4 ft pieces = 9.5 → 10 pieces (40 ft)". */
  explanation: string;
}

/**
 * @example
 * boughtQuantity({ unit: "linear-ft", soldInLengthFt: 4 }, 38)
 * // { count: 10, unitWords: "pieces of 4 ft", boughtLengthFt: 40, explanation: "38 ft needed ÷ 4 ft pieces = 9.5 → 10 pieces (40 ft)" }
 */
export function boughtQuantity(item: Pick<CatalogItem, "unit" | "soldInLengthFt">, quantity: number): BoughtQuantity {
  if (item.unit === "linear-ft") {
    if (item.soldInLengthFt !== null) {
      const pieces = piecesToBuy(quantity, item.soldInLengthFt);
      const exact = quantity / item.soldInLengthFt;
      const isWhole = Math.abs(exact - Math.round(exact)) < NOISE;
      return {
        count: pieces,
        unitWords: `pieces of ${formatNumber(item.soldInLengthFt)} ft`,
        boughtLengthFt: pieces * item.soldInLengthFt,
        explanation: `${formatNumber(quantity)} ft needed ÷ ${formatNumber(item.soldInLengthFt)} ft pieces = ${formatNumber(exact, { maxFractionDigits: 3 })}${isWhole ? "" : ` → ${formatNumber(pieces)}`} pieces (${formatNumber(pieces * item.soldInLengthFt)} ft)`,
      };
    }
    const feet = Math.ceil(quantity - NOISE);
    return {
      count: feet,
      unitWords: "ft",
      boughtLengthFt: feet,
      explanation: feet === quantity ? `${formatNumber(feet)} ft` : `${formatNumber(quantity)} ft needed → ${formatNumber(feet)} whole ft`,
    };
  }
  if (item.unit === "hour") {
    return { count: quantity, unitWords: "h", boughtLengthFt: null, explanation: `${formatNumber(quantity)} h` };
  }
  const units = Math.ceil(quantity - NOISE);
  return {
    count: units,
    unitWords: "each",
    boughtLengthFt: null,
    explanation: units === quantity ? `${formatNumber(units)} each` : `${formatNumber(quantity)} needed → ${formatNumber(units)} whole units`,
  };
}
