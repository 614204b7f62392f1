import { z } from "zod";
import { versionField } from "./input-safety.ts";
import { AtticAssemblySchema, EnclosedRafterBaysSchema, LIMITS, RoofFormSchema, SectionSchema, SiteSchema, UnventedAssemblySchema, VentSchema } from "../ventilation/schema.ts";

/**
 * One separately vented attic space as the estimator records it. Sections and vents use the
 * core's own schemas, so what is saved is always something the core can analyse; the client
 * validates with the same schemas before it sends, and keeps invalid edits on the device.
 */
export const SpaceRoofSchema = z.object({
  form: RoofFormSchema.default("gable"),
  /** Rise in inches per 12 in of run. */
  pitchIn12: z.number({ error: "Pitch must be a number." }).min(0, "Pitch can't be negative.").max(24, "Pitch must be at most 24/12.").default(6),
  /** Length of ridge available for a ridge vent, ft. */
  ridgeLengthFt: z.number().positive("Ridge length must be more than 0.").max(1_000).nullable().default(null),
  /** Length of eave available for soffit intake, ft. */
  eaveLengthFt: z.number().positive("Eave length must be more than 0.").max(2_000).nullable().default(null),
  /**
   * Vented (the usual attic) or unvented (sealed, insulated at the roof line: IRC R806.5). Optional
   * inside the roof's JSONB, so spaces stored before it existed read as vented (decision 8).
   */
  assembly: AtticAssemblySchema.optional(),
  unvented: UnventedAssemblySchema.optional(),
  /** Cathedral ceiling or ceiling on the rafters: each bay is vented on its own (IRC R806.1). */
  enclosedRafterBays: EnclosedRafterBaysSchema.optional(),
});

/** The site checklist: the core's site flags plus observations it does not compute with. */
export const SiteChecklistSchema = SiteSchema.extend({
  moistureOrMould: z.boolean().optional(),
  daylightAtRidge: z.boolean().optional(),
});

export const SpaceSurveySchema = z.object({
  name: z.string().trim().min(1, "Name the space (e.g. Main attic).").max(120, "Use at most 120 characters."),
  roof: SpaceRoofSchema,
  sections: z.array(SectionSchema).max(LIMITS.maxSections, `At most ${LIMITS.maxSections} sections in one space.`),
  vents: z.array(VentSchema).max(LIMITS.maxVents, `At most ${LIMITS.maxVents} vent rows in one space (give a row a quantity for identical vents).`),
  site: SiteChecklistSchema.default({}),
  notes: z.string().max(5_000, "Notes must be at most 5,000 characters.").nullable().default(null),
});

/** An id made on the device (field mode): the same creation sent again lands once. */
const deviceMadeId = (what: string) => z.string().uuid(`The ${what} id made on this device must be a UUID.`);

export const SpaceCreateSchema = SpaceSurveySchema.partial({ roof: true, sections: true, vents: true, site: true, notes: true })
  .extend({ id: deviceMadeId("attic space").optional() })
  .strict();
/** A full save of a space, with the version it was based on (409 when stale). */
export const SpaceSaveSchema = SpaceSurveySchema.extend({ version: versionField("attic space") }).strict();

export type SpaceRoof = z.infer<typeof SpaceRoofSchema>;
export type SiteChecklist = z.infer<typeof SiteChecklistSchema>;
export type SpaceSurvey = z.infer<typeof SpaceSurveySchema>;

/** Copy the vents of another space of the same project into this one (each gets a new id). */
export const CopyVentsSchema = z.object({ fromSpaceId: z.string().uuid("Choose the space to copy from.") }).strict();

/** Multipart form fields send "" for an untouched input: that means "not given". */
const blankIsAbsent = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === "" ? undefined : v), schema.optional());

export const PhotoCaptionSchema = z.string({ error: "Caption must be text." }).trim().max(500, "Caption must be at most 500 characters.");

/** The text fields sent beside a photo upload (multipart field "file" carries the bytes). */
export const PhotoFieldsSchema = z.object({
  id: blankIsAbsent(deviceMadeId("photo")),
  spaceId: blankIsAbsent(z.string().uuid("Choose one of this project's attic spaces.")),
  ventId: blankIsAbsent(z.string().trim().min(1).max(100, "Vent ids are at most 100 characters.")),
  /** A finding or checklist code in kebab-case, e.g. "soffits-blocked". */
  findingCode: blankIsAbsent(z.string().regex(/^[a-z0-9]+(-[a-z0-9]+)*$/, "A finding code looks like soffits-blocked.").max(60, "A finding code is at most 60 characters.")),
  caption: blankIsAbsent(PhotoCaptionSchema),
}).strict();

export const PhotoPatchSchema = z.object({ caption: PhotoCaptionSchema.nullable() }).strict();

export type PhotoFields = z.infer<typeof PhotoFieldsSchema>;
