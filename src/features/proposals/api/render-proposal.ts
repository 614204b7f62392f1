import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/** POST /api/proposals/:id/render (202) — queue a PDF of the draft as it stands; also the retry after a failure. */
export async function renderProposal(proposalId: string): Promise<ProposalRecord> {
  const { proposal } = await apiClient.post<{ proposal: ProposalRecord }>(`/proposals/${encodeURIComponent(proposalId)}/render`);
  return proposal;
}

export function useRenderProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: renderProposal,
    onSuccess: (proposal) => {
      queryClient.setQueryData(proposalKeys.render(proposal.id), proposal.render);
      void queryClient.invalidateQueries({ queryKey: proposalKeys.render(proposal.id) });
    },
  });
}
