import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";

export interface ChangePasswordBody {
  currentPassword: string;
  newPassword: string;
}

/** POST /api/auth/password — 400 "wrong-password" with fields.currentPassword. */
export function changePassword(body: ChangePasswordBody): Promise<void> {
  return apiClient.post<void>("/auth/password", { ...body });
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
