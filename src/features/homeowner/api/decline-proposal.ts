import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { homeownerKeys } from "./queries";
import type { PublicProposal } from "./types";

/** POST /api/public/proposals/:token/decline with an optional reason. */
export function declineProposal(token: string, reason: string | null): Promise<PublicProposal> {
  return apiClient.post<PublicProposal>(`/public/proposals/${encodeURIComponent(token)}/decline`, { reason });
}

export function useDeclineProposal(token: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string | null) => declineProposal(token, reason),
    onSuccess: (view) => queryClient.setQueryData(homeownerKeys.view(token), view),
  });
}
