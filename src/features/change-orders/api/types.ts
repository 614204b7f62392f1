import type { ChangeOrderLine, ChangeOrderSnapshot, ChangeOrderStatus, ChangeOrderTotals } from "@shared/change-orders/index";

/** A change order as staff see it (GET /api/proposals/:id/change-orders). */
export interface ChangeOrderRecord {
  id: string;
  projectId: string;
  proposalId: string;
  number: number;
  status: ChangeOrderStatus;
  reason: string;
  lines: ChangeOrderLine[];
  photoIds: string[];
  totals: ChangeOrderTotals | null;
  previousTotalCents: number | null;
  newTotalCents: number | null;
  pdfSha256: string | null;
  signerName: string | null;
  declineReason: string | null;
  sentAt: string | null;
  decidedAt: string | null;
  version: number;
}

/** The job's history: the signed proposal, its change orders, the total as it stands (null before acceptance). */
export interface ChangeOrderHistory {
  original: { proposalId: string; revision: number; optionName: string; totalCents: number; acceptedAt: string | null } | null;
  changeOrders: ChangeOrderRecord[];
  current: { totalCents: number; signedChangeOrders: number[] } | null;
}

/** The homeowner's view of one change order (GET /api/public/change-orders/:token). */
export interface PublicChangeOrder {
  changeOrder: { number: number; status: ChangeOrderStatus; sentAt: string | null; decidedAt: string | null; signerName: string | null; isPdfReady: boolean; pdfSha256: string | null };
  snapshot: Omit<ChangeOrderSnapshot, "photos"> & { photos: { id: string; caption: string | null }[] };
}
