import { z } from "zod";
import { OPTION_NOTES_MAX_CHARS } from "../proposals/limits.ts";
import { versionField } from "./input-safety.ts";
import { LIMITS } from "../ventilation/schema.ts";

/**
 * A design option: what to do with each surveyed vent and what to add, per attic space, plus
 * labour lines and the commercial terms. The analysis and the price are computed from it by
 * shared/ (never stored as the source of truth).
 */
export const VENT_ACTIONS = ["keep", "remove", "replace"] as const;
export type VentAction = (typeof VENT_ACTIONS)[number];

export const AddedItemSchema = z.object({
  id: z.string().min(1).max(100),
  catalogItemId: z.string().uuid("Choose a catalog item."),
  /** Count for "each" items, feet for "linear-ft", hours for "hour". */
  quantity: z.number({ error: "Quantity must be a number." }).positive("Quantity must be more than 0.").max(10_000, "Quantity is too large."),
  /** Where a vent goes; defaults from its kind. */
  location: z.enum(["upper", "lower"]).optional(),
  dropBelowRidgeFt: z.number().min(0).max(200).optional(),
  /** Which existing vent this replaces, when the action was "replace". */
  replacesVentId: z.string().max(100).optional(),
  note: z.string().max(500).optional(),
});

export const OptionSpaceSchema = z.object({
  spaceId: z.string().uuid(),
  /** Action per existing vent id; a vent not listed is kept. */
  ventActions: z.record(z.string().max(100), z.enum(VENT_ACTIONS)).default({}),
  added: z.array(AddedItemSchema).max(40, "At most 40 added items per space.").default([]),
  /** Site fixes the option includes, e.g. clearing blocked soffits, sealing a gable fan opening. */
  siteFixes: z.object({ clearsBlockedSoffits: z.boolean().optional(), sealsGableFan: z.boolean().optional(), ductsBathFan: z.boolean().optional() }).default({}),
});

export const LaborLineSchema = z.object({
  id: z.string().min(1).max(100),
  description: z.string().trim().min(1, "Describe the work.").max(300),
  hours: z.number().positive().max(1_000),
  rateCents: z.number().int().min(0).max(10_000_000),
  /**
   * Where the hours come from: typed by a person ("entered", the default), the catalog's minutes
   * per unit of what the option adds ("catalog", kept in step with the quantities), or the
   * catalog's line with hours a person typed over ("overridden").
   */
  hoursBasis: z.enum(["entered", "catalog", "overridden"]).optional(),
});

export const AdjustmentSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("none") }),
  z.object({ kind: z.literal("amount"), cents: z.number().int().min(0).max(100_000_000) }),
  /** Percent in basis points: 1,000 = 10 %. */
  z.object({ kind: z.literal("percent"), basisPoints: z.number().int().min(0).max(10_000) }),
]);

const optionFields = {
  name: z.string().trim().min(1, "Name the option.").max(120),
  notes: z.string().max(OPTION_NOTES_MAX_CHARS, `Notes are at most ${OPTION_NOTES_MAX_CHARS.toLocaleString("en-US")} characters.`).nullable(),
  spaces: z.array(OptionSpaceSchema).max(LIMITS.maxSpacesPerProject, `An option covers at most ${LIMITS.maxSpacesPerProject} attic spaces.`),
  laborLines: z.array(LaborLineSchema).max(30, "At most 30 labour lines."),
  discount: AdjustmentSchema,
  isKept: z.boolean(),
  /** How it was made: by hand, or by the generator with its explanation. */
  origin: z.enum(["manual", "generated"]),
  rationale: z.array(z.string().max(1_000)).max(50),
};

export const DesignOptionInputSchema = z
  .object({
    ...optionFields,
    notes: optionFields.notes.default(null),
    spaces: optionFields.spaces.default([]),
    laborLines: optionFields.laborLines.default([]),
    discount: optionFields.discount.default({ kind: "none" }),
    isKept: optionFields.isKept.default(true),
    origin: optionFields.origin.default("manual"),
    rationale: optionFields.rationale.default([]),
  })
  .strict();

/** A patch names only what changes, with the version it was based on (409 when stale). */
export const DesignOptionPatchSchema = z
  .object(optionFields)
  .partial()
  .extend({ version: versionField("option") })
  .strict();

export type AddedItem = z.infer<typeof AddedItemSchema>;
export type OptionSpace = z.infer<typeof OptionSpaceSchema>;
export type LaborLine = z.infer<typeof LaborLineSchema>;
export type Adjustment = z.infer<typeof AdjustmentSchema>;
export type DesignOptionInput = z.infer<typeof DesignOptionInputSchema>;
