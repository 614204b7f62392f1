/** How the homeowner came back from the payment service's page, read from `?deposit=`. */
export type CheckoutReturn = "success" | "cancel" | null;

/**
 * The `deposit` query parameter the server puts in the success and cancel addresses. "success"
 * only means the homeowner was sent back after paying; the deposit counts as received when the
 * server says so (its webhook), never from this.
 *
 * @example
 * checkoutReturnOf("?deposit=success") // "success"
 * checkoutReturnOf("?deposit=paid") // null
 */
export function checkoutReturnOf(search: string): CheckoutReturn {
  const value = new URLSearchParams(search).get("deposit");
  return value === "success" || value === "cancel" ? value : null;
}

/** How long the page waits for the confirmation before it says the payment is not completed. */
export const CONFIRMATION_WAIT_MS = 60_000;
export const CONFIRMATION_POLL_MS = 2_000;
