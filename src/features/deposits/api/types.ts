/** The deposit calls' answers: the contract lives in shared/schemas/deposits.ts. */
export type { CheckoutStarted, DepositState, DepositView, Payment, PaymentStatus, ProposalPayments } from "@shared/schemas/deposits";
