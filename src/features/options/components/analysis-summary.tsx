import type { UnitSystem } from "@shared/units/format";
import { formatAreaSqFt, formatNfaSqIn } from "@shared/units/format";
import { meetsRequiredArea, type AtticAnalysis, type Finding, type TryAnalyzeResult } from "@shared/ventilation/index";
import { Badge, SeverityBadge, type Severity } from "@/components/ui/badge";
import { WarningIcon } from "@/components/ui/icons";
import { cn } from "@/lib/cn";
import { rangeMark, rangeStanding, rangeWords } from "../lib/vent-range";

export const SEVERITIES = ["critical", "warning", "info"] as const;
const SEVERITY_WORDS: Record<(typeof SEVERITIES)[number], [string, string]> = {
  critical: ["critical", "critical"],
  warning: ["warning", "warnings"],
  info: ["note", "notes"],
};

export function findingCounts(findings: readonly Finding[]): Record<(typeof SEVERITIES)[number], number> {
  return {
    critical: findings.filter((f) => f.severity === "critical").length,
    warning: findings.filter((f) => f.severity === "warning").length,
    info: findings.filter((f) => f.severity === "info").length,
  };
}

/** "2 critical · 1 warning · 0 notes" as badges (icon + word, never colour alone). */
export function FindingCounts({ findings, className }: { findings: readonly Finding[]; className?: string }) {
  const counts = findingCounts(findings);
  return (
    <ul className={cn("flex flex-wrap gap-2", className)} aria-label="Findings by severity">
      {SEVERITIES.map((s) => (
        <li key={s}>
          {counts[s] === 0 ? (
            <Badge tone="outline" data-count={s}>
              0 {SEVERITY_WORDS[s][1]}
            </Badge>
          ) : (
            <SeverityBadge severity={s as Severity} data-count={s}>
              {counts[s]} {SEVERITY_WORDS[s][counts[s] === 1 ? 0 : 1]}
            </SeverityBadge>
          )}
        </li>
      ))}
    </ul>
  );
}

export function ComplianceBadge({ analysis }: { analysis: AtticAnalysis }) {
  return (
    <SeverityBadge severity={analysis.compliant ? "ok" : "critical"} data-compliant={analysis.compliant}>
      {analysis.compliant ? "Meets the code minimum" : "Does not meet the code minimum"}
    </SeverityBadge>
  );
}

function Figure({ label, value, sub, isShort }: { label: string; value: string; sub?: string; isShort?: boolean }) {
  return (
    <div className={cn("rounded-md border bg-white px-3 py-2", isShort ? "border-warning-600" : "border-ink-200")}>
      <dt className="text-sm text-ink-600">{label}</dt>
      <dd className="text-lg font-semibold tabular-nums text-ink-900">{value}</dd>
      {sub ? <dd className={cn("text-sm", isShort ? "font-medium text-warning-800" : "text-ink-700")}>{sub}</dd> : null}
    </div>
  );
}

