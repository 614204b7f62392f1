import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { DesignOptionInput } from "@shared/schemas/options";
import { apiClient } from "@/lib/api-client";
import { optionKeys } from "./queries";
import type { OptionRecord } from "./types";

/** POST /api/projects/:id/options → 201 { option } (a kept proposal, or a new blank option). */
export async function createOption({ projectId, input }: { projectId: string; input: DesignOptionInput }): Promise<OptionRecord> {
  const { option } = await apiClient.create<{ option: OptionRecord }>(`/projects/${encodeURIComponent(projectId)}/options`, { ...input });
  return option;
}

export function useCreateOption() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createOption,
    onSuccess: (option) => {
      queryClient.setQueryData(optionKeys.detail(option.id), option);
      return queryClient.invalidateQueries({ queryKey: optionKeys.list(option.projectId) });
    },
  });
}
