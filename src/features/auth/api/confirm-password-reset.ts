import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";

/** POST /api/auth/password-reset/confirm — 204; refuses an expired, used or unknown token. */
export function confirmPasswordReset(body: { token: string; password: string }): Promise<void> {
  return apiClient.post<void>("/auth/password-reset/confirm", body);
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset, meta: { isAuthProbe: true } });
}
