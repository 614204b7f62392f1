import { useMemo } from "react";
import {
  beforeAfterRows,
  describeConditions,
  ESTIMATE_DISCLAIMER,
  estimateAirflow,
  type EstimateConditions,
} from "@shared/airflow-model/index";
import type { AtticInput } from "@shared/ventilation/index";

export interface AirflowBeforeAfterProps {
  spaceName: string;
  before: AtticInput | null;
  after: AtticInput | null;
  conditions: EstimateConditions;
  isDefaultConditions: boolean;
}

/** An option's airflow before → after for the company's summer and winter conditions (an estimate). */
export function AirflowBeforeAfter({ spaceName, before, after, conditions, isDefaultConditions }: AirflowBeforeAfterProps) {
  const rows = useMemo(() => {
    if (!before || !after) return null;
    try {
      return beforeAfterRows(estimateAirflow(before, conditions), estimateAirflow(after, conditions));
    } catch {
      return null;
    }
  }, [before, after, conditions]);
  if (!rows) return null;
  return (
    <div className="space-y-2" data-testid="airflow-before-after">
      <table className="w-full text-left text-sm">
        <caption className="pb-1 text-left text-base font-semibold text-ink-900">Airflow estimate, before → after</caption>
        <thead>
          <tr className="border-b border-ink-200 text-ink-600">
            <th scope="col" className="py-1 pr-2 font-medium">
              <span className="sr-only">In {spaceName}, </span>Estimate
            </th>
            <th scope="col" className="py-1 pr-2 text-right font-medium">
              Now
            </th>
            <th scope="col" className="py-1 text-right font-medium">
              After
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={`${row.season}-${row.label}`} className="border-b border-ink-100 align-top">
              <th scope="row" className="py-1.5 pr-2 font-normal text-ink-800">
                <span className="font-medium capitalize">{row.season}:</span> {row.label}
              </th>
              <td className="whitespace-nowrap py-1.5 pr-2 text-right tabular-nums text-ink-800">{row.before}</td>
              <td className="whitespace-nowrap py-1.5 text-right font-semibold tabular-nums text-ink-900">→ {row.after}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="text-xs text-ink-700">
        {ESTIMATE_DISCLAIMER} Conditions: {describeConditions("summer", conditions.summer)}; {describeConditions("winter", conditions.winter)}
        {isDefaultConditions ? " (typical figures)" : ""}.
      </p>
    </div>
  );
}
