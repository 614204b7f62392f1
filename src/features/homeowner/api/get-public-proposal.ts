import { apiClient } from "@/lib/api-client";
import type { PublicProposal } from "./types";

/** GET /api/public/proposals/:token — 404 unknown or revoked, 410 `superseded` or `expired`. The first open marks it viewed. */
export function getPublicProposal(token: string, signal?: AbortSignal): Promise<PublicProposal> {
  return apiClient.get<PublicProposal>(`/public/proposals/${encodeURIComponent(token)}`, { signal });
}

export const publicPdfHref = (token: string) => `/api/public/proposals/${encodeURIComponent(token)}/pdf`;
