import { apiClient } from "@/lib/api-client";
import type { TeamMember } from "./types";

/** GET /api/users?role=estimator — active estimators of the company, by name. */
export function getEstimators(signal?: AbortSignal): Promise<TeamMember[]> {
  return apiClient.get<TeamMember[]>("/users?role=estimator", { signal });
}
