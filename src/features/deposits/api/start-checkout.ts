import { apiClient } from "@/lib/api-client";
import type { CheckoutStarted } from "./types";

/**
 * POST /api/public/proposals/:token/deposit/checkout — opens the payment service's page for the
 * deposit. No amount is sent: the server works it out.
 */
export function startCheckout(token: string): Promise<CheckoutStarted> {
  return apiClient.post<CheckoutStarted>(`/public/proposals/${encodeURIComponent(token)}/deposit/checkout`, {});
}
