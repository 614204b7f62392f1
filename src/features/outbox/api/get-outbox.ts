import { apiClient } from "@/lib/api-client";
import type { OutboxMessage } from "./types";

/** GET /api/outbox — owner only; newest first is expected but the page sorts anyway. */
export function getOutbox(signal?: AbortSignal): Promise<{ messages: OutboxMessage[] }> {
  return apiClient.get<{ messages: OutboxMessage[] }>("/outbox", { signal });
}
