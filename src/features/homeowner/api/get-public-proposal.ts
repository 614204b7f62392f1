import { apiClient } from "@/lib/api-client";
import type { PublicProposal } from "./types";

/** GET /api/public/proposals/:token — 404 unknown; 410 `link-revoked`, `link-replaced`, `superseded` or `expired`. The first open marks it viewed. */
export function getPublicProposal(token: string, signal?: AbortSignal): Promise<PublicProposal> {
  return apiClient.get<PublicProposal>(`/public/proposals/${encodeURIComponent(token)}`, { signal });
}

export const publicLogoSrc = (token: string) => `/api/public/proposals/${encodeURIComponent(token)}/logo`;
export const publicPhotoHref = (token: string, photoId: string, isThumb = false) =>
  `/api/public/proposals/${encodeURIComponent(token)}/photos/${encodeURIComponent(photoId)}${isThumb ? "?thumb=1" : ""}`;
export const publicPdfHref = (token: string) => `/api/public/proposals/${encodeURIComponent(token)}/pdf`;
