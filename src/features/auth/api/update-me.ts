import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { authKeys } from "./queries";
import type { Session, UnitSystem } from "./types";

export interface UpdateMeInput {
  name?: string;
  unitSystem?: UnitSystem;
}

/** PATCH /api/auth/me — own name and unit system. */
export function updateMe(input: UpdateMeInput): Promise<Session> {
  return apiClient.patch<Session>("/auth/me", { ...input });
}

export function useUpdateMe() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateMe,
    onSuccess: (session) => queryClient.setQueryData(authKeys.me(), session),
  });
}
