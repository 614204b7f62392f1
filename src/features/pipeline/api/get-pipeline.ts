import { apiClient } from "@/lib/api-client";
import type { PipelineOverview, PipelinePeriodDays } from "./types";

/** GET /api/pipeline?days= — proposals by status with value and age, and the win rate for the period. */
export function getPipeline(days: PipelinePeriodDays, signal?: AbortSignal): Promise<PipelineOverview> {
  return apiClient.get<PipelineOverview>(`/pipeline?days=${days}`, { signal });
}
