import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { SignInInput } from "./schemas";
import type { Session } from "./types";

/** POST /api/auth/sign-in — 401 invalid-credentials, 429 rate-limited, 400 with fields. */
export function signIn(input: SignInInput): Promise<Session> {
  return apiClient.post<Session>("/auth/sign-in", input);
}

export function useSignIn() {
  return useMutation({ mutationFn: signIn, meta: { isAuthProbe: true } });
}
