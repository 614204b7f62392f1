import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/**
 * POST /api/proposals/:id/resend — the same link in a new e-mail (to the address given, saved on the
 * customer). `isQueued` is false when it was sent again less than a minute ago (nothing more is sent).
 */
export function resendProposal({ proposalId, recipientEmail }: { proposalId: string; recipientEmail?: string }): Promise<{ proposal: ProposalRecord; isQueued: boolean }> {
  return apiClient.post<{ proposal: ProposalRecord; isQueued: boolean }>(`/proposals/${encodeURIComponent(proposalId)}/resend`, recipientEmail ? { recipientEmail } : {});
}

export function useResendProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: resendProposal,
    onSuccess: ({ proposal }) => void queryClient.invalidateQueries({ queryKey: proposalKeys.detail(proposal.id) }),
  });
}
