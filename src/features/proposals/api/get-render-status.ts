import { apiClient } from "@/lib/api-client";
import type { ProposalRecord } from "./types";

/** GET /api/proposals/:id/render-status — where the PDF stands (queued, rendering, ready, failed). */
export async function getRenderStatus(proposalId: string, signal?: AbortSignal): Promise<ProposalRecord["render"]> {
  const { render } = await apiClient.get<{ render: ProposalRecord["render"] }>(`/proposals/${encodeURIComponent(proposalId)}/render-status`, { signal });
  return render;
}
