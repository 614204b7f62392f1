import { describe, expect, it } from "vitest";
import { changeOrderTotals } from "./totals";

describe("changeOrderTotals", () => {
  it("when the @example's lines are totalled, then the figures are the ones it shows", () => {
    // Tax: 14,400 × 8.25 % = 1,188 cents; 3,200 × 8.25 % = 264 cents (half up; shared/pricing/tax.ts).
    expect(changeOrderTotals([{ action: "add", quantity: 32, unitPriceCents: 450 }, { action: "remove", quantity: 8, unitPriceCents: 400 }], 825))
      .toEqual({ addedCents: 14_400, removedCents: 3_200, taxRateBasisPoints: 825, taxChangeCents: 924, changeCents: 12_124 });
  });

  it("when only work is taken out, then the change is negative by the lines and their tax", () => {
    expect(changeOrderTotals([{ action: "remove", quantity: 1.5, unitPriceCents: 9_000 }], 0)).toMatchObject({ changeCents: -13_500, taxChangeCents: 0 });
  });

  it("when a quantity has a fraction of a cent, then the line rounds half up as the proposal does", () => {
    // 2.5 × $0.99 = $2.475 → $2.48
    expect(changeOrderTotals([{ action: "add", quantity: 2.5, unitPriceCents: 99 }], 0).addedCents).toBe(248);
  });
});
