import { apiClient, isApiError } from "@/lib/api-client";
import type { Session } from "./types";

/** GET /api/auth/me. Resolves to null when signed out (401), so "signed out" is data, not an error. */
export async function getMe(signal?: AbortSignal): Promise<Session | null> {
  try {
    return await apiClient.get<Session>("/auth/me", { signal });
  } catch (error) {
    if (isApiError(error) && error.status === 401) return null;
    throw error;
  }
}
