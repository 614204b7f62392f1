import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { GenerateResult } from "./types";

/** POST /api/projects/:id/options/generate — proposals for every space, not saved. */
export function generateOptions({ projectId, spaceIds }: { projectId: string; spaceIds?: string[] }): Promise<GenerateResult> {
  return apiClient.post<GenerateResult>(`/projects/${encodeURIComponent(projectId)}/options/generate`, spaceIds ? { spaceIds } : {});
}

export function useGenerateOptions() {
  return useMutation({ mutationFn: generateOptions });
}
