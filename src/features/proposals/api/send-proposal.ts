import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/** POST /api/proposals/:id/send — signs with the saved signature, freezes the revision, e-mails the link once (to the address given, saved on the customer). */
export function sendProposal({ proposalId, recipientEmail }: { proposalId: string; recipientEmail?: string }): Promise<{ proposal: ProposalRecord; link: string }> {
  return apiClient.post<{ proposal: ProposalRecord; link: string }>(`/proposals/${encodeURIComponent(proposalId)}/send`, recipientEmail ? { recipientEmail } : {});
}

export function useSendProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendProposal,
    onSuccess: ({ proposal }) => {
      void queryClient.invalidateQueries({ queryKey: proposalKeys.detail(proposal.id) });
      void queryClient.invalidateQueries({ queryKey: proposalKeys.render(proposal.id) });
      void queryClient.invalidateQueries({ queryKey: proposalKeys.list(proposal.projectId) });
    },
  });
}
