import { describe, expect, it } from "vitest";
import { coveringFactor, describeCovering, netFreeAreaFromGrossSqIn } from "./covering-factors";

describe("coveringFactor", () => {
  // JLC field guide multiplier table [S11] / USDA-FPL free-area table (AIB 373, AH 73) [from memory].
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
  it("when a 14 × 24 in louver has louvers and 1/8 in mesh, then NFA = 336 ÷ 2.25 = 149.33 sq in (SOURCES.md §8 E7)", () => {
    expect(netFreeAreaFromGrossSqIn(14 * 24, { mesh: "1/8", louvers: true })).toBeCloseTo(149.33, 2);
    // ≈ 963 cm² (× 6.4516, NIST SP 811 App. B)
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: true }) * 6.4516).toBeCloseTo(963.4, 1);
  });

  it("when the same louver has other coverings, then E7's comparison figures follow (268.8, 168, 112 sq in)", () => {
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: false })).toBeCloseTo(268.8, 9);
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/16", louvers: false })).toBeCloseTo(168, 9);
    expect(netFreeAreaFromGrossSqIn(336, { mesh: "1/16", louvers: true })).toBeCloseTo(112, 9);
  });

  it("when E2's 360 sq in upper share is to come from those louvers, then 360 ÷ 149.33 = 2.41 → 3 louvers (SOURCES.md §8 E7)", () => {
    const each = netFreeAreaFromGrossSqIn(336, { mesh: "1/8", louvers: true });
    expect(Math.ceil(360 / each)).toBe(3);
  });
});

describe("louver material (JLC field guide [SOURCES.md S11]: #16 screen 'with or without plain metal louvers' 2.00; with wood louvers 3.00)", () => {
  it("when a 1/16 in screen is behind plain metal louvers, then the factor is 2.00, not 3.00", () => {
    expect(coveringFactor({ mesh: "1/16", louvers: true, louverMaterial: "metal" })).toBe(2.0);
  });
  it("when a 1/16 in screen is behind wood louvers, then the factor is 3.00", () => {
    expect(coveringFactor({ mesh: "1/16", louvers: true, louverMaterial: "wood" })).toBe(3.0);
  });
  it("when the louver material is not recorded, then wood (3.00) is assumed, the smaller NFA, and the words say so", () => {
    expect(coveringFactor({ mesh: "1/16", louvers: true })).toBe(3.0);
    expect(describeCovering({ mesh: "1/16", louvers: true })).toMatch(/material not recorded.*wood/);
  });
  it.each([
    ["1/4", 2.0],
    ["1/8", 2.25],
  ] as const)("when %s in mesh is behind metal louvers, then the table's louver factor %d still applies (it has no metal-louver row for that mesh)", (mesh, factor) => {
    expect(coveringFactor({ mesh, louvers: true, louverMaterial: "metal" })).toBe(factor);
  });
});
