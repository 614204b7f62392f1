/**
 * Dollars typed ↔ integer cents, from the digits of the text so no float touches the amount.
 * (The catalog feature has the same rule for its form; features don't import each other.)
 */
import type { Parsed } from "./numbers";

export function parseDollarsToCentsText(text: string, what: string): Parsed<number> {
  const cleaned = text.trim().replace(/^\$/, "").replace(/,/g, "").trim();
  if (cleaned === "") return { ok: false, message: `${what} is needed (0 is fine).` };
  if (cleaned.startsWith("-")) return { ok: false, message: `${what} can't be negative.` };
  const normalized = cleaned.startsWith(".") ? `0${cleaned}` : cleaned;
  if (/^\d+\.\d{3,}$/.test(normalized)) return { ok: false, message: `${what}: use at most two decimals (whole cents).` };
  const match = /^(\d+)(?:\.(\d{0,2}))?$/.exec(normalized);
  if (!match) return { ok: false, message: `${what} must be dollars and cents, like 95 or 12.50.` };
  const dollars = match[1]!.replace(/^0+(?=\d)/, "");
  if (dollars.length > 7) return { ok: false, message: `${what} is too large.` };
  return { ok: true, value: Number(dollars) * 100 + Number((match[2] ?? "").padEnd(2, "0")) };
}

export function centsToText(cents: number): string {
  const dollars = Math.floor(cents / 100);
  return `${dollars}.${String(cents - dollars * 100).padStart(2, "0")}`;
}
