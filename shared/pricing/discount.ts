/**
 * The option discount: none, a fixed amount, or a percent of the subtotal in basis points
 * (1,000 bp = 10 %), the `Adjustment` contract of shared/schemas/options.ts.
 *
 * Rounding: a percent discount is subtotal × basis points ÷ 10,000, rounded half up to the cent.
 * A discount is never more than the subtotal, so the discounted amount is never below zero
 * (common practice: a discount can't turn a sale into a payment to the customer).
 */
import type { Adjustment } from "../schemas/options";
import { assertCents, percentOfCents } from "./rounding";

/**
 * @example
 * discountCents(1_234_56, { kind: "percent", basisPoints: 750 }) // 9259  (123,456 × 7.5 % = 9,259.2 cents)
 * discountCents(50_00, { kind: "amount", cents: 80_00 }) // 5000  (capped at the subtotal)
 * discountCents(50_00, { kind: "none" }) // 0
 */
export function discountCents(subtotalCents: number, discount: Adjustment): number {
  assertCents(subtotalCents, "The subtotal");
  switch (discount.kind) {
    case "none":
      return 0;
    case "amount":
      assertCents(discount.cents, "The discount");
      return Math.min(discount.cents, subtotalCents);
    case "percent":
      return Math.min(percentOfCents(subtotalCents, Math.min(discount.basisPoints, 10_000)), subtotalCents);
  }
}
