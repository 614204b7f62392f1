import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { surveyKeys } from "./queries";
import type { PhotoRecord } from "./types";

/** PATCH /api/photos/:id { caption } → { photo } */
export async function updatePhotoCaption({ photoId, caption }: { photoId: string; caption: string | null }): Promise<PhotoRecord> {
  const { photo } = await apiClient.patch<{ photo: PhotoRecord }>(`/photos/${encodeURIComponent(photoId)}`, { caption });
  return photo;
}

export function useUpdatePhotoCaption(projectId: string) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updatePhotoCaption,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: surveyKeys.detail(projectId) }),
  });
}
