import { parseDollarsToCents as parseSharedDollars } from "@shared/pricing/index";
/**
 * Typed text ↔ the integers the company profile stores, read from the digits so no float ever
 * touches a rate or an amount (8.25 % must be 825 basis points, not 824.9999).
 */
export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/**
 * @example
 * parsePercentToBasisPoints("8.25", "The tax rate") // { ok: true, value: 825 }
 * parsePercentToBasisPoints("7", "The tax rate")    // { ok: true, value: 700 }
 */
export function parsePercentToBasisPoints(text: string, what: string): Parsed<number> {
  const cleaned = text.trim().replace(/\s*%$/, "").trim();
  if (cleaned === "") return { ok: false, message: `${what} is needed (0 is fine).` };
  if (cleaned.startsWith("-")) return { ok: false, message: `${what} can't be negative.` };
  const normalized = cleaned.startsWith(".") ? `0${cleaned}` : cleaned;
  const match = /^(\d{1,3})(?:\.(\d{0,2}))?$/.exec(normalized);
  if (!match) {
    return /^\d+\.\d{3,}$/.test(normalized)
      ? { ok: false, message: `${what}: use at most two decimals, like 8.25.` }
      : { ok: false, message: `${what} must be a percent, like 8.25.` };
  }
  return { ok: true, value: Number(match[1]) * 100 + Number((match[2] ?? "").padEnd(2, "0")) };
}

/** @example basisPointsToPercentText(825) // "8.25" · basisPointsToPercentText(700) // "7" */
export function basisPointsToPercentText(basisPoints: number): string {
  const whole = Math.floor(basisPoints / 100);
  const rest = basisPoints - whole * 100;
  return rest === 0 ? String(whole) : `${whole}.${String(rest).padStart(2, "0").replace(/0$/, "")}`;
}

/**
 * The shared dollars parser (shared/pricing), in this feature's `Parsed` shape.
 * @example
 * parseDollarsToCents("1,000", "The cap")  // { ok: true, value: 100000 }
 * parseDollarsToCents("$12.5", "The cap")  // { ok: true, value: 1250 }
 */
export function parseDollarsToCents(text: string, what: string): Parsed<number> {
  const parsed = parseSharedDollars(text, what);
  return parsed.ok ? { ok: true, value: parsed.cents } : parsed;
}

/** @example centsToDollarsText(100000) // "1000" · centsToDollarsText(1250) // "12.50" */
export function centsToDollarsText(cents: number): string {
  const dollars = Math.floor(cents / 100);
  const rest = cents - dollars * 100;
  return rest === 0 ? String(dollars) : `${dollars}.${String(rest).padStart(2, "0")}`;
}

/** A deposit percent: whole or with up to two decimals, 0–100. @example parseDepositPercent("10") // { ok: true, value: 10 } */
export function parseDepositPercent(text: string): Parsed<number> {
  const bp = parsePercentToBasisPoints(text, "The deposit percent");
  if (!bp.ok) return bp;
  if (bp.value > 10_000) return { ok: false, message: "A deposit is at most 100 %." };
  return { ok: true, value: bp.value / 100 };
}
