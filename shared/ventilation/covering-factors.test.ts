import { describe, expect, it } from "vitest";
import { coveringFactor, netFreeAreaFromGrossSqIn } from "./covering-factors";

describe("coveringFactor", () => {
  // JLC field guide multiplier table [SRC 11] / USDA-FPL free-area table (AIB 373, AH 73) [from memory].
  it.each([
    ["1/4", false, 1.0],
    ["1/4", true, 2.0],
    ["1/8", false, 1.25],
    ["1/8", true, 2.25],
    ["1/16", false, 2.0],
    ["1/16", true, 3.0],
  ] as const)("when the mesh is %s in and louvers=%s, then the factor is %d (JLC field guide / USDA-FPL free-area table)", (mesh, louvers, factor) => {
    expect(coveringFactor({ mesh, louvers })).toBe(factor);
  });
});

describe("netFreeAreaFromGrossSqIn", () => {
  it("when a 14 × 24 in louver has louvers and 1/8 in mesh, then NFA = 336 ÷ 2.25 = 149.33 sq in (TRADE-REFERENCES §8 E7)", () => {
    expect(netFreeAreaFromGrossSqIn(14 * 24, { mesh: "1/8", louvers: true })).toBeCloseTo(149.33, 2);
    // ≈ 963 cm² (× 6.4516, NIST SP 811 App. B)
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: true }) * 6.4516).toBeCloseTo(963.4, 1);
  });

  it("when the same louver has other coverings, then E7's comparison figures follow (268.8, 168, 112 sq in)", () => {
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: false })).toBeCloseTo(268.8, 9);
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/16", louvers: false })).toBeCloseTo(168, 9);
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/16", louvers: true })).toBeCloseTo(112, 9);
  });

  it("when E2's 360 sq in upper share is to come from those louvers, then 360 ÷ 149.33 = 2.41 → 3 louvers (TRADE-REFERENCES §8 E7)", () => {
    const each = netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: true });
    expect(Math.ceil(360 / each)).toBe(3);
  });
});
