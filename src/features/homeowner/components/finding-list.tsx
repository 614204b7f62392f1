import { homeownerFindings } from "@shared/proposals/homeowner-words";
import type { SnapshotFinding } from "@shared/proposals/types";
import { SeverityBadge } from "@/components/ui/badge";

const SEVERITY_WORDS = { critical: "Needs fixing", warning: "Worth fixing", info: "Good to know" } as const;

/** What we found, in the homeowner's words: a plain sentence for each, the technical note folded away beside it. */
export function FindingList({ findings }: { findings: (SnapshotFinding & { space?: string })[] }) {
  const shown = homeownerFindings(findings);
  if (shown.length === 0) return null;
  return (
    <ul className="space-y-3" aria-label="What we found">
      {shown.map((f) => (
        <li key={`${f.space ?? ""}-${f.code}`} className="space-y-2 rounded-md border border-ink-200 bg-white p-4" data-finding={f.code}>
          <SeverityBadge severity={f.severity}>{SEVERITY_WORDS[f.severity]}</SeverityBadge>
          <p className="text-lg font-semibold text-ink-900">
            {f.title}
            {f.space ? <span className="font-normal text-ink-700"> ({f.space})</span> : null}
          </p>
          {f.plain ? <p className="text-base text-ink-800">{f.plain}</p> : null}
          {f.detail ? (
            <details>
              <summary className="flex min-h-touch cursor-pointer items-center text-base font-semibold text-ember-700">The technical note</summary>
              <p className="text-base text-ink-700">{f.detail}</p>
            </details>
          ) : null}
        </li>
      ))}
    </ul>
  );
}
