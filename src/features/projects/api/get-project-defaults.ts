import type { CodeBasis } from "@shared/ventilation/index";
import { apiClient } from "@/lib/api-client";

export interface ProjectDefaults {
  codeBasis: CodeBasis;
  climateZone: number;
}

/** GET /api/company/project-defaults — what a new project starts with (the company profile's defaults). */
export async function getProjectDefaults(signal?: AbortSignal): Promise<ProjectDefaults> {
  const { defaults } = await apiClient.get<{ defaults: ProjectDefaults }>("/company/project-defaults", { signal });
  return defaults;
}
