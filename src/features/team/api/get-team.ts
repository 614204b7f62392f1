import { apiClient } from "@/lib/api-client";
import type { TeamResponse } from "./types";

/** GET /api/team — owner only. */
export function getTeam(signal?: AbortSignal): Promise<TeamResponse> {
  return apiClient.get<TeamResponse>("/team", { signal });
}
