import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { AcceptInput } from "@shared/proposals/schemas";
import { apiClient } from "@/lib/api-client";
import { homeownerKeys } from "./queries";
import type { PublicProposal } from "./types";

/** POST /api/public/proposals/:token/accept — the chosen option, the signer's name, the signature and the consent. */
export function acceptProposal(token: string, input: AcceptInput): Promise<PublicProposal> {
  return apiClient.post<PublicProposal>(`/public/proposals/${encodeURIComponent(token)}/accept`, input as unknown as Record<string, unknown>);
}

export function useAcceptProposal(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: AcceptInput) => acceptProposal(token, input),
    onSuccess: (view) => queryClient.setQueryData(homeownerKeys.view(token), view),
  });
}
