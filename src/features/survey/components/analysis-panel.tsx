import { lazy, memo, Suspense } from "react";
import { FindingsList } from "@/components/findings/findings-list";
import type { UnitSystem } from "@shared/units/format";
import { formatAirflowCfm, formatAreaSqFt, formatNfaSqIn } from "@shared/units/format";
import { sortFindings, type AtticAnalysis, type AtticInput, type TryAnalyzeResult } from "@shared/ventilation/index";
import { SeverityBadge } from "@/components/ui/badge";
import { WarningIcon } from "@/components/ui/icons";
import type { Problem } from "../lib/drafts";
import { useAirflowEstimate } from "../hooks/use-airflow-estimate";
import { AirflowEstimateSection } from "./airflow-estimate-section";
import { BalanceBar } from "./balance-bar";

// The picture (its layout code and drawing) is the panel's last and largest part: it loads after the
// workspace has painted, so the page's first code stays small (issue 17, delivery).
const AirflowSection = lazy(() => import("./airflow-section").then(({ AirflowSection }) => ({ default: AirflowSection })));

function AirflowSectionLoading() {
  return (
    <section aria-labelledby="airflow-title" className="space-y-2">
      <h3 id="airflow-title" className="text-lg font-semibold text-ink-900">
        Airflow picture
      </h3>
      <p className="text-base text-ink-700">Drawing the picture…</p>
    </section>
  );
}

export interface AnalysisPanelProps {
  spaceName: string;
  input: AtticInput;
  result: TryAnalyzeResult;
  /** Entries not complete yet (left out of this result). */
  problems: Problem[];
  unitSystem: UnitSystem;
  onJumpTo?: (partId: string) => void;
  /** False while the panel is hidden (the phone's Survey tab), so hidden work can wait. */
  isShown?: boolean;
}

function Figure({ label, value, sub }: { label: string; value: string; sub?: string }) {
  return (
    <div className="rounded-md border border-ink-200 bg-white px-3 py-2.5">
      <dt className="text-sm text-ink-600">{label}</dt>
      <dd className="text-xl font-semibold tabular-nums text-ink-900">{value}</dd>
      {sub ? <dd className="text-sm text-ink-700">{sub}</dd> : null}
    </div>
  );
}

/** Turns an issue path from the core ("sections") into words for the to-do list. */
function issueText(issue: { path: string; message: string }): string {
  return issue.message;
}

