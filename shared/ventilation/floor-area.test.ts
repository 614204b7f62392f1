import areaPolygon from "area-polygon";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { polygonProblem, sectionAreaSqFt, shoelaceAreaSqFt, type PointFt } from "./floor-area";

describe("shoelaceAreaSqFt", () => {
  it("when the outline is SOURCES.md §8 E4's L (30 × 40 plus 12 × 20), then the area is 1,200 + 240 = 1,440 sq ft", () => {
    // The main block 40 × 30 with a 12 × 20 wing on one side.
    const lShape: PointFt[] = [[0, 0], [40, 0], [40, 30], [12, 30], [12, 50], [0, 50]];
    expect(shoelaceAreaSqFt(lShape)).toBe(40 * 30 + 12 * 20);
  });

  it("when the outline is clockwise instead of counter-clockwise, then the area is the same", () => {
    const square: PointFt[] = [[0, 0], [0, 10], [10, 10], [10, 0]];
    expect(shoelaceAreaSqFt(square)).toBe(100);
    expect(shoelaceAreaSqFt([...square].reverse())).toBe(100);
  });

  it("when compared with the area-polygon package on random convex polygons, then both agree (property)", () => {
    // Convex polygons from sorted angles around a centre are always simple.
    const convex = fc
      .array(fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), { minLength: 3, maxLength: 30 })
      .chain((angles) =>
        fc.tuple(
          fc.constant([...new Set(angles)].sort((a, b) => a - b)),
          fc.double({ min: 1, max: 500, noNaN: true }),
          fc.double({ min: -1000, max: 1000, noNaN: true }),
          fc.double({ min: -1000, max: 1000, noNaN: true }),
        ),
      )
      .map(([angles, r, cx, cy]) => angles.map((a) => [cx + r * Math.cos(a), cy + r * Math.sin(a)] as PointFt));
    fc.assert(
      fc.property(convex, (points) => {
        fc.pre(points.length >= 3);
        const ours = shoelaceAreaSqFt(points);
        const theirs = areaPolygon(points.map(([x, y]) => [x, y]));
        expect(ours).toBeCloseTo(theirs, 4);
      }),
    );
  });
});

describe("polygonProblem", () => {
  it("when the outline is a simple L, then there is no problem", () => {
    expect(polygonProblem([[0, 0], [40, 0], [40, 30], [12, 30], [12, 50], [0, 50]])).toBeNull();
  });

  it("when the outline is a bow tie, then it is refused as crossing itself", () => {
    expect(polygonProblem([[0, 0], [10, 10], [10, 0], [0, 10]])).toMatch(/crosses itself/);
  });

  it("when the outline touches itself at a corner or doubles back, then it is refused", () => {
    // Figure-eight through a shared vertex.
    expect(polygonProblem([[0, 0], [10, 0], [5, 5], [10, 10], [0, 10], [5, 5]])).not.toBeNull();
    expect(polygonProblem([[0, 0], [10, 0], [5, 0], [5, 5]])).not.toBeNull();
  });

  it("when there are fewer than 3 corners, repeated corners or no area, then it is refused", () => {
    expect(polygonProblem([[0, 0], [1, 1]])).toMatch(/at least 3/);
    expect(polygonProblem([[0, 0], [0, 0], [1, 1], [0, 1]])).toMatch(/same point/);
    expect(polygonProblem([[0, 0], [5, 5], [10, 10]])).not.toBeNull();
  });
});

describe("sectionAreaSqFt", () => {
  it("when a section is a rectangle or an entered area, then its area is length × width or the figure entered", () => {
    expect(sectionAreaSqFt({ kind: "rect", lengthFt: 40, widthFt: 30 })).toBe(1200);
    expect(sectionAreaSqFt({ kind: "area", areaSqFt: 1234.5 })).toBe(1234.5);
  });
});

describe("TSDoc examples", () => {
  it("when the polygonProblem example runs, then the message names the crossing sides", () => {
    expect(polygonProblem([[0, 0], [10, 10], [10, 0], [0, 10]])).toMatch(/^The outline crosses itself: side 1 \(corner 1 to 2\) crosses side 3 \(corner 3 to 4\)\. Redraw it/);
  });
});
