/**
 * Sales tax on an option. Whether labour is taxed is a company setting (`isLaborTaxed`, default
 * true: materials and labour both taxed), because states and localities differ; the local tax
 * law and the company's accountant decide, not Eavesight.
 *
 * The taxable amount is the discounted price: the discount is shared between materials and
 * labour in proportion to their amounts, the materials' share being
 * discount × materials ÷ subtotal rounded half up to the cent (the labour share is the rest, so
 * the two shares add up to the discount exactly). Tax is taxable × rate ÷ 10,000 (rate in basis
 * points: 825 bp = 8.25 %), rounded half up to the cent, once, on the option total — not per line
 * (common practice on invoices; some jurisdictions round per line instead).
 */
import { assertCents, mulDivRoundHalfUp, percentOfCents } from "./rounding";

export interface TaxableInput {
  materialsCents: number;
  laborCents: number;
  discountCents: number;
  isLaborTaxed: boolean;
}

/**
 * @example
 * taxableCents({ materialsCents: 600_00, laborCents: 400_00, discountCents: 100_00, isLaborTaxed: true }) // 90000
 * taxableCents({ materialsCents: 600_00, laborCents: 400_00, discountCents: 100_00, isLaborTaxed: false }) // 54000  (600 − 60)
 */
export function taxableCents(input: TaxableInput): number {
  const { materialsCents, laborCents, discountCents, isLaborTaxed } = input;
  assertCents(materialsCents, "Materials");
  assertCents(laborCents, "Labour");
  assertCents(discountCents, "The discount");
  const subtotalCents = materialsCents + laborCents;
  const discount = Math.min(discountCents, subtotalCents);
  if (isLaborTaxed) return subtotalCents - discount;
  if (subtotalCents === 0) return 0;
  const materialsShareCents = mulDivRoundHalfUp(discount, materialsCents, subtotalCents);
  return materialsCents - materialsShareCents;
}

/**
 * @example
 * taxCents(1_018_40, 825) // 8402  (101,840 × 8.25 % = 8,401.8 cents → 8,402)
 * taxCents(10_00, 0) // 0
 */
export function taxCents(taxableAmountCents: number, taxRateBasisPoints: number): number {
  return percentOfCents(taxableAmountCents, taxRateBasisPoints);
}
