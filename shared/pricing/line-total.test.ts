import { describe, expect, it } from "vitest";
import { exactLineThousandthCents, lineTotalCents } from "./line-total";

describe("lineTotalCents (the TSDoc examples)", () => {
  it("when 38 ft are priced at $6.50 per ft, then the line is $247.00", () => {
    expect(lineTotalCents(650, 38)).toBe(24_700);
  });
  it("when 12.345 ft are priced at $3.33, then 4,110.885 cents rounds half up to 4,111", () => {
    expect(exactLineThousandthCents(333, 12.345)).toBe(4_110_885);
    expect(lineTotalCents(333, 12.345)).toBe(4_111);
  });
  it("when 2.25 h are priced at $95.00, then the line is $213.75", () => {
    expect(lineTotalCents(9_500, 2.25)).toBe(21_375);
  });
  it("when the product is exactly half a cent, then it rounds up; just under half, down", () => {
    expect(lineTotalCents(1, 0.5)).toBe(1); // 0.5 cent → 1
    expect(lineTotalCents(1, 0.499)).toBe(0); // 0.499 cent → 0
    expect(lineTotalCents(3, 0.5)).toBe(2); // 1.5 cents → 2
  });
  it("when the quantity has a 4th decimal, then it is first rounded to thousandths (half up)", () => {
    expect(lineTotalCents(1_000, 1.0005)).toBe(1_001); // 1.001 × $10.00 = $10.01
    expect(lineTotalCents(1_000, 1.0004)).toBe(1_000);
  });
  it("when the price is not whole cents or is negative, then it throws", () => {
    expect(() => lineTotalCents(6.5, 2)).toThrow(RangeError);
    expect(() => lineTotalCents(-650, 2)).toThrow(RangeError);
  });
  it("when a decimal quantity would drift in floats (0.1 + 0.2 ft), then the cents are still exact", () => {
    expect(0.1 + 0.2).not.toBe(0.3);
    expect(lineTotalCents(1_000_000, 0.1 + 0.2)).toBe(300_000);
  });
});
