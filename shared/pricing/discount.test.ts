import { describe, expect, it } from "vitest";
import { discountCents } from "./discount";

describe("discountCents", () => {
  it("when 7.5 % is taken off $1,234.56, then 9,259.2 cents rounds half up to $92.59 (the TSDoc example)", () => {
    expect(discountCents(123_456, { kind: "percent", basisPoints: 750 })).toBe(9_259);
  });
  it("when the percent lands on exactly half a cent, then it rounds up", () => {
    // 10 % of 46,075 cents = 4,607.5 cents → 4,608
    expect(discountCents(46_075, { kind: "percent", basisPoints: 1_000 })).toBe(4_608);
    // 10 % of 46,074 cents = 4,607.4 cents → 4,607
    expect(discountCents(46_074, { kind: "percent", basisPoints: 1_000 })).toBe(4_607);
  });
  it("when an amount is more than the subtotal, then the discount stops at the subtotal (never below zero)", () => {
    expect(discountCents(5_000, { kind: "amount", cents: 8_000 })).toBe(5_000);
    expect(discountCents(5_000, { kind: "amount", cents: 1_250 })).toBe(1_250);
    expect(discountCents(5_000, { kind: "percent", basisPoints: 10_000 })).toBe(5_000);
  });
  it("when there is no discount, then it is zero", () => {
    expect(discountCents(5_000, { kind: "none" })).toBe(0);
  });
});
