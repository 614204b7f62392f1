import { useMutation } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { outbox } from "@/lib/field/outbox";
import { pendingCreation } from "./create-space";

/** DELETE /api/projects/:id/spaces/:spaceId → 204. Its photos stay on the project. */
export async function deleteSpace({ projectId, spaceId }: { projectId: string; spaceId: string }): Promise<void> {
  // Never sent: taking it off the device queue is the whole deletion.
  const pending = pendingCreation(spaceId);
  if (pending) return outbox.discard(pending.id);
  return apiClient.delete(`/projects/${encodeURIComponent(projectId)}/spaces/${encodeURIComponent(spaceId)}`);
}

export function useDeleteSpace() {
  // "always": a space still on the device queue is removed with no signal; a server one fails fast offline.
  return useMutation({ mutationFn: deleteSpace, networkMode: "always" });
}
