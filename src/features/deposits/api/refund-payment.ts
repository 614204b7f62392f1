import { apiClient } from "@/lib/api-client";
import type { Payment } from "./types";

/** POST /api/payments/:id/refund — owner only; it shows as refunded once the payment service confirms. */
export function refundPayment(paymentId: string): Promise<{ payment: Payment }> {
  return apiClient.post<{ payment: Payment }>(`/payments/${encodeURIComponent(paymentId)}/refund`, {});
}
