/**
 * Attic floor area in plan view — the "area of the vented space" that IRC R806.2 divides by 150
 * or 300 [SOURCES.md §1]. A section is a rectangle, a polygon outline, or an area the
 * estimator entered directly.
 */

export type PointFt = readonly [number, number];

export type SectionShape =
  | { kind: "rect"; lengthFt: number; widthFt: number }
  | { kind: "polygon"; pointsFt: ReadonlyArray<PointFt> }
  | { kind: "area"; areaSqFt: number };

/**
 * Area of a simple polygon by the shoelace formula (the standard surveyor's formula: half the
 * absolute sum of cross products of consecutive vertices). The outline is closed implicitly.
 *
 * @example
 * shoelaceAreaSqFt([[0, 0], [40, 0], [40, 30], [12, 30], [12, 50], [0, 50]]) // 1440
 */
export function shoelaceAreaSqFt(pointsFt: ReadonlyArray<PointFt>): number {
  const n = pointsFt.length;
  if (n < 3) return 0;
  // Shift to the first vertex so large coordinates don't lose precision in the cross products.
  // Indexed reads, not destructuring: this runs several times per outline on every keystroke.
  const x0 = pointsFt[0]![0];
  const y0 = pointsFt[0]![1];
  let twiceArea = 0;
  for (let i = 0; i < n; i += 1) {
    const a = pointsFt[i]!;
    const b = pointsFt[(i + 1) % n]!;
    twiceArea += (a[0] - x0) * (b[1] - y0) - (b[0] - x0) * (a[1] - y0);
  }
  return Math.abs(twiceArea) / 2;
}

function orientation(a: PointFt, b: PointFt, c: PointFt): number {
  const value = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
  const scale = Math.max(1, Math.abs(b[0] - a[0]) + Math.abs(b[1] - a[1])) *
    Math.max(1, Math.abs(c[0] - a[0]) + Math.abs(c[1] - a[1]));
  // Treat near-zero as collinear, relative to the segment sizes.
  if (Math.abs(value) <= 1e-12 * scale) return 0;
  return value > 0 ? 1 : -1;
}

function onSegment(a: PointFt, b: PointFt, p: PointFt): boolean {
  return (
    Math.min(a[0], b[0]) <= p[0] && p[0] <= Math.max(a[0], b[0]) &&
    Math.min(a[1], b[1]) <= p[1] && p[1] <= Math.max(a[1], b[1])
  );
}

/** Whether segments ab and cd touch or cross (collinear overlap counts). */
export function segmentsIntersect(a: PointFt, b: PointFt, c: PointFt, d: PointFt): boolean {
  const o1 = orientation(a, b, c);
  const o2 = orientation(a, b, d);
  const o3 = orientation(c, d, a);
  const o4 = orientation(c, d, b);
  if (o1 !== o2 && o3 !== o4) return true;
  if (o1 === 0 && onSegment(a, b, c)) return true;
  if (o2 === 0 && onSegment(a, b, d)) return true;
  if (o3 === 0 && onSegment(c, d, a)) return true;
  if (o4 === 0 && onSegment(c, d, b)) return true;
  return false;
}

/**
 * Why a polygon outline can't be used, or null when it is a simple polygon. Self-intersecting
 * outlines are refused because the shoelace formula would cancel the crossed lobes and report
 * a floor area smaller than the attic.
 *
 * @example
 * polygonProblem([[0, 0], [10, 10], [10, 0], [0, 10]]) // "The outline crosses itself: side 1 (corner 1 to 2) crosses side 3 (corner 3 to 4). Redraw it …"
 */
export function polygonProblem(pointsFt: ReadonlyArray<PointFt>): string | null {
  const n = pointsFt.length;
  if (n < 3) return "An outline needs at least 3 corners.";
  for (let i = 0; i < n; i += 1) {
    const a = pointsFt[i]!;
    const b = pointsFt[(i + 1) % n]!;
    if (a[0] === b[0] && a[1] === b[1]) {
      return `Corners ${i + 1} and ${((i + 1) % n) + 1} are the same point; remove one.`;
    }
  }
  for (let i = 0; i < n; i += 1) {
    const a = pointsFt[i]!;
    const b = pointsFt[(i + 1) % n]!;
    for (let j = i + 1; j < n; j += 1) {
      // Neighbouring sides share a corner; they only fail if they fold back onto each other.
      const isNeighbour = j === i + 1 || (i === 0 && j === n - 1);
      const c = pointsFt[j]!;
      const d = pointsFt[(j + 1) % n]!;
      if (isNeighbour) {
        const shared = j === i + 1 ? b : a;
        const otherA = j === i + 1 ? a : b;
        const otherB = j === i + 1 ? d : c;
        const folds =
          orientation(otherA, shared, otherB) === 0 &&
          (otherB[0] - shared[0]) * (otherA[0] - shared[0]) + (otherB[1] - shared[1]) * (otherA[1] - shared[1]) > 0;
        if (folds) {
          return `The outline doubles back on itself at corner ${(j === i + 1 ? i + 1 : 0) + 1}; redraw that corner.`;
        }
        continue;
      }
      if (segmentsIntersect(a, b, c, d)) {
        return `The outline crosses itself: side ${i + 1} (corner ${i + 1} to ${((i + 1) % n) + 1}) crosses side ${j + 1} (corner ${j + 1} to ${((j + 1) % n) + 1}). Redraw it going around the edge in order.`;
      }
    }
  }
  if (shoelaceAreaSqFt(pointsFt) <= 0) return "The outline encloses no area.";
  return null;
}

/**
 * Plan-view floor area of one section.
 *
 * @example
 * sectionAreaSqFt({ kind: "rect", lengthFt: 40, widthFt: 30 }) // 1200
 */
export function sectionAreaSqFt(section: SectionShape): number {
  switch (section.kind) {
    case "rect":
      return section.lengthFt * section.widthFt;
    case "polygon":
      return shoelaceAreaSqFt(section.pointsFt);
    case "area":
      return section.areaSqFt;
  }
}

/** Plain words for how a section's area was found, for reasons and PDFs. */
export function describeSectionArea(section: SectionShape, formatNumber: (n: number) => string): string {
  switch (section.kind) {
    case "rect":
      return `${formatNumber(section.lengthFt)} ft × ${formatNumber(section.widthFt)} ft = ${formatNumber(sectionAreaSqFt(section))} sq ft`;
    case "polygon":
      return `outline of ${section.pointsFt.length} corners = ${formatNumber(sectionAreaSqFt(section))} sq ft`;
    case "area":
      return `entered as ${formatNumber(section.areaSqFt)} sq ft`;
  }
}
