/**
 * The proposal's own deposit, as the builder edits it: the company's rule (null on the wire),
 * none (a zero amount, since null means "the company's rule"), a percent or an amount, with an
 * optional cap. Text is read from its digits so no float touches cents.
 */
import type { DepositRule } from "@shared/proposals/types";
import { depositCents, type DepositPolicy } from "@shared/pricing/index";

export type DepositMode = "company" | "none" | "percent" | "amount";
export interface DepositDraft {
  mode: DepositMode;
  value: string;
  cap: string;
}

type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

function digitsTimes100(text: string, maxWholeDigits: number): number | null {
  const cleaned = text.trim().replace(/^\$/, "").replace(/\s*%$/, "").replace(/,/g, "").trim();
  const normalized = cleaned.startsWith(".") ? `0${cleaned}` : cleaned;
  const match = new RegExp(`^(\\d{1,${maxWholeDigits}})(?:\\.(\\d{0,2}))?$`).exec(normalized);
  return match ? Number(match[1]) * 100 + Number((match[2] ?? "").padEnd(2, "0")) : null;
}

/** @example depositToRule({ mode: "percent", value: "12.5", cap: "1,000" }) // { ok: true, value: { kind: "percent", value: 12.5, capCents: 100000 } } */
export function depositToRule(d: DepositDraft): Parsed<DepositRule | null> {
  if (d.mode === "company") return { ok: true, value: null };
  if (d.mode === "none") return { ok: true, value: { kind: "amount", value: 0, capCents: null } };
  const hundredths = digitsTimes100(d.value, 6);
  if (hundredths === null) return { ok: false, message: d.mode === "percent" ? "Enter the deposit as a percent, like 10." : "Enter the deposit in dollars, like 500." };
  if (d.mode === "percent" && hundredths > 10_000) return { ok: false, message: "A deposit is at most 100 %." };
  let capCents: number | null = null;
  if (d.cap.trim() !== "") {
    capCents = digitsTimes100(d.cap, 6);
    if (capCents === null) return { ok: false, message: "Enter the cap in dollars, like 1000, or leave it empty." };
  }
  return { ok: true, value: { kind: d.mode, value: d.mode === "percent" ? hundredths / 100 : hundredths, capCents } };
}

const centsText = (cents: number) => (cents % 100 === 0 ? String(cents / 100) : (cents / 100).toFixed(2));

export function ruleToDraft(rule: DepositRule | null): DepositDraft {
  if (!rule) return { mode: "company", value: "", cap: "" };
  if (rule.kind === "amount" && rule.value === 0) return { mode: "none", value: "", cap: "" };
  return { mode: rule.kind, value: rule.kind === "percent" ? String(rule.value) : centsText(rule.value), cap: rule.capCents === null ? "" : centsText(rule.capCents) };
}

/** The deposit this rule asks on a total (same policy the server builds in pricingSettings). */
export function depositFor(totalCents: number, rule: DepositRule | null): number {
  if (!rule) return 0;
  const policy: DepositPolicy = {
    request: rule.kind === "percent" ? { kind: "percent", basisPoints: Math.round(rule.value * 100) } : { kind: "amount", cents: Math.round(rule.value) },
    capCents: rule.capCents,
    capBasisPoints: null,
  };
  return depositCents(totalCents, policy).depositCents;
}
