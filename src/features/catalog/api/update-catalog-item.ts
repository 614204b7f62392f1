import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CatalogItemInput } from "@shared/schemas/catalog";
import { apiClient } from "@/lib/api-client";
import { catalogKeys } from "./queries";
import type { CatalogRecord } from "./types";

/** PATCH /api/catalog/:id (owner) — only the fields sent change. */
export async function updateCatalogItem({ id, patch }: { id: string; patch: Partial<CatalogItemInput> }): Promise<CatalogRecord> {
  const { item } = await apiClient.patch<{ item: CatalogRecord }>(`/catalog/${encodeURIComponent(id)}`, { ...patch });
  return item;
}

export function useUpdateCatalogItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateCatalogItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogKeys.all }),
  });
}
