import type { ProposalStatus } from "@shared/proposals/types";
import { Badge, SeverityBadge, type Severity } from "@/components/ui/badge";
import { formatDateTime } from "@/lib/format-date";
import { STATUS_LABELS } from "../lib/status";

const SEVERITY: Record<Exclude<ProposalStatus, "draft">, Severity> = {
  sent: "info",
  viewed: "info",
  accepted: "ok",
  declined: "critical",
  expired: "warning",
};

/** The proposal's status as icon + word (never colour alone), with its time when known. */
export function StatusBadge({ status, at }: { status: ProposalStatus; at?: string | null }) {
  const time = at ? <span className="font-normal">· {formatDateTime(at)}</span> : null;
  if (status === "draft") {
    return (
      <Badge tone="outline" data-status={status}>
        <span className="font-semibold">Draft</span> {time}
      </Badge>
    );
  }
  return (
    <SeverityBadge severity={SEVERITY[status]} data-status={status}>
      {STATUS_LABELS[status]} {time}
    </SeverityBadge>
  );
}
