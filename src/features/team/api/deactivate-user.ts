import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { teamKeys } from "./queries";
import type { TeamUser } from "./types";

/** POST /api/team/users/:id/deactivate — their sessions end at once. */
export function deactivateUser(userId: string): Promise<{ user: TeamUser }> {
  return apiClient.post<{ user: TeamUser }>(`/team/users/${encodeURIComponent(userId)}/deactivate`);
}

export function useDeactivateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deactivateUser,
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
