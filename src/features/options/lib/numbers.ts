/**
 * Reading numbers typed in the option editor, from their digits (no float parsing of money).
 */
import { parseDollarsToCentsText } from "./money";

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

const DECIMAL = /^(\d+(\.\d*)?|\.\d+)$/;

/** A positive decimal such as a quantity or hours ("38", "2.25"). */
export function parsePositive(text: string, what: string): Parsed<number> {
  const t = text.trim().replace(/,/g, "");
  if (t === "") return { ok: false, message: `${what} is needed.` };
  if (!DECIMAL.test(t)) return { ok: false, message: `${what} must be a number, like 4 or 2.5.` };
  const value = Number(t);
  if (!(value > 0)) return { ok: false, message: `${what} must be more than 0.` };
  if (value > 10_000) return { ok: false, message: `${what} is too large.` };
  return { ok: true, value };
}

/** A whole count ("6"). */
export function parseWhole(text: string, what: string): Parsed<number> {
  const r = parsePositive(text, what);
  if (!r.ok) return r;
  return Number.isInteger(r.value) ? r : { ok: false, message: `${what} is counted in whole units.` };
}

/** Dollars as integer cents ("95" → 9500). */
export function parseCents(text: string, what: string): Parsed<number> {
  return parseDollarsToCentsText(text, what);
}

/**
 * A percent as basis points from its digits ("7.5" → 750, "10" → 1000), at most 2 decimals.
 *
 * @example
 * parsePercentToBasisPoints("12.25", "Discount") // { ok: true, value: 1225 }
 */
export function parsePercentToBasisPoints(text: string, what: string): Parsed<number> {
  const t = text.trim().replace(/\s*%$/, "");
  const match = /^(\d{1,3})(?:\.(\d{0,2}))?$/.exec(t.startsWith(".") ? `0${t}` : t);
  if (!match) return { ok: false, message: `${what} must be a percent like 10 or 7.5 (at most two decimals).` };
  const value = Number(match[1]) * 100 + Number((match[2] ?? "").padEnd(2, "0"));
  if (value > 10_000) return { ok: false, message: `${what} can't be more than 100 %.` };
  return { ok: true, value };
}

/** Basis points back to the text of a percent field (750 → "7.5"). */
export function basisPointsToText(basisPoints: number): string {
  const whole = Math.floor(basisPoints / 100);
  const rest = basisPoints - whole * 100;
  return rest === 0 ? String(whole) : `${whole}.${String(rest).padStart(2, "0").replace(/0$/, "")}`;
}
