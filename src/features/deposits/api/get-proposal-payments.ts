import { apiClient } from "@/lib/api-client";
import type { ProposalPayments } from "./types";

/** GET /api/proposals/:id/payments — the deposit and every payment attempt (proposals:read). */
export function getProposalPayments(proposalId: string, signal?: AbortSignal): Promise<ProposalPayments> {
  return apiClient.get<ProposalPayments>(`/proposals/${encodeURIComponent(proposalId)}/payments`, { signal });
}
