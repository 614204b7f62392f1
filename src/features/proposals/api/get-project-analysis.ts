import { apiClient } from "@/lib/api-client";
import type { ProjectAnalysis } from "./types";

/** GET /api/projects/:id/analysis — today's findings, to choose which the proposal shows. */
export function getProjectAnalysis(projectId: string, signal?: AbortSignal): Promise<ProjectAnalysis> {
  return apiClient.get<ProjectAnalysis>(`/projects/${encodeURIComponent(projectId)}/analysis`, { signal });
}
