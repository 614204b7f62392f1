import type { ProjectPatch } from "@shared/schemas/projects";
import { apiClient } from "@/lib/api-client";
import type { ProjectRecord } from "./types";

/** PATCH /api/projects/:id with the version it was based on; 409 "stale-version" when someone saved first. */
export async function saveProject(projectId: string, patch: ProjectPatch): Promise<ProjectRecord> {
  const { project } = await apiClient.patch<{ project: ProjectRecord }>(`/projects/${encodeURIComponent(projectId)}`, { ...patch });
  return project;
}
