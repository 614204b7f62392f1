import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { optionKeys } from "./queries";

/** DELETE /api/options/:id → 204 */
export function deleteOption({ optionId }: { optionId: string; projectId: string }): Promise<void> {
  return apiClient.delete(`/options/${encodeURIComponent(optionId)}`);
}

export function useDeleteOption() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteOption,
    onSuccess: (_result, { optionId, projectId }) => {
      queryClient.removeQueries({ queryKey: optionKeys.detail(optionId) });
      return queryClient.invalidateQueries({ queryKey: optionKeys.list(projectId) });
    },
  });
}
