import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";

/** DELETE /api/projects/:id/spaces/:spaceId → 204. Its photos stay on the project. */
export function deleteSpace({ projectId, spaceId }: { projectId: string; spaceId: string }): Promise<void> {
  return apiClient.delete(`/projects/${encodeURIComponent(projectId)}/spaces/${encodeURIComponent(spaceId)}`);
}

export function useDeleteSpace() {
  return useMutation({ mutationFn: deleteSpace });
}
