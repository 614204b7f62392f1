import type { ProposalPatch } from "@shared/proposals/schemas";
import { apiClient } from "@/lib/api-client";
import type { ProposalUpdateResult } from "./types";

/** PATCH /api/proposals/:id with the version edited; on a sent revision the server makes a new draft revision. */
export function updateProposal(proposalId: string, patch: ProposalPatch): Promise<ProposalUpdateResult> {
  return apiClient.patch<ProposalUpdateResult>(`/proposals/${encodeURIComponent(proposalId)}`, patch as Record<string, unknown>);
}
