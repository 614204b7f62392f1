import { apiClient } from "@/lib/api-client";
import type { InviteDetails } from "./types";

/** GET /api/auth/invites/:token — 404 or 410 when the link is unknown, used or expired. */
export function getInvite(token: string, signal?: AbortSignal): Promise<InviteDetails> {
  return apiClient.get<InviteDetails>(`/auth/invites/${encodeURIComponent(token)}`, { signal });
}
