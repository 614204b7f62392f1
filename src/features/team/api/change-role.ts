import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { Role } from "@/lib/authorization";
import { teamKeys } from "./queries";
import type { TeamUser } from "./types";

/** PATCH /api/team/users/:id { role } */
export function changeRole({ userId, role }: { userId: string; role: Role }): Promise<{ user: TeamUser }> {
  return apiClient.patch<{ user: TeamUser }>(`/team/users/${encodeURIComponent(userId)}`, { role });
}

export function useChangeRole() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: changeRole,
    onSettled: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
