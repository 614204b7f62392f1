import { apiClient } from "@/lib/api-client";
import type { ProjectOption } from "./types";

/** GET /api/projects/:id/options — the saved design options a proposal can include. */
export async function getProjectOptions(projectId: string, signal?: AbortSignal): Promise<ProjectOption[]> {
  const { options } = await apiClient.get<{ options: ProjectOption[] }>(`/projects/${encodeURIComponent(projectId)}/options`, { signal });
  return options;
}
