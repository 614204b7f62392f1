import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { proposalKeys } from "./queries";
import type { ProposalRecord } from "./types";

/** POST /api/projects/:id/proposals — a new draft from chosen options (scope lines generated, default terms copied). */
export async function createProposal(input: { projectId: string; optionIds: string[]; validUntil?: string }): Promise<ProposalRecord> {
  const { projectId, ...body } = input;
  const { proposal } = await apiClient.create<{ proposal: ProposalRecord }>(`/projects/${encodeURIComponent(projectId)}/proposals`, body);
  return proposal;
}

export function useCreateProposal() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProposal,
    onSuccess: (proposal) => void queryClient.invalidateQueries({ queryKey: proposalKeys.list(proposal.projectId) }),
  });
}
