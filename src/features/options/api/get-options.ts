import { apiClient } from "@/lib/api-client";
import type { OptionRecord } from "./types";

/** GET /api/projects/:id/options — every option of the project with its analysis and price. */
export async function getOptions(projectId: string, signal?: AbortSignal): Promise<OptionRecord[]> {
  const { options } = await apiClient.get<{ options: OptionRecord[] }>(`/projects/${encodeURIComponent(projectId)}/options`, { signal });
  return options;
}
