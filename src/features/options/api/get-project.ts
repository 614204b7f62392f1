import { apiClient } from "@/lib/api-client";
import type { ProjectDetail } from "./types";

/** GET /api/projects/:id — the project and its surveyed attic spaces. */
export function getProject(projectId: string, signal?: AbortSignal): Promise<ProjectDetail> {
  return apiClient.get<ProjectDetail>(`/projects/${encodeURIComponent(projectId)}`, { signal });
}
