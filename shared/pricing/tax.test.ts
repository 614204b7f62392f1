import { describe, expect, it } from "vitest";
import { taxableCents, taxCents } from "./tax";

describe("taxableCents", () => {
  it("when labour is taxed (the default company setting), then the taxable amount is the discounted subtotal (TSDoc example)", () => {
    expect(taxableCents({ materialsCents: 60_000, laborCents: 40_000, discountCents: 10_000, isLaborTaxed: true })).toBe(90_000);
  });
  it("when labour is not taxed, then materials less their proportional share of the discount are taxed (TSDoc example)", () => {
    // share = 10,000 × 60,000 ÷ 100,000 = 6,000
    expect(taxableCents({ materialsCents: 60_000, laborCents: 40_000, discountCents: 10_000, isLaborTaxed: false })).toBe(54_000);
  });
  it("when the materials' share of the discount is a fraction of a cent, then it rounds half up", () => {
    // share = 1,001 × 333 ÷ 1,000 = 333.333 → 333; taxable 333 − 333 = 0
    expect(taxableCents({ materialsCents: 333, laborCents: 667, discountCents: 1_001, isLaborTaxed: false })).toBe(0);
    // share = 1 × 1 ÷ 3 = 0.33 cent → 0; taxable 1 − 0 = 1
    expect(taxableCents({ materialsCents: 1, laborCents: 2, discountCents: 1, isLaborTaxed: false })).toBe(1);
  });
  it("when everything is labour and labour is not taxed, then nothing is taxable", () => {
    expect(taxableCents({ materialsCents: 0, laborCents: 40_000, discountCents: 0, isLaborTaxed: false })).toBe(0);
  });
});

describe("taxCents", () => {
  it("when $1,018.40 is taxed at 8.25 %, then 8,401.8 cents rounds half up to $84.02 (TSDoc example)", () => {
    expect(taxCents(101_840, 825)).toBe(8_402);
  });
  it("when the tax is exactly half a cent, then it rounds up", () => {
    // 100 cents × 0.5 % = 0.5 cent → 1
    expect(taxCents(100, 50)).toBe(1);
    // 99 cents × 0.5 % = 0.495 cent → 0
    expect(taxCents(99, 50)).toBe(0);
  });
  it("when the rate is zero, then there is no tax", () => {
    expect(taxCents(1_000, 0)).toBe(0);
  });
});
