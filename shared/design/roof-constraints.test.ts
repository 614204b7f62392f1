import { describe, expect, it } from "vitest";
import { rafterBays, roofConstraints, staticVentCapacity, usableRidgeFt } from "./roof-constraints";
import { hipShortRidge, lShape, smallRanch } from "./design-cases.test-helpers";

describe("roofConstraints", () => {
  it("when a 40 × 25 ft gable has no ridge recorded, then the ridge is estimated as 40 ft (the TSDoc example)", () => {
    const roof = roofConstraints({ ...smallRanch(), roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null } });
    expect(roof.ridge.lengthFt).toBe(40);
    expect(roof.ridge.source).toBe("estimated");
    expect(roof.ridge.explanation).toMatch(/^The ridge length was not recorded; estimated .* as 40 ft\. /);
  });
  it("when ridge and eave are recorded, then they are used as recorded", () => {
    const roof = roofConstraints(smallRanch());
    expect(roof.ridge).toMatchObject({ lengthFt: 40, source: "recorded" });
    expect(roof.eave).toMatchObject({ lengthFt: 80, source: "recorded" });
  });
  it("when an L-shaped gable has none recorded, then ridge = 48 + 20 ft and eave = 2 × 48 + 2 × 20 ft, said as estimates (the TSDoc example's rule)", () => {
    const roof = roofConstraints(lShape());
    expect(roof.ridge).toMatchObject({ lengthFt: 68, source: "estimated" });
    expect(roof.ridge.explanation).toContain("Measure it on site");
    expect(roof.eave).toMatchObject({ lengthFt: 136, source: "estimated" });
    expect(roof.ridgeCount).toBe(2);
  });
  it("when a hip section is estimated, then its ridge is the long side less the short side and its eaves run all round", () => {
    const space = { ...hipShortRidge(), roof: { ...hipShortRidge().roof, ridgeLengthFt: null, eaveLengthFt: null } };
    const roof = roofConstraints(space);
    expect(roof.ridge.lengthFt).toBe(44 - 38);
    expect(roof.eave.lengthFt).toBe(2 * (44 + 38));
  });
  it("when a section is an entered area, then nothing can be estimated", () => {
    const roof = roofConstraints({ ...smallRanch(), roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null }, sections: [{ kind: "area", areaSqFt: 900 }] });
    expect(roof.ridge).toMatchObject({ lengthFt: null, source: "unknown" });
  });
});

describe("usableRidgeFt, staticVentCapacity, rafterBays (the TSDoc examples)", () => {
  it("when a 40 ft ridge stops 6 in short of each end, then 39 ft is usable", () => {
    expect(usableRidgeFt(40, 1)).toBe(39);
    expect(usableRidgeFt(0.5, 1)).toBe(0);
  });
  it("when static vents go one per 4 ft under the ridge, then a 40 ft gable has room for 20 and a 6 ft hip ridge at 6/12 for 9", () => {
    expect(staticVentCapacity({ form: "gable", pitchIn12: 6, ridgeLengthFt: 40, hipCount: 0 }).count).toBe(20);
    // run = 1.5 × 12 ÷ 6 = 3 ft; row = 2 × 6 + 8 × 3 = 36 ft
    expect(staticVentCapacity({ form: "hip", pitchIn12: 6, ridgeLengthFt: 6, hipCount: 1 })).toMatchObject({ count: 9, rowLengthFt: 36 });
    expect(staticVentCapacity({ form: "shed", pitchIn12: 3, ridgeLengthFt: 30, hipCount: 0 }).count).toBe(7);
  });
  it("when an 80 ft eave has rafters at 24 in, then it has 40 bays; at 16 in, 60", () => {
    expect(rafterBays(80, 24)).toBe(40);
    expect(rafterBays(80, 16)).toBe(60);
  });
});
