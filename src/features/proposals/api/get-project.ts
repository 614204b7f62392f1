import { apiClient } from "@/lib/api-client";
import type { ProjectSummary } from "./types";

/** GET /api/projects/:id — for the title, the customer's e-mail and the photos to choose from. */
export function getProject(projectId: string, signal?: AbortSignal): Promise<ProjectSummary> {
  return apiClient.get<ProjectSummary>(`/projects/${encodeURIComponent(projectId)}`, { signal });
}