/** The live analysis of one space, from the same core the server and the PDF use. */
export const AnalysisPanel = memo(function AnalysisPanel({ spaceName, input, result, problems, unitSystem, onJumpTo, isShown = true }: AnalysisPanelProps) {
  const airflow = useAirflowEstimate(result.ok ? input : null);
  const todo = problems.length > 0 ? (
    <section aria-labelledby="todo-title" className="space-y-2 rounded-lg border border-warning-200 bg-warning-50 p-4">
      <h3 id="todo-title" className="flex items-center gap-2 text-base font-semibold text-warning-900">
        <WarningIcon className="text-warning-600" /> Still to finish
      </h3>
      <p className="text-sm text-warning-900">These entries are kept on this device and left out until they are complete.</p>
      <ul className="space-y-1 text-base text-warning-900">
        {problems.map((p, i) => (
          <li key={`${p.where}-${i}`}>
            {p.partId && onJumpTo ? (
              <button type="button" className="min-h-touch text-left underline underline-offset-4 md:min-h-0" onClick={() => onJumpTo(p.partId!)}>
                <span className="font-semibold">{p.where}:</span> {p.message}
              </button>
            ) : (
              <>
                <span className="font-semibold">{p.where}:</span> {p.message}
              </>
            )}
          </li>
        ))}
      </ul>
    </section>
  ) : null;

  if (!result.ok) {
    return (
      <div className="space-y-4">
        <h2 className="text-xl font-semibold text-ink-900">Analysis · {spaceName}</h2>
        <section className="space-y-2 rounded-lg border border-ink-200 bg-ink-25 p-4">
          <h3 className="text-base font-semibold text-ink-900">To see the analysis</h3>
          <ul className="list-disc space-y-1 pl-5 text-base text-ink-800">
            {[...new Set(result.issues.map(issueText))].map((text) => (
              <li key={text}>{text}</li>
            ))}
          </ul>
        </section>
        {todo}
      </div>
    );
  }

  const a = result.analysis;
  const findings = sortFindings(a.findings);
  return (
    // The figures shown, exact, for checks that compare this page with the server's analysis.
    <div className="space-y-6" data-analysis-figures={analysisFigures(a)}>
      <div className="space-y-2">
        <h2 className="text-xl font-semibold text-ink-900">Analysis · {spaceName}</h2>
        <div className="flex flex-wrap items-center gap-2">
          {a.assembly === "unvented" ? (
            <SeverityBadge severity={a.compliant ? "ok" : "critical"}>{a.compliant ? "Sealed attic: conditions met" : "Sealed attic: conditions to check"}</SeverityBadge>
          ) : (
            <SeverityBadge severity={a.compliant ? "ok" : "critical"}>{a.compliant ? "Meets the code minimum" : "Does not meet the code minimum"}</SeverityBadge>
          )}
          <span className="text-sm text-ink-700">
            Floor {formatAreaSqFt(a.floorAreaSqFt, unitSystem)}
            {a.assembly === "unvented" ? " · sealed (IRC R806.5)" : ` · 1/${a.requirement.ratio}`}
          </span>
        </div>
        <p className="text-base text-ink-800">{a.summary}</p>
      </div>
      {todo}

      {a.assembly === "unvented" && a.unvented ? (
        <section aria-labelledby="sealed-title" className="space-y-3">
          <h3 id="sealed-title" className="text-lg font-semibold text-ink-900">
            Sealed attic (IRC R806.5)
          </h3>
          <p className="text-base text-ink-800">No vent area is required, and none should be added. What the code checks instead:</p>
          <ul className="space-y-1.5 text-base text-ink-800">
            {a.unvented.conditions.map((c) => (
              <li key={c.id} className="flex gap-2">
                <span className="shrink-0 font-semibold" aria-hidden="true">
                  {c.status === "met" ? "✓" : c.status === "not-applicable" ? "–" : c.status === "unknown" ? "?" : "!"}
                </span>
                <span>
                  <span className="sr-only">{c.status === "met" ? "Met: " : c.status === "not-applicable" ? "Does not apply: " : c.status === "unknown" ? "Not recorded: " : "Not met: "}</span>
                  {c.reason}
                </span>
              </li>
            ))}
          </ul>
        </section>
      ) : (
        <>
      <section aria-labelledby="required-title" className="space-y-3">
        <h3 id="required-title" className="text-lg font-semibold text-ink-900">
          Vent area
        </h3>
        <dl className="grid grid-cols-2 gap-2">
          <Figure label={`Required at 1/${a.requirement.ratio}`} value={formatNfaSqIn(a.requirement.totalSqIn, unitSystem)} />
          <Figure label="Provided (passive)" value={formatNfaSqIn(a.provided.totalSqIn, unitSystem)} />
          <Figure label="Intake (low)" value={formatNfaSqIn(a.provided.intakeSqIn, unitSystem)} sub={`at least ${formatNfaSqIn(a.requirement.split.lowerMinSqIn, unitSystem)} wanted`} />
          <Figure label="Exhaust (high)" value={formatNfaSqIn(a.provided.exhaustSqIn, unitSystem)} sub={`${formatNfaSqIn(a.requirement.split.upperMinSqIn, unitSystem)}–${formatNfaSqIn(a.requirement.split.upperMaxSqIn, unitSystem)} wanted`} />
        </dl>
        <details className="rounded-md border border-ink-200 bg-white px-3 py-2">
          <summary className="min-h-touch cursor-pointer py-2 font-medium text-ink-900 md:min-h-0">
            Why {formatNfaSqIn(a.requirement.totalSqIn, unitSystem)} is required
          </summary>
          <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
            {a.requirement.reasons.map((reason) => (
              <li key={reason}>{reason}</li>
            ))}
          </ul>
        </details>
        {a.rafterBays ? (
          <div className="rounded-md border border-ink-200 bg-white px-3 py-2 text-base text-ink-800">
            <p className="font-medium text-ink-900">
              {a.rafterBays.isMet ? "✓ Every rafter bay is vented" : "! Not every rafter bay is vented enough"} (IRC R806.1, per bay)
            </p>
            {a.rafterBays.reasons.map((r) => (
              <p key={r}>{r}</p>
            ))}
          </div>
        ) : null}
        {a.recommendations.length > 0 ? (
          <details className="rounded-md border border-ink-200 bg-white px-3 py-2">
            <summary className="min-h-touch cursor-pointer py-2 font-medium text-ink-900 md:min-h-0">Above the minimum: recommended, not code</summary>
            <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
              {a.recommendations.map((r) => (
                <li key={r.id}>
                  <span className="font-medium">{r.title}.</span> {r.detail} <span className="text-ink-600">Source: {r.source}.</span>
                </li>
              ))}
            </ul>
          </details>
        ) : null}
        {a.provided.perVent.length > 0 ? (
          <details className="rounded-md border border-ink-200 bg-white px-3 py-2">
            <summary className="min-h-touch cursor-pointer py-2 font-medium text-ink-900 md:min-h-0">Each vent</summary>
            <ul className="list-disc space-y-1 pt-1 pb-2 pl-5 text-base text-ink-800">
              {a.provided.perVent.map((v) => (
                <li key={v.ventId}>{v.explanation}</li>
              ))}
            </ul>
          </details>
        ) : null}
      </section>

          <section aria-labelledby="balance-title" className="space-y-2">
        <h3 id="balance-title" className="text-lg font-semibold text-ink-900">
          Balance
        </h3>
        <BalanceBar intakeSqIn={a.provided.intakeSqIn} exhaustSqIn={a.provided.exhaustSqIn} unitSystem={unitSystem} />
      </section>

        </>
      )}

      {a.fan ? (
        <section aria-labelledby="fan-title" className="space-y-3">
          <h3 id="fan-title" className="text-lg font-semibold text-ink-900">
            Powered fan
          </h3>
          <dl className="grid grid-cols-2 gap-2">
            <Figure label="Installed" value={formatAirflowCfm(a.fan.installedCfm, unitSystem)} />
            <Figure label="Recommended" value={formatAirflowCfm(a.fan.recommendedCfm, unitSystem)} />
            <Figure label="Intake the fan needs" value={formatNfaSqIn(a.fan.intakeNeededSqIn, unitSystem)} />
            <Figure
              label="Intake there is"
              value={formatNfaSqIn(a.fan.intakeProvidedSqIn, unitSystem)}
              sub={a.fan.intakeProvidedSqIn >= a.fan.intakeNeededSqIn ? "✓ enough for the fan" : "! short of what the fan needs"}
            />
          </dl>
          <details className="rounded-md border border-ink-200 bg-white px-3 py-2">
            <summary className="min-h-touch cursor-pointer py-2 font-medium text-ink-900 md:min-h-0">How the fan was sized</summary>
            <ul className="list-disc space-y-1.5 pt-1 pb-2 pl-5 text-base text-ink-800">
              {a.fan.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ul>
          </details>
        </section>
      ) : null}

      <section aria-labelledby="findings-title" className="space-y-3">
        <h3 id="findings-title" className="text-lg font-semibold text-ink-900">
          Findings <span className="font-normal text-ink-600">({findings.length})</span>
        </h3>
        <FindingsList findings={findings} emptyText="Nothing to flag in this space." />
      </section>

      <AirflowEstimateSection estimate={airflow.estimate} ifFansRan={airflow.ifFansRan} conditions={airflow.conditions} isDefaultConditions={airflow.isDefaultConditions} unitSystem={unitSystem} />

      <Suspense fallback={<AirflowSectionLoading />}>
        <AirflowSection input={input} analysis={a} airflow={airflow.estimate?.results.summer ?? null} spaceName={spaceName} isShown={isShown} />
      </Suspense>
    </div>
  );
});

/** The verdict and the figures that decide it, unrounded, as one JSON text (see `data-analysis-figures`). */
export function analysisFigures(a: AtticAnalysis): string {
  return JSON.stringify({
    compliant: a.compliant,
    floorAreaSqFt: a.floorAreaSqFt,
    ratio: a.requirement.ratio,
    requiredSqIn: a.requirement.totalSqIn,
    intakeSqIn: a.provided.intakeSqIn,
    exhaustSqIn: a.provided.exhaustSqIn,
    findings: a.findings.map((f) => f.code).sort(),
  });
}
