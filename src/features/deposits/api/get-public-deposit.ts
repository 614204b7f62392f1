import { apiClient } from "@/lib/api-client";
import type { DepositView } from "./types";

/** GET /api/public/proposals/:token/deposit — the homeowner's deposit; 404/410 as the proposal link. */
export async function getPublicDeposit(token: string, signal?: AbortSignal): Promise<DepositView> {
  const res = await apiClient.get<{ deposit: DepositView }>(`/public/proposals/${encodeURIComponent(token)}/deposit`, { signal });
  return res.deposit;
}
