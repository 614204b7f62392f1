import { lineTotalCents } from "../pricing/line-total";
import { taxCents } from "../pricing/tax";
import type { ChangeOrderLine, ChangeOrderTotals } from "./types";

/**
 * The money of one change order: added lines and removed lines priced as the proposal prices a
 * line (unit price × quantity, rounded half up to the cent), each side taxed at the signed
 * revision's rate, and the net change of the job total. Removals give money back, so the change
 * may be negative. Integer cents throughout.
 *
 * @example
 * changeOrderTotals([
 *   { action: "add", quantity: 32, unitPriceCents: 450, … },    // 32 sq ft of decking at $4.50 = $144.00
 *   { action: "remove", quantity: 8, unitPriceCents: 400, … },  // 8 ft of soffit strip at $4.00 = $32.00
 * ], 825)
 * // { addedCents: 14400, removedCents: 3200, taxRateBasisPoints: 825, taxChangeCents: 1188 − 264 = 924, changeCents: 14400 − 3200 + 924 = 12124 }
 */
export function changeOrderTotals(lines: readonly Pick<ChangeOrderLine, "action" | "quantity" | "unitPriceCents">[], taxRateBasisPoints: number): ChangeOrderTotals {
  let addedCents = 0;
  let removedCents = 0;
  for (const line of lines) {
    const total = lineTotalCents(line.unitPriceCents, line.quantity);
    if (line.action === "add") addedCents += total;
    else removedCents += total;
  }
  const taxChangeCents = taxCents(addedCents, taxRateBasisPoints) - taxCents(removedCents, taxRateBasisPoints);
  return { addedCents, removedCents, taxRateBasisPoints, taxChangeCents, changeCents: addedCents - removedCents + taxChangeCents };
}

/** A line's own total, positive for both actions (the action says which way it goes). */
export const changeLineTotalCents = (line: Pick<ChangeOrderLine, "quantity" | "unitPriceCents">) => lineTotalCents(line.unitPriceCents, line.quantity);
