import type { ProposalStatus, RenderStatus } from "@shared/proposals/types";
import type { ProposalRecord } from "../api/types";

export const STATUS_LABELS: Record<ProposalStatus, string> = {
  draft: "Draft",
  sent: "Sent",
  viewed: "Viewed",
  accepted: "Accepted",
  declined: "Declined",
  expired: "Expired",
};

/** The time that goes with the status, for "Sent · Dec 8, 10:04". */
export function statusTime(p: Pick<ProposalRecord, "status" | "createdAt" | "sentAt" | "viewedAt" | "decidedAt" | "link">): string | null {
  switch (p.status) {
    case "draft":
      return p.createdAt;
    case "sent":
      return p.sentAt;
    case "viewed":
      return p.viewedAt;
    case "accepted":
    case "declined":
      return p.decidedAt;
    case "expired":
      return p.link.expiresAt;
  }
}

export const RENDER_LABELS: Record<RenderStatus, string> = {
  none: "Not prepared yet",
  queued: "Waiting to start",
  rendering: "Drawing the pages",
  ready: "Ready",
  failed: "Failed",
};

/** Audit events in words (server/modules/proposals: proposals.service.ts and proposal-jobs.ts). */
export const EVENT_LABELS: Record<string, string> = {
  created: "Draft created",
  sent: "Signed by the seller and sent",
  viewed: "Opened by the homeowner",
  accepted: "Accepted and signed by the homeowner",
  declined: "Declined by the homeowner",
  expired: "Expired (validity date passed)",
  reminded: "Reminder e-mailed",
  "link-revoked": "Link revoked",
  "link-reissued": "New link e-mailed (the old one stopped)",
  resent: "E-mail sent again (same link)",
  "recipient-changed": "Homeowner's e-mail address changed",
  superseded: "Replaced by a new revision",
  "pdf-created": "PDF made",
  "signed-pdf-created": "Signed PDF made",
};

export const eventLabel = (event: string) => EVENT_LABELS[event] ?? event.replace(/-/g, " ");

/** A long hash shortened for reading; the full value stays in the title attribute. */
export const shortHash = (sha: string | null | undefined) => (sha ? `${sha.slice(0, 12)}…` : null);
