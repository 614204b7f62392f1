import { useMutation } from "@tanstack/react-query";
import { apiClient, isApiError } from "@/lib/api-client";
import { leaveToSignIn } from "./leave-to-sign-in";

/** POST /api/auth/sign-out — ends this session (204). */
export function signOut(): Promise<void> {
  return apiClient.post<void>("/auth/sign-out");
}

export function useSignOut() {
  return useMutation({
    mutationFn: signOut,
    meta: { isAuthProbe: true },
    onSuccess: () => void leaveToSignIn("signed-out"),
    // Already signed out (session expired or ended elsewhere): the result the user wanted.
    onError: (error) => {
      if (isApiError(error) && error.status === 401) void leaveToSignIn("signed-out");
    },
  });
}