/** Required against provided, intake and exhaust, and the balance, in words and figures. */
export function VentAreaFigures({ analysis: a, unitSystem }: { analysis: AtticAnalysis; unitSystem: UnitSystem }) {
  if (a.assembly === "unvented") {
    return <p className="text-base text-ink-800">Sealed (unvented) attic under IRC R806.5: no vent area is required, and none should be added.</p>;
  }
  // A ✓ only beside a value inside its range; the verdict on the total compares exact figures (never rounded).
  const meetsTotal = meetsRequiredArea(a.provided.exactTotalSqIn, a.requirement.exactSqIn);
  const intake = rangeStanding(a.provided.intakeSqIn, a.requirement.split.lowerMinSqIn);
  const exhaust = rangeStanding(a.provided.exhaustSqIn, a.requirement.split.upperMinSqIn, a.requirement.split.upperMaxSqIn);
  const isIntakeShort = intake !== "in-range";
  const isExhaustOut = exhaust !== "in-range";
  const isBalanced = a.provided.intakeSqIn >= a.provided.exhaustSqIn;
  const hasPassive = a.provided.intakeSqIn + a.provided.exhaustSqIn > 0;
  return (
    <div className="space-y-2">
      <dl className="grid grid-cols-2 gap-2">
        <Figure
          label={`Required (1/${a.requirement.ratio})`}
          value={formatNfaSqIn(a.requirement.totalSqIn, unitSystem)}
          sub={`Floor ${formatAreaSqFt(a.floorAreaSqFt, unitSystem)}`}
        />
        <Figure
          label="Provided"
          value={formatNfaSqIn(a.provided.totalSqIn, unitSystem)}
          sub={meetsTotal ? "✓ at least the required area" : "! less than required"}
          isShort={!meetsTotal}
        />
        <Figure
          label="Intake (low)"
          value={formatNfaSqIn(a.provided.intakeSqIn, unitSystem)}
          sub={`${rangeMark(intake)} ${intake === "in-range" ? "at least " : ""}${rangeWords(intake, formatNfaSqIn(a.requirement.split.lowerMinSqIn, unitSystem))}`}
          isShort={isIntakeShort}
        />
        <Figure
          label="Exhaust (high)"
          value={formatNfaSqIn(a.provided.exhaustSqIn, unitSystem)}
          sub={`${rangeMark(exhaust)} ${rangeWords(exhaust, `${formatNfaSqIn(a.requirement.split.upperMinSqIn, unitSystem)}–${formatNfaSqIn(a.requirement.split.upperMaxSqIn, unitSystem)}`)}`}
          isShort={isExhaustOut}
        />
      </dl>
      <p className={cn("text-base font-medium", !hasPassive || isBalanced ? "text-ink-800" : "text-warning-800")} data-balance={isBalanced ? "balanced" : "exhaust-heavy"}>
        {!hasPassive
          ? "Balance: no passive intake or exhaust vents."
          : isBalanced
            ? "✓ Balance: intake is at least equal to exhaust."
            : "! Balance: more exhaust than intake. Add intake at the eaves or reduce exhaust."}
      </p>
    </div>
  );
}

/** Why the option does or doesn't comply, in a few sentences. */
export function ComplianceReasons({ analysis }: { analysis: AtticAnalysis }) {
  const critical = analysis.findings.filter((f) => f.severity === "critical");
  return (
    <div className="space-y-2">
      <p className="text-base text-ink-800">{analysis.summary}</p>
      {!analysis.compliant && critical.length > 0 ? (
        <ul className="list-disc space-y-1 pl-5 text-base text-ink-800">
          {critical.map((f, i) => (
            <li key={`${f.code}-${i}`}>{f.title}</li>
          ))}
        </ul>
      ) : null}
      <details className="rounded-md border border-ink-200 bg-white px-3 py-1">
        <summary className="min-h-touch cursor-pointer py-2.5 font-medium text-ink-900 md:min-h-0 md:py-2">How the requirement was worked out</summary>
        <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
          {analysis.requirement.reasons.map((reason) => (
            <li key={reason}>{reason}</li>
          ))}
        </ul>
      </details>
    </div>
  );
}

/** When the core can't analyse a space (the survey or the option is incomplete): what is missing. */
export function NotAnalysed({ result }: { result: Extract<TryAnalyzeResult, { ok: false }> }) {
  return (
    <div className="rounded-lg border border-warning-200 bg-warning-50 p-3 text-base text-warning-900">
      <p className="flex items-center gap-2 font-semibold">
        <WarningIcon className="text-warning-600" /> Can't analyse this space yet
      </p>
      <ul className="mt-1 list-disc pl-5">
        {[...new Set(result.issues.map((i) => i.message))].map((m) => (
          <li key={m}>{m}</li>
        ))}
      </ul>
    </div>
  );
}
