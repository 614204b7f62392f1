import { useMutation, useQueryClient } from "@tanstack/react-query";
import { apiClient } from "@/lib/api-client";
import { optionKeys } from "./queries";
import type { OptionRecord } from "./types";

/** POST /api/options/:id/copy → 201 { option }: a new draft with the same content (how signed or offered work is reworked). */
export async function copyOption(optionId: string): Promise<OptionRecord> {
  const { option } = await apiClient.post<{ option: OptionRecord }>(`/options/${encodeURIComponent(optionId)}/copy`, {});
  return option;
}

export function useCopyOption() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: copyOption,
    onSuccess: (option) => {
      queryClient.setQueryData(optionKeys.detail(option.id), option);
      return queryClient.invalidateQueries({ queryKey: optionKeys.list(option.projectId) });
    },
  });
}
