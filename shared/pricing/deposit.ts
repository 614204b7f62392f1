/**
 * The deposit asked at signing: none, a fixed amount, or a percent of the total, limited by an
 * optional cap in cents and an optional cap as a percent of the total — e.g. "the lesser of
 * $1,000 or 10 %". Some states cap home-improvement deposits; local law decides, so the caps are a
 * company setting and Eavesight only applies them.
 *
 * Rounding: a requested percent rounds half up to the cent; a percent cap rounds **down**, so the
 * deposit never exceeds a legal limit by a cent. The deposit is never more than the total.
 */
import { assertCents, BASIS_POINTS_PER_WHOLE, mulDivRoundDown, percentOfCents } from "./rounding";

export type DepositRequest =
  | { kind: "none" }
  | { kind: "amount"; cents: number }
  | { kind: "percent"; basisPoints: number };

export interface DepositPolicy {
  request: DepositRequest;
  /** Most the deposit may be, in cents; null for no cap. */
  capCents: number | null;
  /** Most the deposit may be as a share of the total, basis points; null for no cap. */
  capBasisPoints: number | null;
}

export const NO_DEPOSIT: DepositPolicy = { request: { kind: "none" }, capCents: null, capBasisPoints: null };

export interface DepositResult {
  depositCents: number;
  /** What was asked before any cap. */
  requestedCents: number;
  /** The cap that decided the amount, if one did. */
  limitedBy: "cap-amount" | "cap-percent" | "total" | null;
}

/**
 * @example
 * // 30 % asked, capped at the lesser of $1,000 or 10 % of a $12,500.00 total
 * depositCents(12_500_00, { request: { kind: "percent", basisPoints: 3_000 }, capCents: 1_000_00, capBasisPoints: 1_000 })
 * // { depositCents: 100000, requestedCents: 375000, limitedBy: "cap-amount" }
 */
export function depositCents(totalCents: number, policy: DepositPolicy): DepositResult {
  assertCents(totalCents, "The total");
  let requestedCents = 0;
  if (policy.request.kind === "amount") {
    assertCents(policy.request.cents, "The deposit");
    requestedCents = policy.request.cents;
  } else if (policy.request.kind === "percent") {
    requestedCents = percentOfCents(totalCents, policy.request.basisPoints);
  }
  const limits: { cents: number; by: NonNullable<DepositResult["limitedBy"]> }[] = [{ cents: totalCents, by: "total" }];
  if (policy.capCents !== null) {
    assertCents(policy.capCents, "The deposit cap");
    limits.push({ cents: policy.capCents, by: "cap-amount" });
  }
  if (policy.capBasisPoints !== null) {
    assertCents(policy.capBasisPoints, "The deposit cap percent");
    limits.push({ cents: mulDivRoundDown(totalCents, policy.capBasisPoints, BASIS_POINTS_PER_WHOLE), by: "cap-percent" });
  }
  let depositCents = requestedCents;
  let limitedBy: DepositResult["limitedBy"] = null;
  for (const limit of limits) {
    if (limit.cents < depositCents) {
      depositCents = limit.cents;
      limitedBy = limit.by;
    }
  }
  return { depositCents, requestedCents, limitedBy };
}
