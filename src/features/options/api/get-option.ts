import { apiClient } from "@/lib/api-client";
import type { OptionRecord } from "./types";

/** GET /api/options/:id */
export async function getOption(optionId: string, signal?: AbortSignal): Promise<OptionRecord> {
  const { option } = await apiClient.get<{ option: OptionRecord }>(`/options/${encodeURIComponent(optionId)}`, { signal });
  return option;
}
