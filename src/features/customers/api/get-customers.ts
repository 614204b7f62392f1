import { apiClient } from "@/lib/api-client";
import type { CustomerListParams, CustomerPage } from "./types";

/** GET /api/customers?q&sort&dir&page&pageSize — one page, searched and sorted by the server. */
export function getCustomers(params: CustomerListParams, signal?: AbortSignal): Promise<CustomerPage> {
  const search = new URLSearchParams({
    sort: params.sort,
    dir: params.dir,
    page: String(params.page),
    pageSize: String(params.pageSize),
  });
  if (params.q.trim()) search.set("q", params.q.trim());
  return apiClient.get<CustomerPage>(`/customers?${search.toString()}`, { signal });
}
