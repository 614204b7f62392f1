import { useState, type MouseEvent } from "react";
import type { UnitSystem } from "@shared/units/format";
import { formatLength } from "@shared/units/format";
import { Select } from "@/components/ui/select";

export interface PolygonGridProps {
  points: [number, number][];
  onAdd: (point: [number, number]) => void;
  unitSystem: UnitSystem;
}

const SIZES = [30, 60, 100, 200];

/**
 * Tap the grid to add the outline's corners in order, snapped to whole feet (2 ft on the larger
 * grids). The list of corners beside it is the keyboard way to do the same.
 */
export function PolygonGrid({ points, onAdd, unitSystem }: PolygonGridProps) {
  const largest = Math.max(0, ...points.flatMap((p) => p));
  const [sizeFt, setSizeFt] = useState(() => SIZES.find((s) => s >= largest * 1.1) ?? 200);
  const snapFt = sizeFt > 60 ? 2 : 1;
  const major = sizeFt <= 30 ? 5 : sizeFt <= 100 ? 10 : 20;

  function onClick(event: MouseEvent<SVGSVGElement>) {
    const svg = event.currentTarget;
    const rect = svg.getBoundingClientRect();
    const x = ((event.clientX - rect.left) / rect.width) * sizeFt;
    const y = ((event.clientY - rect.top) / rect.height) * sizeFt;
    const snap = (v: number) => Math.min(sizeFt, Math.max(0, Math.round(v / snapFt) * snapFt));
    onAdd([snap(x), snap(y)]);
  }

  const lines = [];
  for (let v = 0; v <= sizeFt; v += snapFt * (sizeFt > 100 ? 5 : 1)) {
    const isMajor = v % major === 0;
    lines.push(
      <g key={v}>
        <line x1={v} y1={0} x2={v} y2={sizeFt} stroke={isMajor ? "#AAB3BF" : "#E6E9EE"} strokeWidth={sizeFt / 400} />
        <line x1={0} y1={v} x2={sizeFt} y2={v} stroke={isMajor ? "#AAB3BF" : "#E6E9EE"} strokeWidth={sizeFt / 400} />
      </g>,
    );
  }

  return (
    <div className="space-y-2">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <p className="max-w-sm text-sm text-ink-700">
          Tap the grid at each corner, in order around the outline. Lines every {formatLength(major, unitSystem)}; corners snap to{" "}
          {formatLength(snapFt, unitSystem)}.
        </p>
        <Select
          label="Grid size"
          className="w-40"
          options={SIZES.map((s) => ({ value: String(s), label: `${formatLength(s, unitSystem)} square` }))}
          value={String(sizeFt)}
          onChange={(event) => setSizeFt(Number(event.target.value))}
        />
      </div>
      <svg
        viewBox={`0 0 ${sizeFt} ${sizeFt}`}
        className="aspect-square w-full max-w-sm cursor-crosshair touch-manipulation rounded-md border border-ink-300 bg-white"
        onClick={onClick}
        aria-hidden="true"
      >
        {lines}
        {points.length >= 2 ? (
          <polygon
            points={points.map((p) => p.join(",")).join(" ")}
            fill="#FFF4EC"
            fillOpacity={0.8}
            stroke="#973A0C"
            strokeWidth={sizeFt / 150}
            strokeLinejoin="round"
          />
        ) : null}
        {points.map(([x, y], i) => (
          <g key={i}>
            <circle cx={x} cy={y} r={sizeFt / 70} fill="#973A0C" />
            <text x={x + sizeFt / 50} y={y - sizeFt / 50} fontSize={sizeFt / 25} fill="#171C24" fontWeight={600}>
              {i + 1}
            </text>
          </g>
        ))}
      </svg>
    </div>
  );
}
