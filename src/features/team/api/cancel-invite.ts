import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { teamKeys } from "./queries";

/** DELETE /api/team/invites/:id — the link stops working (204). */
export function cancelInvite(inviteId: string): Promise<void> {
  return apiClient.delete(`/team/invites/${encodeURIComponent(inviteId)}`);
}

export function useCancelInvite() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: cancelInvite,
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
