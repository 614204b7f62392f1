import { formatDateTime } from "@/lib/format-date";
import type { ProposalEvent } from "../api/types";
import { eventLabel, shortHash } from "../lib/status";

function detailWords(e: ProposalEvent): string[] {
  const d = e.detail ?? {};
  const words: string[] = [];
  if (e.event === "sent" && typeof d.to === "string") words.push(`To ${d.to}`);
  if (e.event === "accepted") {
    if (typeof d.signerName === "string") words.push(`Signed by ${d.signerName} (${d.signature === "drawn" ? "drawn signature" : "typed signature"})`);
    if (e.consentTextVersion) words.push(`Agreed to sign electronically, consent text ${e.consentTextVersion}`);
  }
  if (e.event === "declined") words.push(typeof d.reason === "string" && d.reason ? `Reason: “${d.reason}”` : "No reason given");
  if (e.event === "superseded" && typeof d.revision === "number") words.push(`By revision ${d.revision}`);
  if (e.ip) words.push(`From ${e.ip}`);
  return words;
}

/** The append-only record of what happened to this revision, oldest first, with the evidence kept. */
export function AuditTrail({ events }: { events: ProposalEvent[] }) {
  if (events.length === 0) return <p className="text-base text-ink-600">Nothing has happened yet.</p>;
  return (
    <ol aria-label="Audit trail" className="space-y-3">
      {events.map((e) => (
        <li key={e.id} data-event={e.event} className="border-l-3 border-ink-200 pl-3">
          <p className="text-base font-semibold text-ink-900">{eventLabel(e.event)}</p>
          <p className="text-sm text-ink-700">
            <time dateTime={e.at}>{formatDateTime(e.at)}</time>
          </p>
          {detailWords(e).map((w) => (
            <p key={w} className="text-sm break-words text-ink-700">
              {w}
            </p>
          ))}
          {e.userAgent ? (
            <p className="truncate text-sm text-ink-600" title={e.userAgent}>
              Browser: {e.userAgent}
            </p>
          ) : null}
          {e.pdfSha256 || e.snapshotSha256 ? (
            <p className="font-mono text-xs text-ink-600">
              {e.snapshotSha256 ? <span title={e.snapshotSha256}>content {shortHash(e.snapshotSha256)} </span> : null}
              {e.pdfSha256 ? <span title={e.pdfSha256}>PDF {shortHash(e.pdfSha256)}</span> : null}
            </p>
          ) : null}
        </li>
      ))}
    </ol>
  );
}
