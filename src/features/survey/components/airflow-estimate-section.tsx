import {
  describeConditions,
  ESTIMATE_DISCLAIMER,
  type AirflowEstimate,
  type AirflowResult,
  type DepressurizationCheck,
  type EstimateConditions,
} from "@shared/airflow-model/index";
import { formatAirflowCfm, formatNumber, type UnitSystem } from "@shared/units/format";
import { SeverityIcon } from "@/components/ui/badge";
import { FanSourceBar } from "./fan-source-bar";

export interface AirflowEstimateSectionProps {
  estimate: AirflowEstimate | null;
  ifFansRan: { result: AirflowResult; check: DepressurizationCheck } | null;
  conditions: EstimateConditions;
  isDefaultConditions: boolean;
  unitSystem: UnitSystem;
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

const perHour = (n: number) => `${formatNumber(n, { maxFractionDigits: 1 })} per hour`;

/** "Where the air goes": the two-zone airflow estimate of the attic as surveyed (shared/airflow-model). */
function PullNotice({ pullPa, check }: { pullPa: number | null; check: DepressurizationCheck }) {
  if (pullPa === null) return null;
  return (
    <div
      data-testid="depressurization"
      data-over-limit={check.isOverLimit}
      className={
        check.isOverLimit
          ? "flex gap-3 rounded-md border border-critical-200 bg-critical-50 px-4 py-3 text-base text-critical-900"
          : "flex gap-3 rounded-md border border-warning-200 bg-warning-50 px-4 py-3 text-base text-warning-900"
      }
    >
      <SeverityIcon severity={check.isOverLimit ? "critical" : "warning"} className="mt-0.5" />
      <p>
        <span className="font-semibold">{check.isOverLimit ? "Past the limit for gas appliances. " : "The fan pulls on the house. "}</span>
        {check.sentence}
      </p>
    </div>
  );
}

export function AirflowEstimateSection({ estimate, ifFansRan, conditions, isDefaultConditions, unitSystem }: AirflowEstimateSectionProps) {
  if (!estimate) return null;
  const { summer, winter } = estimate;
  const cfm = (n: number) => formatAirflowCfm(Math.round(n), unitSystem);
  const check = summer.depressurization;
  return (
    <section aria-labelledby="air-goes-title" className="space-y-3" data-testid="where-the-air-goes">
      <h3 id="air-goes-title" className="text-lg font-semibold text-ink-900">
        Where the air goes
      </h3>
      <p className="text-sm text-ink-700">
        An estimate for a {describeConditions("summer", conditions.summer).replace(/^summer: /, "summer afternoon: ")}
        {isDefaultConditions ? " (typical figures; the company's own are not loaded)" : ""}.
      </p>
      {summer.fanCfm > 0 ? (
        <>
          <p className="text-base text-ink-800">
            The fan moves about <strong className="tabular-nums">{cfm(summer.fanCfm)}</strong>. It takes its air from:
          </p>
          <FanSourceBar fanCfm={summer.fanCfm} from={summer.fanAirFrom} unitSystem={unitSystem} />
        </>
      ) : ifFansRan && ifFansRan.result.fanCfm > 0 ? (
        <>
          <p className="text-base text-ink-800">
            As surveyed, the fan {estimate.results.summer.fanStates[0]?.why ?? "is off"}. If it ran, it would
            move about <strong className="tabular-nums">{cfm(ifFansRan.result.fanCfm)}</strong>, taking its air from:
          </p>
          <FanSourceBar fanCfm={ifFansRan.result.fanCfm} from={ifFansRan.result.fanAirFrom} unitSystem={unitSystem} />
          <PullNotice pullPa={ifFansRan.result.houseDepressurizationByFansPa} check={ifFansRan.check} />
        </>
      ) : (
        <p className="text-base text-ink-800">No powered fan runs in these conditions: the air moves by the attic's own warmth{conditions.summer.windMph > 0 ? " and the wind" : ""}.</p>
      )}
      <dl className="grid grid-cols-2 gap-2">
        <Figure label="House air drawn up, summer" value={cfm(summer.houseAirDrawnCfm)} sub={`winter ${cfm(winter.houseAirDrawnCfm)}`} />
        <Figure label="Attic air changes, summer" value={perHour(summer.atticAirChangesPerHour)} sub={`winter ${perHour(winter.atticAirChangesPerHour)}`} />
      </dl>
      <PullNotice pullPa={summer.houseDepressurizationByFansPa} check={check} />
      <details className="rounded-md border border-ink-200 bg-white px-3 py-2">
        <summary className="min-h-touch cursor-pointer py-2 font-medium text-ink-900 md:min-h-0">How this was estimated</summary>
        <div className="space-y-2 pt-1 pb-2 text-base text-ink-800">
          <p>{ESTIMATE_DISCLAIMER}</p>
          <p className="font-medium">Assumptions</p>
          <ul className="list-disc space-y-1 pl-5">
            {estimate.assumptions.map((a) => (
              <li key={a}>{a}</li>
            ))}
          </ul>
          <p className="font-medium">The summer arithmetic</p>
          <ul className="list-disc space-y-1 pl-5">
            {estimate.results.summer.reasons.map((r) => (
              <li key={r}>{r}</li>
            ))}
          </ul>
          <p className="text-sm text-ink-700">Winter: {describeConditions("winter", conditions.winter).replace(/^winter: /, "")}.</p>
        </div>
      </details>
    </section>
  );
}
