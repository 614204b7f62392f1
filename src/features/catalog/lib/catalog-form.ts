import { z } from "zod";
import { CATALOG_KINDS, CATALOG_UNITS, CatalogItemInputSchema, type CatalogItemInput, type CatalogKind, type CatalogUnit } from "@shared/schemas/catalog";
import type { CatalogRecord } from "../api/types";
import { isFanKind, isVentKind } from "./labels";
import { centsToDollarsText, parseDollarsToCents } from "@shared/pricing/index";

/**
 * The add/edit form keeps what was typed as text (so a bad entry is shown, not lost) and is
 * checked by the shared CatalogItemInputSchema after the text is read: money from dollars to
 * exact cents, numbers from their digits. Only the rating the kind needs is asked for.
 */
export interface CatalogFormValues {
  sku: string;
  name: string;
  kind: CatalogKind;
  unit: CatalogUnit;
  /** NFA per unit (each) or per foot (linear-ft), for passive vents. */
  nfa: string;
  cfm: string;
  soldInLengthFt: string;
  materialCost: string;
  sellPrice: string;
  laborMinutes: string;
  isActive: boolean;
}

export type CatalogFormField = keyof CatalogFormValues;

/** Which form field shows a server or schema message for each item field. */
export const FORM_FIELD_OF: Record<keyof CatalogItemInput, CatalogFormField> = {
  sku: "sku",
  name: "name",
  kind: "kind",
  unit: "unit",
  nfaSqInPerUnit: "nfa",
  nfaSqInPerFt: "nfa",
  cfm: "cfm",
  soldInLengthFt: "soldInLengthFt",
  materialCostCents: "materialCost",
  sellPriceCents: "sellPrice",
  laborMinutesPerUnit: "laborMinutes",
  isActive: "isActive",
};

export type RatingNeed = "nfa-per-unit" | "nfa-per-ft" | "cfm" | "none";

export function ratingNeed(kind: CatalogKind, unit: CatalogUnit): RatingNeed {
  if (isFanKind(kind)) return "cfm";
  if (!isVentKind(kind)) return "none";
  return unit === "linear-ft" ? "nfa-per-ft" : "nfa-per-unit";
}

const NUMBER_TEXT = /^(\d+(\.\d*)?|\.\d+)$/;

function readNumber(text: string): number | null | "bad" {
  const t = text.trim().replace(/,/g, "");
  if (t === "") return null;
  return NUMBER_TEXT.test(t) ? Number(t) : "bad";
}

export function emptyForm(): CatalogFormValues {
  return {
    sku: "", name: "", kind: "ridge", unit: "linear-ft", nfa: "", cfm: "", soldInLengthFt: "",
    materialCost: "", sellPrice: "", laborMinutes: "0", isActive: true,
  };
}

export function formFromItem(item: CatalogRecord): CatalogFormValues {
  return {
    sku: item.sku,
    name: item.name,
    kind: item.kind,
    unit: item.unit,
    nfa: String(item.nfaSqInPerUnit ?? item.nfaSqInPerFt ?? ""),
    cfm: item.cfm === null ? "" : String(item.cfm),
    soldInLengthFt: item.soldInLengthFt === null ? "" : String(item.soldInLengthFt),
    materialCost: centsToDollarsText(item.materialCostCents),
    sellPrice: centsToDollarsText(item.sellPriceCents),
    laborMinutes: String(item.laborMinutesPerUnit),
    isActive: item.isActive,
  };
}

export type ReadResult = { input: CatalogItemInput; errors: null } | { input: null; errors: Partial<Record<CatalogFormField, string>> };

/** Text → a checked CatalogItemInput, or a message per form field. */
export function readCatalogForm(v: CatalogFormValues): ReadResult {
  const errors: Partial<Record<CatalogFormField, string>> = {};
  const need = ratingNeed(v.kind, v.unit);
  const number = (field: CatalogFormField, text: string, label: string): number | null => {
    const n = readNumber(text);
    if (n === "bad") {
      errors[field] = `${label} must be a number, like 18 or 7.5.`;
      return null;
    }
    return n;
  };
  const money = (field: CatalogFormField, text: string, label: string): number => {
    const parsed = parseDollarsToCents(text, label);
    if (!parsed.ok) {
      errors[field] = parsed.message;
      return 0;
    }
    return parsed.cents;
  };

  const nfa = need === "nfa-per-unit" || need === "nfa-per-ft" ? number("nfa", v.nfa, "Net free area") : null;
  if ((need === "nfa-per-unit" || need === "nfa-per-ft") && nfa === null && !errors.nfa) {
    errors.nfa = "A vent needs its rated net free area (from the product label).";
  }
  const cfm = need === "cfm" ? number("cfm", v.cfm, "Airflow") : null;
  if (need === "cfm" && cfm === null && !errors.cfm) errors.cfm = "A powered fan needs its rated airflow in cfm.";
  if (need === "cfm" && v.unit !== "each") errors.unit = "A powered fan is counted each.";
  if (isVentKind(v.kind) && v.unit === "hour") errors.unit = "A vent is counted each or by the linear foot.";
  const soldIn = v.unit === "linear-ft" ? number("soldInLengthFt", v.soldInLengthFt, "Piece length") : null;
  const minutes = number("laborMinutes", v.laborMinutes, "Labour minutes");
  if (minutes !== null && !Number.isInteger(minutes)) errors.laborMinutes = "Labour minutes are whole minutes.";

  const candidate = {
    sku: v.sku,
    name: v.name,
    kind: v.kind,
    unit: v.unit,
    nfaSqInPerUnit: need === "nfa-per-unit" ? nfa : null,
    nfaSqInPerFt: need === "nfa-per-ft" ? nfa : null,
    cfm,
    soldInLengthFt: soldIn,
    materialCostCents: money("materialCost", v.materialCost, "Material cost"),
    sellPriceCents: money("sellPrice", v.sellPrice, "Sell price"),
    laborMinutesPerUnit: minutes ?? 0,
    isActive: v.isActive,
  };
  const parsed = CatalogItemInputSchema.safeParse(candidate);
  if (!parsed.success) {
    for (const issue of parsed.error.issues) {
      const field = FORM_FIELD_OF[issue.path[0] as keyof CatalogItemInput];
      if (field && !errors[field]) errors[field] = issue.message;
    }
  }
  if (Object.keys(errors).length > 0 || !parsed.success) return { input: null, errors };
  return { input: parsed.data, errors: null };
}

/** The form's zod schema: the text shape, then every rule of readCatalogForm. */
export const CatalogFormSchema = z
  .object({
    sku: z.string(),
    name: z.string(),
    kind: z.enum(CATALOG_KINDS),
    unit: z.enum(CATALOG_UNITS),
    nfa: z.string(),
    cfm: z.string(),
    soldInLengthFt: z.string(),
    materialCost: z.string(),
    sellPrice: z.string(),
    laborMinutes: z.string(),
    isActive: z.boolean(),
  })
  .superRefine((values, ctx) => {
    const result = readCatalogForm(values);
    if (result.errors) {
      for (const [field, message] of Object.entries(result.errors)) ctx.addIssue({ code: "custom", path: [field], message });
    }
  });
