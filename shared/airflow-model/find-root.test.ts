import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { findRootDecreasing } from "./find-root";

describe("findRootDecreasing", () => {
  it("finds the root of the TSDoc example, 4 − x·|x| = 0 at x = 2", () => {
    expect(findRootDecreasing((x) => 4 - x * x * Math.sign(x), { toleranceY: 1e-12 })).toBeCloseTo(2, 9);
  });

  it("when the root is far outside the first bracket, then the bracket grows to it", () => {
    expect(findRootDecreasing((x) => -1e6 - x, { toleranceY: 1e-9 })).toBeCloseTo(-1e6, 3);
  });

  it("finds the root of any sum of signed square roots (orifice flows) to the tolerance", () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.double({ min: 1e-6, max: 1e3, noNaN: true }), fc.double({ min: -500, max: 500, noNaN: true })), { minLength: 1, maxLength: 20 }),
        (holes) => {
          const f = (p: number) => holes.reduce((sum, [a, s]) => { const d = p + s; return sum + (d < 0 ? a * Math.sqrt(-d) : -a * Math.sqrt(d)); }, 0);
          const root = findRootDecreasing(f, { toleranceY: 1e-9 });
          const scale = holes.reduce((sum, [a]) => sum + a, 0);
          expect(Math.abs(f(root))).toBeLessThanOrEqual(1e-9 + 1e-6 * scale);
        },
      ),
    );
  });
});
