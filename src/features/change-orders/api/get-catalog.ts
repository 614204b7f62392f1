import type { CatalogItem } from "@shared/schemas/catalog";
import { apiClient } from "@/lib/api-client";

/** GET /api/catalog — the active items a change order line can name. */
export async function getCatalog(signal?: AbortSignal): Promise<CatalogItem[]> {
  const { items } = await apiClient.get<{ items: CatalogItem[] }>("/catalog", { signal });
  return items;
}
