import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { divideRoundDown, divideRoundHalfUp, mulDivRoundDown, mulDivRoundHalfUp, percentOfCents, quantityToThousandths } from "./rounding";

describe("divideRoundHalfUp (the TSDoc examples)", () => {
  it("when the remainder is half or more, then it rounds up; below half, down", () => {
    expect(divideRoundHalfUp(24_750, 1_000)).toBe(25);
    expect(divideRoundHalfUp(24_500, 1_000)).toBe(25);
    expect(divideRoundHalfUp(24_499, 1_000)).toBe(24);
    expect(divideRoundHalfUp(0, 7)).toBe(0);
  });
  it("when given any safe non-negative integers, then it equals the BigInt half-up quotient", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: Number.MAX_SAFE_INTEGER }), fc.integer({ min: 1, max: 1e9 }), (n, d) => {
        const expected = Number((BigInt(n) * 2n + BigInt(d)) / (2n * BigInt(d)));
        expect(divideRoundHalfUp(n, d)).toBe(expected);
        expect(divideRoundDown(n, d)).toBe(Number(BigInt(n) / BigInt(d)));
      }),
    );
  });
  it("when given a fraction, a negative number or zero as the divisor, then it throws", () => {
    expect(() => divideRoundHalfUp(1.5, 2)).toThrow(RangeError);
    expect(() => divideRoundHalfUp(-1, 2)).toThrow(RangeError);
    expect(() => divideRoundHalfUp(1, 0)).toThrow(RangeError);
  });
});

describe("quantityToThousandths", () => {
  it("when a quantity has up to 3 decimals, then it is kept exactly; a 4th decimal of 5 rounds up (the TSDoc examples)", () => {
    expect(quantityToThousandths(38)).toBe(38_000);
    expect(quantityToThousandths(2.25)).toBe(2_250);
    expect(quantityToThousandths(1.0005)).toBe(1_001); // stored as 1.000499999…: the float noise is dropped first
    expect(quantityToThousandths(1.0004)).toBe(1_000);
    expect(quantityToThousandths(0.1 + 0.2)).toBe(300);
  });
  it("when a quantity is negative or not finite, then it throws", () => {
    expect(() => quantityToThousandths(-1)).toThrow(RangeError);
    expect(() => quantityToThousandths(Number.NaN)).toThrow(RangeError);
  });
  it("when a quantity is typed with up to 3 decimals, then the thousandths are exactly the typed digits", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10_000_000 }), (t) => {
        const typed = (t / 1000).toFixed(3);
        expect(quantityToThousandths(Number(typed))).toBe(t);
      }),
    );
  });
});

describe("percentOfCents", () => {
  it("when $123.45 is taxed at 8.25 %, then 1,018.4625 cents rounds to 1,018 (the TSDoc example)", () => {
    expect(percentOfCents(12_345, 825)).toBe(1_018);
  });
});

describe("mulDivRoundHalfUp and mulDivRoundDown", () => {
  it("when the product is small, then they round as the TSDoc examples say", () => {
    expect(mulDivRoundHalfUp(4_608, 24_700, 46_075)).toBe(2_470);
    expect(mulDivRoundDown(432_115, 1_000, 10_000)).toBe(43_211);
  });
  it("when a × b passes 2^53, then the result is still the exact BigInt quotient", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1e12 }), fc.integer({ min: 0, max: 1e12 }), fc.integer({ min: 1e12, max: 1e13 }), (a, b, d) => {
        expect(mulDivRoundHalfUp(a, b, d)).toBe(Number((BigInt(a) * BigInt(b) * 2n + BigInt(d)) / (2n * BigInt(d))));
        expect(mulDivRoundDown(a, b, d)).toBe(Number((BigInt(a) * BigInt(b)) / BigInt(d)));
      }),
    );
  });
});
