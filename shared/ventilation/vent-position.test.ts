import { describe, expect, it } from "vitest";
import { riseLookup, ventPosition } from "./vent-position";

describe("ventPosition", () => {
  it("when a ridge vent has no recorded drop, then it is taken as at the ridge and its height is the rise", () => {
    expect(ventPosition({ id: "r1", kind: "ridge", location: "upper", lengthFt: 40, nfaSqInPerFt: 18 }, 7.5)).toMatchObject({
      dropBelowRidgeFt: 0,
      dropSource: "at-ridge-kind",
      heightAboveEaveFt: 7.5,
    });
  });
  it("when a box vent's height above the eaves is recorded with the rise, then its drop is rise − height", () => {
    expect(ventPosition({ id: "b", kind: "box", location: "upper", nfaSqIn: 50, heightAboveEaveFt: 5 }, 7.5)).toMatchObject({ dropBelowRidgeFt: 2.5, dropSource: "from-height-and-rise" });
  });
  it("when nothing places a box vent, then drop and height are unknown (null), never guessed", () => {
    expect(ventPosition({ id: "b", kind: "box", location: "upper", nfaSqIn: 50 }, null)).toMatchObject({ dropBelowRidgeFt: null, heightAboveEaveFt: null });
  });
  it("when a vent names no section, then the space's highest and lowest rise are used only if every section's rise is known", () => {
    const known = riseLookup([
      { kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 },
      { kind: "rect", id: "w", lengthFt: 20, widthFt: 12, roofForm: "gable", pitchIn12: 6 },
    ]);
    expect(known(undefined)).toEqual({ highestFt: 7.5, lowestFt: 3 }); // 30 ÷ 2 × 6/12; 12 ÷ 2 × 6/12
    expect(known("w")).toEqual({ highestFt: 3, lowestFt: 3 });
    const partly = riseLookup([{ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 }, { kind: "area", areaSqFt: 200 }]);
    expect(partly(undefined)).toBeNull();
  });
});
