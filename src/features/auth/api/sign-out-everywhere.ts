import { useMutation } from "@tanstack/react-query";
import { apiClient, isApiError } from "@/lib/api-client";
import { leaveToSignIn } from "./leave-to-sign-in";

/** POST /api/auth/sign-out-everywhere — ends every session of this user, on every device (204). */
export function signOutEverywhere(): Promise<void> {
  return apiClient.post<void>("/auth/sign-out-everywhere");
}

export function useSignOutEverywhere() {
  return useMutation({
    mutationFn: signOutEverywhere,
    meta: { isAuthProbe: true },
    onSuccess: () => void leaveToSignIn("signed-out-everywhere"),
    // Already signed out (session expired or ended elsewhere): the result the user wanted.
    onError: (error) => {
      if (isApiError(error) && error.status === 401) void leaveToSignIn("signed-out-everywhere");
    },
  });
}
