/**
 * Small plane-geometry helpers for the airflow picture (feet, y downward).
 */
import type { ArrowHead, DrawPointFt, Primitive } from "./types";

export const add = (a: DrawPointFt, b: DrawPointFt): DrawPointFt => [a[0] + b[0], a[1] + b[1]];
export const sub = (a: DrawPointFt, b: DrawPointFt): DrawPointFt => [a[0] - b[0], a[1] - b[1]];
export const scale = (a: DrawPointFt, k: number): DrawPointFt => [a[0] * k, a[1] * k];
export const lerp = (a: DrawPointFt, b: DrawPointFt, t: number): DrawPointFt => [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
export const clamp = (value: number, min: number, max: number): number => Math.min(max, Math.max(min, value));

/** Unit vector of `a`, or [1, 0] for a zero vector (so a degenerate arrow still points somewhere). */
export function unit(a: DrawPointFt): DrawPointFt {
  const length = Math.hypot(a[0], a[1]);
  return length > 0 && Number.isFinite(length) ? [a[0] / length, a[1] / length] : [1, 0];
}

/** Rounds to 1/1000 of a unit so the data is stable and compact; -0 becomes 0. */
export function tidy(value: number, unitFt: number): number {
  const step = unitFt / 1000;
  const rounded = Math.round(value / step) * step;
  const fixed = Number(rounded.toPrecision(12));
  return fixed === 0 ? 0 : fixed;
}

/**
 * Chaikin corner cutting: rounds a polyline's corners while keeping its two ends, so arrows read
 * as smooth airflow without curves a renderer might not support.
 *
 * @example
 * smoothPolyline([[0, 0], [1, 0], [1, 1]], 1) // [[0,0],[0.75,0],[1,0.25],[1,1]]
 */
export function smoothPolyline(points: ReadonlyArray<DrawPointFt>, iterations = 3): DrawPointFt[] {
  let current = [...points];
  for (let i = 0; i < iterations && current.length > 2; i++) {
    const next: DrawPointFt[] = [current[0]!];
    for (let j = 0; j < current.length - 1; j++) {
      const a = current[j]!;
      const b = current[j + 1]!;
      if (j > 0) next.push(lerp(a, b, 0.25));
      if (j < current.length - 2) next.push(lerp(a, b, 0.75));
    }
    next.push(current[current.length - 1]!);
    current = next;
  }
  return current;
}

/**
 * Arrowhead at the end of a polyline. Filled triangle and open chevron share one outline, so a
 * chevron is the same size as a triangle; a stop bar sits across the line's end.
 */
export function arrowHead(points: ReadonlyArray<DrawPointFt>, kind: ArrowHead["kind"], lengthFt: number): ArrowHead {
  const tip = points[points.length - 1] ?? [0, 0];
  // Direction from a point a head's length back, so smoothing wiggles don't turn the head.
  let from = points[0] ?? tip;
  for (let i = points.length - 2; i >= 0; i--) {
    from = points[i]!;
    if (Math.hypot(tip[0] - from[0], tip[1] - from[1]) >= lengthFt) break;
  }
  const dir = unit(sub(tip, from));
  const normal: DrawPointFt = [-dir[1], dir[0]];
  const halfWidthFt = lengthFt * 0.55;
  if (kind === "stop-bar") {
    return { kind, pointsFt: [add(tip, scale(normal, halfWidthFt)), add(tip, scale(normal, -halfWidthFt))] };
  }
  const back = sub(tip, scale(dir, lengthFt));
  const left = add(back, scale(normal, halfWidthFt));
  const right = add(back, scale(normal, -halfWidthFt));
  return { kind, pointsFt: [left, tip, right] };
}

/** The polyline minus its last `lengthFt`, so a line stops where its arrowhead begins. */
export function trimEnd(points: ReadonlyArray<DrawPointFt>, lengthFt: number): DrawPointFt[] {
  const result = [...points];
  let remaining = lengthFt;
  while (result.length >= 2 && remaining > 0) {
    const end = result[result.length - 1]!;
    const prev = result[result.length - 2]!;
    const segment = Math.hypot(end[0] - prev[0], end[1] - prev[1]);
    if (segment > remaining) {
      result[result.length - 1] = lerp(end, prev, remaining / segment);
      return result;
    }
    remaining -= segment;
    result.pop();
  }
  // Shorter than the trim: a zero-length line at the start, so a renderer still gets two points.
  const first = points[0] ?? [0, 0];
  return result.length >= 2 ? result : [first, first];
}

/** The point halfway along a polyline, by length. */
export function midpoint(points: ReadonlyArray<DrawPointFt>, at = 0.5): DrawPointFt {
  if (points.length === 0) return [0, 0];
  const lengths: number[] = [];
  let total = 0;
  for (let i = 1; i < points.length; i++) {
    const d = Math.hypot(points[i]![0] - points[i - 1]![0], points[i]![1] - points[i - 1]![1]);
    lengths.push(d);
    total += d;
  }
  let target = total * at;
  for (let i = 1; i < points.length; i++) {
    const d = lengths[i - 1]!;
    if (target <= d && d > 0) return lerp(points[i - 1]!, points[i]!, target / d);
    target -= d;
  }
  return points[points.length - 1]!;
}

/** Places local points (u along `dir`, v along its left normal) at `origin`. */
export function placeLocal(origin: DrawPointFt, dir: DrawPointFt, local: ReadonlyArray<DrawPointFt>): DrawPointFt[] {
  const d = unit(dir);
  const n: DrawPointFt = [d[1], -d[0]];
  return local.map(([u, v]) => [origin[0] + d[0] * u + n[0] * v, origin[1] + d[1] * u + n[1] * v]);
}

export interface BoundsFt {
  minXFt: number;
  minYFt: number;
  maxXFt: number;
  maxYFt: number;
}

export const emptyBounds = (): BoundsFt => ({ minXFt: Infinity, minYFt: Infinity, maxXFt: -Infinity, maxYFt: -Infinity });

export function includePoint(bounds: BoundsFt, [x, y]: DrawPointFt, padFt = 0): void {
  bounds.minXFt = Math.min(bounds.minXFt, x - padFt);
  bounds.maxXFt = Math.max(bounds.maxXFt, x + padFt);
  bounds.minYFt = Math.min(bounds.minYFt, y - padFt);
  bounds.maxYFt = Math.max(bounds.maxYFt, y + padFt);
}

export function includePrimitive(bounds: BoundsFt, primitive: Primitive, padFt: number): void {
  if (primitive.type === "circle") includePoint(bounds, primitive.centerFt, primitive.radiusFt + padFt);
  else for (const p of primitive.pointsFt) includePoint(bounds, p, padFt);
}

/** Rough width of a text line: average glyph of a sans face is about 0.56 em. */
export const textWidthFt = (text: string, fontSizeFt: number): number => text.length * fontSizeFt * 0.56;

export interface BoxFt { minXFt: number; minYFt: number; maxXFt: number; maxYFt: number }

/** The rough box a text line covers (y grows downwards; the anchor point is on the baseline). */
export function textBoxFt(t: { text: string; atFt: DrawPointFt; anchor: "start" | "middle" | "end"; fontSizeFt: number }): BoxFt {
  const widthFt = textWidthFt(t.text, t.fontSizeFt);
  const minXFt = t.anchor === "start" ? t.atFt[0] : t.anchor === "end" ? t.atFt[0] - widthFt : t.atFt[0] - widthFt / 2;
  return { minXFt, maxXFt: minXFt + widthFt, minYFt: t.atFt[1] - t.fontSizeFt, maxYFt: t.atFt[1] + 0.25 * t.fontSizeFt };
}

export const boxesOverlap = (a: BoxFt, b: BoxFt): boolean =>
  a.minXFt < b.maxXFt && b.minXFt < a.maxXFt && a.minYFt < b.maxYFt && b.minYFt < a.maxYFt;

/** Whether a line (drawn `padFt` wide each side) passes through a box, checked every 0.4 units along it. */
export function lineCrossesBox(points: readonly DrawPointFt[], box: BoxFt, padFt: number, unitFt: number): boolean {
  const inside = ([x, y]: DrawPointFt) => x > box.minXFt - padFt && x < box.maxXFt + padFt && y > box.minYFt - padFt && y < box.maxYFt + padFt;
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    const steps = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / (0.4 * unitFt)));
    for (let k = 0; k <= steps; k++) if (inside([a[0] + ((b[0] - a[0]) * k) / steps, a[1] + ((b[1] - a[1]) * k) / steps])) return true;
  }
  return false;
}
