import { useMutation, useQueryClient } from "@tanstack/react-query";
import type { CatalogItemInput } from "@shared/schemas/catalog";
import { apiClient } from "@/lib/api-client";
import { catalogKeys } from "./queries";
import type { CatalogRecord } from "./types";

/** POST /api/catalog (owner) → 201 { item } */
export async function createCatalogItem(input: CatalogItemInput): Promise<CatalogRecord> {
  const { item } = await apiClient.create<{ item: CatalogRecord }>("/catalog", { ...input });
  return item;
}

export function useCreateCatalogItem() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createCatalogItem,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: catalogKeys.all }),
  });
}
