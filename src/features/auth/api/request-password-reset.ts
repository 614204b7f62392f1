import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";

/** POST /api/auth/password-reset/request — 202, the same answer whether or not the address exists. */
export function requestPasswordReset(body: { email: string }): Promise<{ message?: string }> {
  return apiClient.post<{ message?: string }>("/auth/password-reset/request", body);
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset, meta: { isAuthProbe: true } });
}
