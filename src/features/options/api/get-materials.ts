import { apiClient } from "@/lib/api-client";
import type { OptionMaterials } from "./types";

/** GET /api/options/:id/materials — what to buy, rounded to how it is sold, and the work lines. */
export function getMaterials(optionId: string, signal?: AbortSignal): Promise<OptionMaterials> {
  return apiClient.get<OptionMaterials>(`/options/${encodeURIComponent(optionId)}/materials`, { signal });
}
