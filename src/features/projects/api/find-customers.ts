import { apiClient } from "@/lib/api-client";
import type { CustomerSummary } from "./types";

/** GET /api/customers?q — the first few matches, for the customer picker of a new project. */
export async function findCustomers(q: string, signal?: AbortSignal): Promise<CustomerSummary[]> {
  const search = new URLSearchParams({ sort: "name", dir: "asc", page: "1", pageSize: "6" });
  if (q.trim()) search.set("q", q.trim());
  const page = await apiClient.get<{ items: CustomerSummary[] }>(`/customers?${search.toString()}`, { signal });
  return page.items;
}

/** GET /api/customers/:id → { customer } */
export async function getCustomer(id: string, signal?: AbortSignal): Promise<CustomerSummary> {
  const { customer } = await apiClient.get<{ customer: CustomerSummary }>(`/customers/${encodeURIComponent(id)}`, { signal });
  return customer;
}
