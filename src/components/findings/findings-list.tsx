import { SeverityBadge } from "@/components/ui/badge";
import { WarningIcon } from "@/components/ui/icons";
import { sortFindings, type Finding } from "@shared/ventilation/index";

/**
 * Findings in order of severity, each with its badge, what to do, and its safety caution in a box
 * of its own. The core appends the caution to the detail too, so it is taken out of the detail
 * here and shown once. Used by the survey's analysis panel and the option editor.
 */
export function FindingsList({ findings, emptyText }: { findings: readonly Finding[]; emptyText: string }) {
  const sorted = sortFindings([...findings]);
  if (sorted.length === 0) return <p className="text-base text-ink-700">{emptyText}</p>;
  return (
    <ol className="space-y-3">
      {sorted.map((f, i) => {
        const detail = f.caution ? f.detail.replace(f.caution, "").replace(/\s{2,}/g, " ").trim() : f.detail;
        return (
          <li key={`${f.code}-${i}`} data-finding={f.code} className="space-y-2 rounded-lg border border-ink-200 bg-white p-4">
            <div className="flex flex-wrap items-center gap-2">
              <SeverityBadge severity={f.severity} />
              <h4 className="text-base font-semibold text-ink-900">{f.title}</h4>
            </div>
            <p className="text-base text-ink-800">{detail}</p>
            {f.caution ? (
              <p className="flex gap-2 rounded-md bg-warning-50 px-3 py-2 text-sm text-warning-900">
                <WarningIcon className="mt-0.5 size-4 shrink-0 text-warning-600" />
                <span>{f.caution}</span>
              </p>
            ) : null}
          </li>
        );
      })}
    </ol>
  );
}
