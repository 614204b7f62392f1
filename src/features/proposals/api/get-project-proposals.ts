import { apiClient } from "@/lib/api-client";
import type { ProposalRecord } from "./types";

/** GET /api/projects/:id/proposals — every revision of every proposal of the project, newest first. */
export async function getProjectProposals(projectId: string, signal?: AbortSignal): Promise<ProposalRecord[]> {
  const { proposals } = await apiClient.get<{ proposals: ProposalRecord[] }>(`/projects/${encodeURIComponent(projectId)}/proposals`, { signal });
  return proposals;
}
