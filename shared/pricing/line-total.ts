/**
 * One priced line: unit price × quantity, in integer cents.
 *
 * Rounding (stated once, tested): the quantity is taken in whole thousandths of its unit, rounded
 * half up (0.001 ft, 0.001 h, 0.001 each); the exact product unit price × thousandths is then
 * divided by 1,000 and rounded half up to the cent. So 12.345 ft at $3.33 per ft is
 * 333 × 12,345 = 4,110,885 thousandth-cents = 4,110.885 cents → $41.11. Rounding is per line;
 * the option subtotal is the exact sum of the rounded lines (common practice on invoices: each
 * line shows the amount that is added up).
 */
import { assertCents, mulDivRoundHalfUp, quantityToThousandths, THOUSANDTHS_PER_UNIT } from "./rounding";

/**
 * @example
 * lineTotalCents(650, 38) // 24700  (38 ft × $6.50)
 * lineTotalCents(333, 12.345) // 4111  (4,110.885 cents, half up)
 * lineTotalCents(9_500, 2.25) // 21375  (2.25 h × $95.00)
 */
export function lineTotalCents(unitPriceCents: number, quantity: number): number {
  assertCents(unitPriceCents, "The unit price");
  return mulDivRoundHalfUp(unitPriceCents, quantityToThousandths(quantity), THOUSANDTHS_PER_UNIT);
}

/**
 * The unrounded line amount in thousandths of a cent, for explaining a line ("= $41.10885").
 *
 * @example
 * exactLineThousandthCents(333, 12.345) // 4110885
 */
export function exactLineThousandthCents(unitPriceCents: number, quantity: number): number {
  assertCents(unitPriceCents, "The unit price");
  return unitPriceCents * quantityToThousandths(quantity);
}
