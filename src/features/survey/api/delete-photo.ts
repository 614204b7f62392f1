import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { surveyKeys } from "./queries";

/** DELETE /api/photos/:id → 204 */
export function deletePhoto(photoId: string): Promise<void> {
  return apiClient.delete(`/photos/${encodeURIComponent(photoId)}`);
}

export function useDeletePhoto(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deletePhoto,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: surveyKeys.detail(projectId) }),
  });
}
