import { depositCents, type DepositResult } from "../../../shared/pricing/index.ts";
import type { DepositRule, ProposalSnapshot } from "../../../shared/proposals/types.ts";
import { pricingSettings } from "../options/options.service.ts";

/** The provider's smallest card charge in US dollars; below it a deposit is taken offline. */
export const MIN_ONLINE_CHARGE_CENTS = 50;

export type DepositDue =
  | { isDue: true; optionId: string; optionName: string; amountCents: number; totalCents: number; limitedBy: DepositResult["limitedBy"] | "signed" }
  | { isDue: false; optionId: string | null; reason: string };

/**
 * The deposit the homeowner may pay for the option they accepted, computed on the server only.
 * It is the deposit printed in the signed snapshot, re-checked against the deposit rule in force
 * now (the proposal's own, else the company's) through the pricing module, and the smaller of the
 * two wins: a cap lowered after sending (local law changed) still holds, and the homeowner is never
 * asked for more than they signed for.
 */
export function depositDue(snapshot: ProposalSnapshot, acceptedOptionId: string | null, rule: DepositRule | null): DepositDue {
  const option = acceptedOptionId ? snapshot.options.find((o) => o.id === acceptedOptionId) : undefined;
  if (!option) return { isDue: false, optionId: null, reason: "No option of this proposal has been accepted." };
  if (!option.price) return { isDue: false, optionId: option.id, reason: "The accepted option has no price, so no deposit can be worked out." };
  const now = depositCents(option.price.totalCents, pricingSettings({ taxRateBasisPoints: 0, depositRule: rule }).deposit);
  const signedCents = option.price.depositCents;
  const amountCents = Math.min(signedCents, now.depositCents);
  if (amountCents <= 0) return { isDue: false, optionId: option.id, reason: "This proposal asks for no deposit." };
  if (amountCents < MIN_ONLINE_CHARGE_CENTS) return { isDue: false, optionId: option.id, reason: "The deposit is below the smallest amount that can be paid online ($0.50); the company will arrange it with you." };
  return {
    isDue: true, optionId: option.id, optionName: option.name, amountCents, totalCents: option.price.totalCents,
    limitedBy: now.depositCents < signedCents ? now.limitedBy : "signed",
  };
}
