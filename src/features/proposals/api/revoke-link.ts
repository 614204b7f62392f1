import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/** POST /api/proposals/:id/revoke-link — the homeowner's link stops working at once. */
export async function revokeLink(proposalId: string): Promise<ProposalRecord> {
  const { proposal } = await apiClient.post<{ proposal: ProposalRecord }>(`/proposals/${encodeURIComponent(proposalId)}/revoke-link`);
  return proposal;
}

export function useRevokeLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: revokeLink,
    onSuccess: (proposal) => void queryClient.invalidateQueries({ queryKey: proposalKeys.detail(proposal.id) }),
  });
}
