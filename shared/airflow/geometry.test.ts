import { describe, expect, it } from "vitest";
import { arrowHead, midpoint, smoothPolyline, tidy, trimEnd } from "./geometry";

describe("geometry", () => {
  it("when a corner is smoothed once, then its ends stay and the corner is cut at ¼ and ¾", () => {
    expect(smoothPolyline([[0, 0], [1, 0], [1, 1]], 1)).toEqual([[0, 0], [0.75, 0], [1, 0.25], [1, 1]]);
  });
  it("when an arrowhead is made on a line to the right, then its tip is the line's end and it points right", () => {
    const head = arrowHead([[0, 0], [10, 0]], "filled-triangle", 2);
    expect(head.pointsFt[1]).toEqual([10, 0]);
    expect(head.pointsFt[0]![0]).toBeCloseTo(8);
    expect(head.pointsFt[2]![0]).toBeCloseTo(8);
  });
  it("when a zero-length line gets an arrowhead, then it is still finite", () => {
    const head = arrowHead([[3, 3], [3, 3]], "open-chevron", 1);
    expect(head.pointsFt.flat().every(Number.isFinite)).toBe(true);
  });
  it("when a line is trimmed, then it loses exactly that length at its end", () => {
    expect(trimEnd([[0, 0], [4, 0], [4, 4]], 5)).toEqual([[0, 0], [3, 0]]);
  });
  it("when the midpoint of an L is asked, then it is halfway along its length", () => {
    expect(midpoint([[0, 0], [4, 0], [4, 4]])).toEqual([4, 0]);
  });
  it("when a value is tidied, then it rounds to a thousandth of the unit and never gives -0", () => {
    expect(tidy(1.23456, 1)).toBe(1.235);
    expect(Object.is(tidy(-0.0001, 1), 0)).toBe(true);
  });
});

describe("trimEnd on a short line", () => {
  it("when the line is shorter than the trim, then two points remain", () => {
    expect(trimEnd([[0, 0], [1, 0]], 5)).toEqual([[0, 0], [0, 0]]);
  });
});
