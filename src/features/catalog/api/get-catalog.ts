import { apiClient } from "@/lib/api-client";
import type { CatalogListParams, CatalogRecord } from "./types";

/** GET /api/catalog — searched by name or code, filtered by kind, retired items on request. */
export async function getCatalog(params: CatalogListParams, signal?: AbortSignal): Promise<CatalogRecord[]> {
  const search = new URLSearchParams();
  if (params.q.trim()) search.set("q", params.q.trim());
  if (params.kind) search.set("kind", params.kind);
  if (params.includeInactive) search.set("includeInactive", "true");
  const query = search.toString();
  const { items } = await apiClient.get<{ items: CatalogRecord[] }>(`/catalog${query ? `?${query}` : ""}`, { signal });
  return items;
}
