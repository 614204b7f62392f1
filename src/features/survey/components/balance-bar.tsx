import type { UnitSystem } from "@shared/units/format";
import { formatNfaSqIn, formatPercent } from "@shared/units/format";

export interface BalanceBarProps {
  intakeSqIn: number;
  exhaustSqIn: number;
  unitSystem: UnitSystem;
}

/** Common practice: intake at least equal to exhaust, ideally 50–60 % of the total. */
function verdict(intakeShare: number): { words: string; tone: "ok" | "warning" } {
  if (intakeShare < 0.5) return { words: "More exhaust than intake: add intake at the eaves, or reduce exhaust.", tone: "warning" };
  if (intakeShare <= 0.6) return { words: "Balanced: intake at least equal to exhaust.", tone: "ok" };
  return { words: "More intake than exhaust: fine for the attic; exhaust is the limit on airflow.", tone: "ok" };
}

/**
 * Intake versus exhaust as a picture: two segments, intake solid and exhaust hatched, a tick at
 * the even split, and both numbers written on it, so it reads in greyscale too.
 */
export function BalanceBar({ intakeSqIn, exhaustSqIn, unitSystem }: BalanceBarProps) {
  const total = intakeSqIn + exhaustSqIn;
  if (total <= 0) {
    return <p className="text-base text-ink-700">No passive intake or exhaust vents yet, so there is no balance to show.</p>;
  }
  const share = intakeSqIn / total;
  const { words, tone } = verdict(share);
  const intakePct = Math.round(share * 1000) / 10;
  return (
    <figure className="space-y-2">
      <dl className="grid grid-cols-2 gap-3 text-sm">
        <div>
          <dt className="flex items-center gap-1.5 font-medium text-ink-800">
            <span aria-hidden="true" className="inline-block size-3.5 rounded-sm bg-ink-800" /> Intake (low)
          </dt>
          <dd className="text-base font-semibold tabular-nums text-ink-900">
            {formatNfaSqIn(intakeSqIn, unitSystem)} · {formatPercent(share)}
          </dd>
        </div>
        <div className="text-right">
          <dt className="flex items-center justify-end gap-1.5 font-medium text-ink-800">
            Exhaust (high){" "}
            <span aria-hidden="true" className="inline-block size-3.5 rounded-sm border border-ember-700 bg-[repeating-linear-gradient(45deg,#973A0C_0_2px,#FFE4D1_2px_5px)]" />
          </dt>
          <dd className="text-base font-semibold tabular-nums text-ink-900">
            {formatNfaSqIn(exhaustSqIn, unitSystem)} · {formatPercent(1 - share)}
          </dd>
        </div>
      </dl>
      <svg
        viewBox="0 0 100 12"
        preserveAspectRatio="none"
        className="h-8 w-full overflow-visible rounded"
        role="img"
        aria-label={`Intake ${formatPercent(share)}, exhaust ${formatPercent(1 - share)} of the passive vent area. ${words}`}
      >
        <defs>
          <pattern id="balance-hatch" width="3" height="3" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
            <rect width="3" height="3" fill="#FFE4D1" />
            <line x1="0" y1="0" x2="0" y2="3" stroke="#973A0C" strokeWidth="1.2" />
          </pattern>
        </defs>
        <rect x="0" y="0" width={intakePct} height="12" fill="#252C36" />
        <rect x={intakePct} y="0" width={100 - intakePct} height="12" fill="url(#balance-hatch)" />
        <rect x="0" y="0" width="100" height="12" fill="none" stroke="#5E6977" strokeWidth="0.4" vectorEffect="non-scaling-stroke" />
        <line x1="50" y1="-2" x2="50" y2="14" stroke="#171C24" strokeWidth="1.5" strokeDasharray="2 1.5" vectorEffect="non-scaling-stroke" />
      </svg>
      <p className="text-center text-xs text-ink-600" aria-hidden="true">
        Solid: intake · hatched: exhaust · dashed line: an even split
      </p>
      <figcaption className={tone === "ok" ? "text-base font-medium text-ok-800" : "text-base font-medium text-warning-800"}>
        {tone === "ok" ? "✓ " : "! "}
        {words}
      </figcaption>
    </figure>
  );
}
