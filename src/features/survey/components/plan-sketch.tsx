import { memo } from "react";
import { formatAreaSqFt, formatLength, type UnitSystem } from "@shared/units/format";
import { shoelaceAreaSqFt } from "@shared/ventilation/index";
import type { SectionDraft } from "../lib/drafts";

interface Shape {
  index: number;
  kind: SectionDraft["kind"];
  /** Outline in feet, x to the right, y down, starting at 0,0. */
  points: [number, number][];
  widthFt: number;
  heightFt: number;
  label: string;
  /** Dimension labels along the top and left edges (rectangles). */
  top?: string;
  side?: string;
}

function shapeOf(section: SectionDraft, index: number, system: UnitSystem): Shape | null {
  const label = section.label.trim() || `Section ${index + 1}`;
  if (section.kind === "rect") {
    const l = section.length.value;
    const w = section.width.value;
    if (!l || !w) return null;
    return {
      index,
      kind: "rect",
      points: [[0, 0], [l, 0], [l, w], [0, w]],
      widthFt: l,
      heightFt: w,
      label,
      top: formatLength(l, system),
      side: formatLength(w, system),
    };
  }
  if (section.kind === "area") {
    const a = section.area.value;
    if (!a) return null;
    const side = Math.sqrt(a);
    return { index, kind: "area", points: [[0, 0], [side, 0], [side, side], [0, side]], widthFt: side, heightFt: side, label: `${formatAreaSqFt(a, system)} entered` };
  }
  const pts = section.points.flatMap((p) => (p.x.value !== null && p.y.value !== null ? [[p.x.value, p.y.value] as [number, number]] : []));
  if (pts.length < 2) return null;
  const minX = Math.min(...pts.map((p) => p[0]));
  const minY = Math.min(...pts.map((p) => p[1]));
  const moved = pts.map(([x, y]) => [x - minX, y - minY] as [number, number]);
  const widthFt = Math.max(...moved.map((p) => p[0]));
  const heightFt = Math.max(...moved.map((p) => p[1]));
  const area = pts.length >= 3 ? shoelaceAreaSqFt(pts) : 0;
  return { index, kind: "polygon", points: moved, widthFt, heightFt, label: area > 0 ? `${label}: ${formatAreaSqFt(area, system)}` : label };
}

/** Area centroid of an outline (falls inside an L, unlike the box centre); the box centre otherwise. */
function labelPoint(shape: Shape): [number, number] {
  const pts = shape.points;
  let a = 0;
  let cx = 0;
  let cy = 0;
  for (let i = 0; i < pts.length; i += 1) {
    const [x1, y1] = pts[i]!;
    const [x2, y2] = pts[(i + 1) % pts.length]!;
    const cross = x1 * y2 - x2 * y1;
    a += cross;
    cx += (x1 + x2) * cross;
    cy += (y1 + y2) * cross;
  }
  if (shape.kind !== "polygon" || Math.abs(a) < 1e-9) return [shape.widthFt / 2, shape.heightFt / 2];
  return [cx / (3 * a), cy / (3 * a)];
}

