import { apiClient } from "@/lib/api-client";
import type { CompanyProfile } from "./types";

/** GET /api/company — the profile printed on proposals (owner only). */
export async function getCompany(signal?: AbortSignal): Promise<CompanyProfile> {
  const { company } = await apiClient.get<{ company: CompanyProfile }>("/company", { signal });
  return company;
}
