import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { Role } from "@/lib/authorization";
import { teamKeys } from "./queries";
import type { TeamInvite } from "./types";

export interface InviteMemberInput {
  email: string;
  role: Role;
}

/** POST /api/team/invites — e-mails a one-time link valid for 7 days. */
export function inviteMember(input: InviteMemberInput): Promise<{ invite: TeamInvite }> {
  return apiClient.post<{ invite: TeamInvite }>("/team/invites", { ...input });
}

export function useInviteMember() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: inviteMember,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: teamKeys.all }),
  });
}
