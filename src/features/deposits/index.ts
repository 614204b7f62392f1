/** The deposits feature's public face: the homeowner's PayDeposit and the staff DepositStatus. */
export { PayDeposit, type PayDepositProps } from "./components/pay-deposit";
export { DepositStatus, type DepositStatusProps } from "./components/deposit-status";
export { depositKeys, depositQueries } from "./api/queries";
export type { DepositState, DepositView, Payment, ProposalPayments } from "./api/types";
