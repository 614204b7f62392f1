/**
 * The deposit contract: what GET /api/public/proposals/:token/deposit and GET /api/proposals/:id/payments
 * answer (server/modules/payments/payments.service.ts) and the client reads. Amounts are integer
 * cents; times are ISO 8601 strings, as they travel.
 */
export type DepositState = "not-accepted" | "declined" | "none" | "due" | "paid" | "refunded";

export interface DepositView {
  state: DepositState;
  /** The deposit due, or what was paid; null when there is none. */
  amountCents: number | null;
  /** ISO 4217, lower case ("usd"). */
  currency: string;
  /** Why there is nothing to pay, when state is "none". */
  message: string | null;
  isOnlinePaymentAvailable: boolean;
  isCheckoutStarted: boolean;
  paidAt: string | null;
  isRefundRequested: boolean;
  refundedCents: number;
  refundedAt: string | null;
}

export type PaymentStatus = "pending" | "paid" | "refunded" | "failed";

/** One payment attempt, as staff see it (provider references included). */
export interface Payment {
  /** The deposit after signing, or the balance after completion. */
  purpose: "deposit" | "balance";
  id: string;
  proposalId: string;
  optionId: string;
  amountCents: number;
  currency: string;
  status: PaymentStatus;
  paidCents: number | null;
  paidAt: string | null;
  checkoutSessionId: string | null;
  paymentIntentId: string | null;
  refundId: string | null;
  refundRequestedAt: string | null;
  refundRequestedBy: string | null;
  refundedCents: number;
  refundedAt: string | null;
  failedAt: string | null;
  failureReason: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface ProposalPayments {
  deposit: DepositView;
  payments: Payment[];
}

export interface CheckoutStarted {
  /** The payment service's hosted page. */
  url: string;
  amountCents: number;
  currency: string;
}
