/**
 * Dollars typed into a form ↔ integer cents, done on the digits of the text so no float ever
 * touches the amount ("19.99" → 1999, never 1998.9999…). Common practice for money entry.
 */

export type ParsedCents = { ok: true; cents: number } | { ok: false; message: string };

const DOLLARS = /^(\d+)(?:\.(\d{0,2}))?$/;

/**
 * @example
 * parseDollarsToCents("$1,234.5") // { ok: true, cents: 123450 }
 * parseDollarsToCents("0.07") // { ok: true, cents: 7 }
 * parseDollarsToCents("2.345") // { ok: false, message: "Use at most two decimals (whole cents)." }
 */
export function parseDollarsToCents(text: string, what = "The amount"): ParsedCents {
  const cleaned = text.trim().replace(/^\$/, "").replace(/,/g, "").trim();
  if (cleaned === "") return { ok: false, message: `${what} is needed (0 is fine).` };
  if (cleaned.startsWith("-")) return { ok: false, message: `${what} can't be negative.` };
  const normalized = cleaned.startsWith(".") ? `0${cleaned}` : cleaned;
  if (/^\d+\.\d{3,}$/.test(normalized)) return { ok: false, message: "Use at most two decimals (whole cents)." };
  const match = DOLLARS.exec(normalized);
  if (!match) return { ok: false, message: `${what} must be dollars and cents, like 12.50.` };
  const dollars = match[1]!.replace(/^0+(?=\d)/, "");
  const fraction = (match[2] ?? "").padEnd(2, "0");
  if (dollars.length > 7) return { ok: false, message: `${what} is too large.` };
  return { ok: true, cents: Number(dollars) * 100 + Number(fraction) };
}

/**
 * Cents as the text to put back in a dollars field (no "$", no thousands separators).
 *
 * @example
 * centsToDollarsText(1150) // "11.50"
 * centsToDollarsText(5) // "0.05"
 */
export function centsToDollarsText(cents: number): string {
  const dollars = Math.floor(cents / 100);
  return `${dollars}.${String(cents - dollars * 100).padStart(2, "0")}`;
}
