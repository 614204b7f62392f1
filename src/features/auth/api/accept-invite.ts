import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { Session } from "./types";

/** POST /api/auth/invites/:token/accept — creates the account and signs it in. */
export function acceptInvite({ token, name, password }: { token: string; name: string; password: string }): Promise<Session> {
  return apiClient.post<Session>(`/auth/invites/${encodeURIComponent(token)}/accept`, { name, password });
}

export function useAcceptInvite() {
  return useMutation({ mutationFn: acceptInvite, meta: { isAuthProbe: true } });
}
