import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/** POST /api/proposals/:id/reissue-link — the old link stops at once (and says it was replaced); the new one is e-mailed and answered once. */
export function reissueLink({ proposalId, recipientEmail }: { proposalId: string; recipientEmail?: string }): Promise<{ proposal: ProposalRecord; link: string }> {
  return apiClient.post<{ proposal: ProposalRecord; link: string }>(`/proposals/${encodeURIComponent(proposalId)}/reissue-link`, recipientEmail ? { recipientEmail } : {});
}

export function useReissueLink() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: reissueLink,
    onSuccess: ({ proposal }) => {
      void queryClient.invalidateQueries({ queryKey: proposalKeys.detail(proposal.id) });
      void queryClient.invalidateQueries({ queryKey: proposalKeys.list(proposal.projectId) });
    },
  });
}
