import { apiClient } from "@/lib/api-client";
import type { ProposalDetail } from "./types";

/** GET /api/proposals/:id — the revision, its frozen snapshot once sent, and its audit events. */
export function getProposal(proposalId: string, signal?: AbortSignal): Promise<ProposalDetail> {
  return apiClient.get<ProposalDetail>(`/proposals/${encodeURIComponent(proposalId)}`, { signal });
}
