import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import type { SpaceRecord } from "./types";

/** POST /api/projects/:id/spaces → 201 { space } (added at the end of the project's spaces). */
export async function createSpace({ projectId, name }: { projectId: string; name: string }): Promise<SpaceRecord> {
  const { space } = await apiClient.create<{ space: SpaceRecord }>(`/projects/${encodeURIComponent(projectId)}/spaces`, { name });
  return space;
}

export function useCreateSpace() {
  return useMutation({ mutationFn: createSpace });
}
