import type { EstimateConditions } from "@shared/airflow-model/index";
import { apiClient } from "@/lib/api-client";

/** GET /api/company/estimate-conditions — the company's summer and winter conditions for airflow estimates. */
export async function getEstimateConditions(signal?: AbortSignal): Promise<EstimateConditions> {
  const body = await apiClient.get<{ estimateConditions: EstimateConditions }>("/company/estimate-conditions", { signal });
  return body.estimateConditions;
}
