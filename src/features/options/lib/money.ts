import { parseDollarsToCents } from "@shared/pricing/index";
import type { Parsed } from "./numbers";

export { centsToDollarsText as centsToText } from "@shared/pricing/index";

/** The shared dollars parser, in this feature's `Parsed` shape. */
export function parseDollarsToCentsText(text: string, what: string): Parsed<number> {
  const parsed = parseDollarsToCents(text, what);
  return parsed.ok ? { ok: true, value: parsed.cents } : parsed;
}