/** A tidy step for the scale bar: 1, 2, 5, 10, 20, 50 … ft. */
function niceStep(spanFt: number): number {
  const raw = spanFt / 4;
  const power = 10 ** Math.floor(Math.log10(raw));
  return [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
}

export interface PlanSketchProps {
  sections: SectionDraft[];
  unitSystem: UnitSystem;
}

/**
 * The attic floor drawn to scale as it is typed: rectangles with their sides, outlines corner by
 * corner, entered areas as a dashed square of the same area. Sections sit side by side, top
 * edges aligned, so a main block and a wing read as an L.
 */
export const PlanSketch = memo(function PlanSketch({ sections, unitSystem }: PlanSketchProps) {
  const shapes = sections.map((s, i) => shapeOf(s, i, unitSystem)).filter((s): s is Shape => s !== null);
  if (shapes.length === 0) {
    return (
      <div className="flex h-32 items-center justify-center rounded-md border border-dashed border-ink-300 bg-ink-25 px-4 text-center text-sm text-ink-600">
        The plan sketch appears here as you enter the sections.
      </div>
    );
  }
  const placed = shapes.map((shape, i) => ({
    shape,
    offsetX: shapes.slice(0, i).reduce((sum, s) => sum + s.widthFt, 0),
  }));
  const totalW = Math.max(shapes.reduce((sum, s) => sum + s.widthFt, 0), 1);
  const totalH = Math.max(...shapes.map((s) => s.heightFt), 1);
  const span = Math.max(totalW, totalH);
  const pad = span * 0.12;
  const font = span / 24;
  const step = niceStep(totalW);
  const viewBox = `${-pad} ${-pad} ${totalW + pad * 2} ${totalH + pad * 2 + font * 2.5}`;
  const description = placed.map(({ shape }) => (shape.top ? `${shape.label}, ${shape.top} by ${shape.side}` : shape.label)).join("; ");

  return (
    <figure className="space-y-1">
      <svg
        viewBox={viewBox}
        role="img"
        aria-label={`Plan sketch to scale: ${description}`}
        className="h-auto max-h-72 w-full rounded-md border border-ink-200 bg-white"
        preserveAspectRatio="xMidYMid meet"
      >
        <defs>
          <pattern id="sketch-hatch" width={font} height={font} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <line x1="0" y1="0" x2="0" y2={font} stroke="#CDD3DB" strokeWidth={font / 6} />
          </pattern>
        </defs>
        {placed.map(({ shape, offsetX }) => {
          const points = shape.points.map(([px, py]) => `${px + offsetX},${py}`).join(" ");
          const cx = offsetX + shape.widthFt / 2;
          const cy = shape.heightFt / 2;
          const [lx, ly] = labelPoint(shape);
          return (
            <g key={shape.index}>
              {shape.points.length >= 3 ? (
                <polygon
                  points={points}
                  fill={shape.kind === "area" ? "url(#sketch-hatch)" : "#FFF4EC"}
                  stroke={shape.kind === "area" ? "#5E6977" : "#973A0C"}
                  strokeWidth={font / 5}
                  strokeDasharray={shape.kind === "area" ? `${font / 1.5} ${font / 2.5}` : undefined}
                  strokeLinejoin="round"
                />
              ) : (
                <polyline points={points} fill="none" stroke="#973A0C" strokeWidth={font / 5} />
              )}
              {shape.points.map(([px, py], i) =>
                shape.kind === "polygon" ? <circle key={i} cx={px + offsetX} cy={py} r={font / 3} fill="#973A0C" /> : null,
              )}
              <text x={offsetX + lx} y={ly} textAnchor="middle" dominantBaseline="middle" fontSize={font} fill="#171C24" fontWeight={600}>
                {shape.index + 1}
              </text>
              {shape.top ? (
                <text x={cx} y={-font * 0.6} textAnchor="middle" fontSize={font * 0.9} fill="#363F4B">
                  {shape.top}
                </text>
              ) : null}
              {shape.side ? (
                <text
                  x={offsetX - font * 0.6}
                  y={cy}
                  textAnchor="middle"
                  fontSize={font * 0.9}
                  fill="#363F4B"
                  transform={`rotate(-90 ${offsetX - font * 0.6} ${cy})`}
                >
                  {shape.side}
                </text>
              ) : null}
            </g>
          );
        })}
        <g transform={`translate(0 ${totalH + font * 1.6})`}>
          <line x1={0} y1={0} x2={step} y2={0} stroke="#171C24" strokeWidth={font / 5} />
          <line x1={0} y1={-font / 3} x2={0} y2={font / 3} stroke="#171C24" strokeWidth={font / 6} />
          <line x1={step} y1={-font / 3} x2={step} y2={font / 3} stroke="#171C24" strokeWidth={font / 6} />
          <text x={step + font / 2} y={0} dominantBaseline="middle" fontSize={font * 0.85} fill="#363F4B">
            {formatLength(step, unitSystem)}
          </text>
        </g>
      </svg>
      <figcaption className="text-sm text-ink-600">
        To scale. {placed.map(({ shape }) => `${shape.index + 1}: ${shape.top ? `${shape.top} × ${shape.side}` : shape.label}`).join(" · ")}
      </figcaption>
    </figure>
  );
});
