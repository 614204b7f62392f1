import { describe, expect, it } from "vitest";
import { analyzeAttic } from "./analyze-attic";
import { aboveMinimum } from "./recommendations";
import { attic, ridge, soffit } from "./test-helpers";

// Above the minimum, never code: JLC "Roof Ventilation Field Guide" pitch adjustment, labelled
// recommended practice [SOURCES.md S11]: +20 % for 7/12–10/12, +30 % steeper.
describe("above the minimum (common practice, not code)", () => {
  it.each([
    [6, null],
    [7, 1728],
    [10, 1728],
    [12, 1872],
  ] as const)("when the pitch is %d/12 on E1's 1,440 sq in, then the steep-roof recommendation is %s sq in (JLC field guide)", (pitch, sqIn) => {
    const r = aboveMinimum({ requiredExactSqIn: 1440, maxPitchIn12: pitch, wholeHouseFanCfm: 0, ceilingAirSealed: true, isUnvented: false }).find((x) => x.id === "steep-roof-extra-area");
    expect(r?.recommendedSqIn ?? null).toBe(sqIn);
  });

  it("when recommendations are made, then each is marked not code with a source, and the verdict ignores them", () => {
    const a = analyzeAttic(attic({ codeBasis: "strict-150", sections: [{ kind: "rect", lengthFt: 50, widthFt: 30, roofForm: "gable", pitchIn12: 9 }], vents: [soffit("s", 800), ridge("r", 700)] }));
    expect(a.compliant).toBe(true); // 1,500 ≥ 1,440 — the 1,728 recommended does not change the verdict
    expect(a.recommendations.length).toBeGreaterThan(0);
    for (const r of a.recommendations) {
      expect(r.isCode).toBe(false);
      expect(r.source).toMatch(/common practice|instructions/i);
      expect(r.title).toMatch(/recommended/);
    }
  });

  it("when the attic is sealed (IRC R806.5), then no vent area is recommended either", () => {
    expect(aboveMinimum({ requiredExactSqIn: 0, maxPitchIn12: 12, wholeHouseFanCfm: 0, ceilingAirSealed: false, isUnvented: true })).toEqual([]);
  });

  it("when a 3,000 cfm whole-house fan is recorded, then the makers' 1 per 500 cfm gives 864 sq in, marked as a recommendation", () => {
    const r = aboveMinimum({ requiredExactSqIn: 1440, maxPitchIn12: 4, wholeHouseFanCfm: 3000, ceilingAirSealed: true, isUnvented: false }).find((x) => x.id === "whole-house-fan-maker-area");
    expect(r?.recommendedSqIn).toBe(864);
  });
});
