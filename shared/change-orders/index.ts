export * from "./types";
export { changeOrderTotals, changeLineTotalCents } from "./totals";
export { applyChangeOrders, type SignedChange } from "./crew-list";
export { ChangeOrderDraftSchema, ChangeOrderLineInputSchema, ChangeOrderSignSchema, type ChangeOrderDraftInput, type ChangeOrderLineInput } from "./schemas";
