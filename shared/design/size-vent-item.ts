/**
 * How much of one catalog vent gives a needed net free area, in what is bought: a linear vent in
 * whole pieces where the roof has room (else whole feet up to the room there is), an "each" vent
 * in whole units. Needed areas are always rounded up (SOURCES.md §8 E3).
 */
import type { CatalogItem } from "../schemas/catalog";
import { formatNumber } from "../units/format";
import { piecesToBuy } from "./bought-quantity";

export interface VentRoom {
  /** Room on the roof: feet for a linear vent, a count for an "each" vent. */
  amount: number;
  /** Where the room comes from, in words. */
  explanation: string;
}

export type SizeResult =
  | { fits: true; quantity: number; nfaSqIn: number; explanation: string }
  | { fits: false; reason: string };

const NOISE = 1e-9;

/**
 * @example
 * // 360 sq in from ridge vent at 18 sq in/ft, sold in 4 ft pieces, 39 ft of ridge usable
 * sizeVentItem(ridgeItem, 360, { amount: 39, explanation: "…" })
 * // { fits: true, quantity: 20, nfaSqIn: 360, explanation: "… 360 ÷ 18 = 20 ft; bought in 4 ft pieces: 5 pieces = 20 ft …" }
 */
export function sizeVentItem(item: CatalogItem, neededSqIn: number, room: VentRoom): SizeResult {
  if (neededSqIn <= NOISE) return { fits: true, quantity: 0, nfaSqIn: 0, explanation: `${item.name}: nothing more is needed.` };
  if (item.unit === "linear-ft" && item.nfaSqInPerFt !== null) {
    const perFt = item.nfaSqInPerFt;
    const neededFt = Math.ceil(neededSqIn / perFt - NOISE);
    const head = `${item.name} gives ${formatNumber(perFt)} sq in per ft: ${formatNumber(neededSqIn)} ÷ ${formatNumber(perFt)} = ${formatNumber(neededSqIn / perFt)} → ${formatNumber(neededFt)} ft`;
    if (neededFt > room.amount + NOISE) {
      return {
        fits: false,
        reason: `${head}, but only ${formatNumber(room.amount)} ft is available (${room.explanation}), giving ${formatNumber(Math.floor(room.amount) * perFt)} sq in.`,
      };
    }
    let quantity = neededFt;
    let pieceWords = "";
    if (item.soldInLengthFt !== null) {
      const pieces = piecesToBuy(neededFt, item.soldInLengthFt);
      const wholePiecesFt = pieces * item.soldInLengthFt;
      if (wholePiecesFt <= room.amount + NOISE) {
        quantity = wholePiecesFt;
        pieceWords = `; bought in ${formatNumber(item.soldInLengthFt)} ft pieces: ${formatNumber(pieces)} × ${formatNumber(item.soldInLengthFt)} = ${formatNumber(wholePiecesFt)} ft, all installed`;
      } else {
        quantity = Math.max(neededFt, Math.floor(room.amount + NOISE));
        pieceWords = `; ${formatNumber(pieces)} pieces of ${formatNumber(item.soldInLengthFt)} ft would be ${formatNumber(wholePiecesFt)} ft, more than the ${formatNumber(room.amount)} ft there is, so ${formatNumber(quantity)} ft is installed and the last piece is cut`;
      }
    }
    const nfaSqIn = quantity * perFt;
    return {
      fits: true,
      quantity,
      nfaSqIn,
      explanation: `${head}${pieceWords}; ${formatNumber(room.amount)} ft available (${room.explanation}). ${formatNumber(quantity)} ft × ${formatNumber(perFt)} = ${formatNumber(nfaSqIn)} sq in.`,
    };
  }
  if (item.unit === "each" && item.nfaSqInPerUnit !== null) {
    const per = item.nfaSqInPerUnit;
    const count = Math.ceil(neededSqIn / per - NOISE);
    const head = `${item.name} gives ${formatNumber(per)} sq in each: ${formatNumber(neededSqIn)} ÷ ${formatNumber(per)} = ${formatNumber(neededSqIn / per)} → ${formatNumber(count)}`;
    if (count > room.amount + NOISE) {
      return { fits: false, reason: `${head}, but there is room for only ${formatNumber(room.amount)} (${room.explanation}).` };
    }
    return {
      fits: true,
      quantity: count,
      nfaSqIn: count * per,
      explanation: `${head}; room for ${formatNumber(room.amount)} (${room.explanation}). ${formatNumber(count)} × ${formatNumber(per)} = ${formatNumber(count * per)} sq in.`,
    };
  }
  return { fits: false, reason: `${item.name} has no NFA rating for its unit (${item.unit}) in the catalog.` };
}
