import { apiClient } from "@/lib/api-client";
import type { CatalogRecord } from "./types";

/** GET /api/catalog?includeInactive=true — every item, retired ones too, since saved options may name them. */
export async function getCatalog(signal?: AbortSignal): Promise<CatalogRecord[]> {
  const { items } = await apiClient.get<{ items: CatalogRecord[] }>("/catalog?includeInactive=true", { signal });
  return items;
}
