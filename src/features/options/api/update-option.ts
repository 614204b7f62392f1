import type { DesignOptionInput } from "@shared/schemas/options";
import { apiClient } from "@/lib/api-client";
import type { OptionRecord } from "./types";

export type OptionPatch = Partial<DesignOptionInput>;

/** PATCH /api/options/:id with the version it was based on; 409 "stale-version" when someone saved since. */
export async function updateOption(optionId: string, patch: OptionPatch, version: number): Promise<OptionRecord> {
  const { option } = await apiClient.patch<{ option: OptionRecord }>(`/options/${encodeURIComponent(optionId)}`, { ...patch, version });
  return option;
}
