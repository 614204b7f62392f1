import type { FanAirFrom } from "@shared/airflow-model/index";
import { formatAirflowCfm, formatPercent, type UnitSystem } from "@shared/units/format";

export interface FanSourceBarProps {
  fanCfm: number;
  from: FanAirFrom;
  unitSystem: UnitSystem;
}

const PARTS = [
  { key: "lowerVentsCfm", words: "Low vents (soffits, eaves)", pattern: "solid", swatch: "bg-ink-800" },
  { key: "upperVentsCfm", words: "Other high vents (short-circuit)", pattern: "hatched", swatch: "border border-ember-700 bg-[repeating-linear-gradient(45deg,#973A0C_0_2px,#FFE4D1_2px_5px)]" },
  { key: "houseCfm", words: "The house, through the ceiling", pattern: "dotted", swatch: "border border-critical-700 bg-[radial-gradient(#951C1C_1.2px,#FDF1F1_1.3px)] bg-[length:4px_4px]" },
] as const;

/**
 * Where the fan's air comes from, as one bar of three segments: solid for the low vents, hatched
 * for other high vents, dotted for the house. Each segment is named with its cfm and share beside
 * the bar, so it reads without colour.
 */
export function FanSourceBar({ fanCfm, from, unitSystem }: FanSourceBarProps) {
  const total = from.lowerVentsCfm + from.upperVentsCfm + from.houseCfm;
  if (total <= 0) return null;
  const segments = PARTS.map((p, i) => ({
    ...p,
    x: PARTS.slice(0, i).reduce((sum, q) => sum + (from[q.key] / total) * 100, 0),
    width: (from[p.key] / total) * 100,
    cfm: from[p.key],
    share: from[p.key] / total,
  }));
  const label = `Where the fan's ${formatAirflowCfm(Math.round(fanCfm), unitSystem)} comes from: ${segments.map((s) => `${s.words} ${formatPercent(s.share)}`).join(", ")}.`;
  return (
    <figure className="space-y-2">
      <svg viewBox="0 0 100 12" preserveAspectRatio="none" className="h-8 w-full overflow-visible rounded" role="img" aria-label={label}>
        <defs>
          <pattern id="source-hatch" width="3" height="3" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="3" height="3" fill="#FFE4D1" />
            <line x1="0" y1="0" x2="0" y2="3" stroke="#973A0C" strokeWidth="1.2" />
          </pattern>
          <pattern id="source-dots" width="2.4" height="2.4" patternUnits="userSpaceOnUse">
            <rect width="2.4" height="2.4" fill="#FDF1F1" />
            <circle cx="1.2" cy="1.2" r="0.6" fill="#951C1C" />
          </pattern>
        </defs>
        {segments.map((s) => (
          <rect key={s.key} x={s.x} y="0" width={s.width} height="12" fill={s.pattern === "solid" ? "#252C36" : s.pattern === "hatched" ? "url(#source-hatch)" : "url(#source-dots)"} />
        ))}
        <rect x="0" y="0" width="100" height="12" fill="none" stroke="#5E6977" strokeWidth="0.4" vectorEffect="non-scaling-stroke" />
      </svg>
      <dl className="divide-y divide-ink-100 text-base">
        {segments.map((s) => (
          <div key={s.key} data-fan-source={s.key} className="flex items-baseline justify-between gap-3 py-1">
            <dt className="flex items-center gap-2 text-ink-800">
              <span aria-hidden="true" className={`inline-block size-3.5 shrink-0 rounded-sm ${s.swatch}`} /> {s.words}
            </dt>
            <dd className="shrink-0 font-semibold tabular-nums text-ink-900">
              {formatAirflowCfm(Math.round(s.cfm), unitSystem)} · {formatPercent(Math.round(s.share * 100) / 100)}
            </dd>
          </div>
        ))}
      </dl>
    </figure>
  );
}
