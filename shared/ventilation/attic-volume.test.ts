import { describe, expect, it } from "vitest";
import { sectionGeometry, sectionRiseFt } from "./attic-volume";

describe("sectionGeometry", () => {
  it("when a 30 × 40 ft gable is at 6:12, then rise = 15 × 6/12 = 7.5 ft and volume = ½ × 30 × 7.5 × 40 = 4,500 cu ft (SOURCES.md §8 E8)", () => {
    const g = sectionGeometry({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 });
    expect(g).toMatchObject({ isKnown: true, riseFt: (30 / 2) * (6 / 12), volumeCuFt: 0.5 * 30 * 7.5 * 40 });
  });

  it("when a square hip is at 6:12, then it is a pyramid: ⅓ × base × rise (solid geometry)", () => {
    const g = sectionGeometry({ kind: "rect", lengthFt: 30, widthFt: 30, roofForm: "hip", pitchIn12: 6 });
    expect(g).toMatchObject({ isKnown: true, riseFt: 7.5 });
    if (g.isKnown) expect(g.volumeCuFt).toBeCloseTo((30 * 30 * 7.5) / 3, 9);
  });

  it("when a 30 × 40 hip is at 6:12, then it is the gable prism over the 10 ft ridge plus a 30 × 30 pyramid", () => {
    const g = sectionGeometry({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "hip", pitchIn12: 6 });
    const prism = 0.5 * 30 * 7.5 * (40 - 30);
    const pyramid = (30 * 30 * 7.5) / 3;
    if (!g.isKnown) throw new Error("expected a known volume");
    expect(g.volumeCuFt).toBeCloseTo(prism + pyramid, 9);
    // Swapping length and width describes the same hip roof.
    const swapped = sectionGeometry({ kind: "rect", lengthFt: 30, widthFt: 40, roofForm: "hip", pitchIn12: 6 });
    expect(swapped).toMatchObject({ volumeCuFt: g.volumeCuFt });
  });

  it("when a shed rises 4:12 across 12 ft, then rise = 12 × 4/12 = 4 ft and volume = ½ × 12 × 4 × 20", () => {
    const g = sectionGeometry({ kind: "rect", lengthFt: 20, widthFt: 12, roofForm: "shed", pitchIn12: 4 });
    expect(g).toMatchObject({ isKnown: true, riseFt: 4, volumeCuFt: 0.5 * 12 * 4 * 20 });
  });

  it("when an entered area has a span, then a gable's volume is area × rise ÷ 2, the same as the rectangle", () => {
    const fromArea = sectionGeometry({ kind: "area", areaSqFt: 1200, spanFt: 30, roofForm: "gable", pitchIn12: 6 });
    expect(fromArea).toMatchObject({ isKnown: true, volumeCuFt: 4500 });
    const hip = sectionGeometry({ kind: "area", areaSqFt: 1200, spanFt: 30, roofForm: "hip", pitchIn12: 6 });
    if (!hip.isKnown) throw new Error("expected a known volume");
    expect(hip.volumeCuFt).toBeCloseTo(0.5 * 30 * 7.5 * 10 + (30 * 30 * 7.5) / 3, 9);
  });

  it("when pitch, form or span is missing, then the volume is unknown with a reason", () => {
    expect(sectionGeometry({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable" })).toMatchObject({ isKnown: false, reason: expect.stringMatching(/pitch/) });
    expect(sectionGeometry({ kind: "rect", lengthFt: 40, widthFt: 30, pitchIn12: 6 })).toMatchObject({ isKnown: false, reason: expect.stringMatching(/roof form/) });
    expect(sectionGeometry({ kind: "area", areaSqFt: 1200, roofForm: "gable", pitchIn12: 6 })).toMatchObject({ isKnown: false, reason: expect.stringMatching(/span/) });
    expect(sectionRiseFt({ kind: "area", areaSqFt: 1200, roofForm: "gable", pitchIn12: 6 })).toBeNull();
  });
});
