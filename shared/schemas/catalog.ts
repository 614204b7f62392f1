import { z } from "zod";
import { VENT_KINDS } from "../ventilation/vent-kinds.ts";

/** Work and accessories a fix needs beside the vents themselves (DESIGN.md §4 vent kinds plus these). */
export const ACCESSORY_KINDS = [
  "baffle",
  "deck-cut",
  "patch-vent-opening",
  "seal-gable-opening",
  "electrical-disconnect",
  "insulation-clearing",
  "bath-fan-duct",
  "labor",
  "other",
] as const;
export const CATALOG_KINDS = [...VENT_KINDS, ...ACCESSORY_KINDS] as const;

/** Accessories in words, for anything people read (the generator's reasons, the catalog page). */
export const ACCESSORY_LABELS: Record<(typeof ACCESSORY_KINDS)[number], string> = {
  baffle: "insulation baffle",
  "deck-cut": "roof deck cut",
  "patch-vent-opening": "patch a removed vent",
  "seal-gable-opening": "seal a gable opening",
  "electrical-disconnect": "electrical disconnect",
  "insulation-clearing": "clear insulation",
  "bath-fan-duct": "duct a bath fan outside",
  labor: "labour",
  other: "other",
};
export type CatalogKind = (typeof CATALOG_KINDS)[number];

export const CATALOG_UNITS = ["each", "linear-ft", "hour"] as const;
export type CatalogUnit = (typeof CATALOG_UNITS)[number];

const cents = (what: string) =>
  z.number({ error: `${what} must be a number of cents.` }).int(`${what} must be whole cents.`).min(0, `${what} can't be negative.`).max(100_000_000, `${what} is too large.`);

/**
 * One catalog item. Money is integer cents; a vent's NFA is per unit ("each") or per foot
 * ("linear-ft"); a fan has its cfm. `soldInLengthFt` says how a linear product is bought
 * (e.g. ridge vent in 4 ft pieces) for the crew's materials list.
 */
const catalogFields = {
  sku: z.string().trim().min(1, "Give the item a short code.").max(40, "Use at most 40 characters.").regex(/^[A-Za-z0-9._-]+$/, "Use letters, digits, dot, dash or underscore."),
  name: z.string().trim().min(1, "Name the item.").max(200, "Use at most 200 characters."),
  kind: z.enum(CATALOG_KINDS, { error: "Choose what kind of item this is." }),
  unit: z.enum(CATALOG_UNITS, { error: "Choose each, linear-ft or hour." }),
  nfaSqInPerUnit: z.number().positive("NFA must be more than 0.").max(100_000).nullable(),
  nfaSqInPerFt: z.number().positive("NFA per foot must be more than 0.").max(200).nullable(),
  cfm: z.number().positive("Airflow must be more than 0.").max(50_000).nullable(),
  soldInLengthFt: z.number().positive().max(100).nullable(),
  materialCostCents: cents("Material cost"),
  sellPriceCents: cents("Sell price"),
  laborMinutesPerUnit: z.number().int("Labour minutes are whole minutes.").min(0).max(10_000),
  isActive: z.boolean(),
};

export const CatalogItemInputSchema = z
  .object({
    ...catalogFields,
    nfaSqInPerUnit: catalogFields.nfaSqInPerUnit.default(null),
    nfaSqInPerFt: catalogFields.nfaSqInPerFt.default(null),
    cfm: catalogFields.cfm.default(null),
    soldInLengthFt: catalogFields.soldInLengthFt.default(null),
    laborMinutesPerUnit: catalogFields.laborMinutesPerUnit.default(0),
    isActive: catalogFields.isActive.default(true),
  })
  .strict();
/** A patch names only what changes: built from the fields without defaults, so nothing unsent is reset. */
export const CatalogItemPatchSchema = z.object(catalogFields).partial().strict();

export type CatalogItemInput = z.infer<typeof CatalogItemInputSchema>;
export interface CatalogItem extends CatalogItemInput {
  id: string;
}
