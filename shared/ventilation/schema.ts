/**
 * zod schema of an attic-space survey, the input of `analyzeAttic` (DESIGN.md §4). Every range
 * is bounded so a valid input can never make the core produce NaN or Infinity.
 */
import { z } from "zod";
import { FanDiagnosticsSchema } from "../diagnostics/schema";
import { polygonProblem, shoelaceAreaSqFt } from "./floor-area";
import { isMechanicalKind, VENT_KINDS } from "./vent-kinds";

/**
 * Code editions a project can name. 2021 and 2024 are named explicitly and share the 2018 text's
 * rule (`codeBasisRule`); 2015 shares the 2012 text's. Older values stay valid for stored projects.
 */
export const CODE_BASES = ["irc-2024", "irc-2021", "irc-2018", "irc-2012", "irc-2009", "strict-150"] as const;
export const CodeBasisSchema = z.enum(CODE_BASES);
export const VaporRetarderSchema = z.enum(["none", "class-I", "class-II", "class-III"]);
export const RoofColorSchema = z.enum(["light", "medium", "dark"]);
export const RoofFormSchema = z.enum(["gable", "hip", "shed"]);
export const VentKindSchema = z.enum(VENT_KINDS);
/**
 * Which area the 1/300 route's 40–50 % (2009: 50–80 %) upper-vent share is taken of: "required"
 * is the literal text [SOURCES.md S4]; "provided" is a local reading a company may choose.
 */
export const UpperShareBaseSchema = z.enum(["required", "provided"]);
export const VentLocationSchema = z.enum(["upper", "lower"]);
export const MeshSizeSchema = z.enum(["1/4", "1/8", "1/16"]);
/** What the estimator found: open, partly blocked (with how much), blocked, painted over, damaged. */
export const VentConditionSchema = z.enum(["open", "partly-blocked", "blocked", "painted-over", "damaged"]);
export const BlockedBySchema = z.enum(["insulation", "paint", "debris", "nest", "other"]);
export const LouverMaterialSchema = z.enum(["wood", "metal"]);
/** louverMaterial is optional so surveys stored before it existed stay valid (DEVELOPERS.md decision 8). */
export const CoveringSchema = z.object({ mesh: MeshSizeSchema, louvers: z.boolean(), louverMaterial: LouverMaterialSchema.optional() });

/** Limits: generous for any house, small enough that sums stay finite. */
/**
 * Bounds of one attic space's survey. Sections, vent rows and outline corners are set where no real
 * house reaches (Decision 18: a large custom home surveys to about 10 sections and 40 vent rows; a row
 * carries a quantity, so 12 matching soffit vents are one row; common practice, no source), far below
 * the 2,000 rows whose analysis took ~0.5 s (bench/largest-analysis-bench.ts measures the largest).
 * The client's forms, the API and the PDF all read these.
 */
export const LIMITS = {
  maxSideFt: 1_000,
  maxCoordinateFt: 10_000,
  maxSectionAreaSqFt: 200_000,
  maxPolygonPoints: 200,
  maxSections: 40,
  maxVents: 150,
  /** Separately vented attic spaces in one project (main attic, garage, additions, porches). */
  maxSpacesPerProject: 8,
  maxPitchIn12: 24,
  maxQuantity: 1_000,
  maxNfaSqInPerUnit: 100_000,
  maxNfaSqInPerFt: 200,
  maxVentLengthFt: 2_000,
  maxGrossSideIn: 480,
  maxCfm: 50_000,
  maxHeightFt: 200,
} as const;

const id = z.string().trim().min(1, "An id is required.").max(100);
const positive = (max: number, what: string) =>
  z.number({ error: `${what} must be a number.` })
    .positive(`${what} must be more than 0.`)
    .max(max, `${what} must be at most ${max.toLocaleString("en-US")}.`);

const roofFields = {
  id: id.optional(),
  label: z.string().max(200).optional(),
  roofForm: RoofFormSchema.optional(),
  pitchIn12: z.number().min(0, "Pitch can't be negative.").max(LIMITS.maxPitchIn12, "Pitch must be at most 24/12.").optional(),
  /** Horizontal span across the slope; needed for the volume of an outline or entered area. */
  spanFt: positive(LIMITS.maxSideFt, "Span").optional(),
};

const coordinate = z.number().min(-LIMITS.maxCoordinateFt).max(LIMITS.maxCoordinateFt);

export const RectSectionSchema = z.object({
  kind: z.literal("rect"),
  /** Along the ridge. */
  lengthFt: positive(LIMITS.maxSideFt, "Length"),
  /** Across the ridge, eave to eave: the span of a gable or shed. */
  widthFt: positive(LIMITS.maxSideFt, "Width"),
  ...roofFields,
});

export const PolygonSectionSchema = z
  .object({
    kind: z.literal("polygon"),
    pointsFt: z.array(z.tuple([coordinate, coordinate])).min(3, "An outline needs at least 3 corners.").max(LIMITS.maxPolygonPoints, `An outline has at most ${LIMITS.maxPolygonPoints} corners.`),
    ...roofFields,
  })
  .superRefine((section, ctx) => {
    const problem = polygonProblem(section.pointsFt);
    if (problem) {
      ctx.addIssue({ code: "custom", message: problem, path: ["pointsFt"] });
      return;
    }
    if (shoelaceAreaSqFt(section.pointsFt) > LIMITS.maxSectionAreaSqFt) {
      ctx.addIssue({ code: "custom", message: `One section can be at most ${LIMITS.maxSectionAreaSqFt.toLocaleString("en-US")} sq ft.`, path: ["pointsFt"] });
    }
  });

export const AreaSectionSchema = z.object({
  kind: z.literal("area"),
  areaSqFt: positive(LIMITS.maxSectionAreaSqFt, "Area"),
  ...roofFields,
});

export const SectionSchema = z.discriminatedUnion("kind", [RectSectionSchema, PolygonSectionSchema, AreaSectionSchema]);

export const VentSchema = z
  .object({
    id,
    kind: VentKindSchema,
    /** upper = exhaust (high on the roof), lower = intake (eaves, soffits). */
    location: VentLocationSchema,
    label: z.string().max(200).optional(),
    /** Which section this vent serves; used for that section's rise. */
    sectionId: id.optional(),
    /** Vertical drop from the ridge (or highest point) to the vent, ft. */
    dropBelowRidgeFt: z.number().min(0).max(LIMITS.maxHeightFt).optional(),
    /** Vertical height of the vent above the eave vents, ft, when measured directly. */
    heightAboveEaveFt: z.number().min(0).max(LIMITS.maxHeightFt).optional(),
    quantity: z.number().int("Quantity must be a whole number.").min(1, "Quantity must be at least 1.").max(LIMITS.maxQuantity).optional(),
    /** Manufacturer-rated NFA of one unit; wins over any computed figure. */
    nfaSqIn: positive(LIMITS.maxNfaSqInPerUnit, "Rated NFA").optional(),
    nfaSqInPerUnit: positive(LIMITS.maxNfaSqInPerUnit, "NFA per unit").optional(),
    lengthFt: positive(LIMITS.maxVentLengthFt, "Vent length").optional(),
    nfaSqInPerFt: positive(LIMITS.maxNfaSqInPerFt, "NFA per foot").optional(),
    grossWidthIn: positive(LIMITS.maxGrossSideIn, "Gross width").optional(),
    grossHeightIn: positive(LIMITS.maxGrossSideIn, "Gross height").optional(),
    covering: CoveringSchema.optional(),
    /** Rated airflow of one powered fan, cfm. */
    cfm: positive(LIMITS.maxCfm, "Airflow").optional(),
    mounting: z.enum(["roof", "gable"]).optional(),
    hasThermostat: z.boolean().optional(),
    thermostatSetPointF: z.number().min(40).max(180).optional(),
    control: z.enum(["thermostat", "thermostat-and-humidistat", "switch", "always-on", "solar"]).optional(),
    /** A gable fan: is it sealed to its opening (shroud or baffle) so it can't recirculate attic air? */
    sealedToOpening: z.boolean().optional(),
    diagnostics: FanDiagnosticsSchema.optional(),
    /** Condition found on site; open when absent (older surveys). */
    condition: VentConditionSchema.optional(),
    /** Partly blocked: how many of the `quantity` units are blocked ("4 of 10 soffit vents"). */
    blockedQuantity: z.number().int("Blocked count must be a whole number.").min(0).max(LIMITS.maxQuantity).optional(),
    /** Partly blocked: the share of the vent's area that is blocked, 0–1 (e.g. half a continuous soffit). */
    blockedShare: z.number().min(0, "Blocked share is 0–100 %.").max(1, "Blocked share is 0–100 %.").optional(),
    blockedBy: BlockedBySchema.optional(),
  })
  .superRefine((vent, ctx) => {
    if (vent.condition === "partly-blocked") {
      if (vent.blockedQuantity === undefined && vent.blockedShare === undefined) {
        ctx.addIssue({ code: "custom", path: ["blockedQuantity"], message: "Say how many are blocked (e.g. 4 of 10) or what share of the vent is blocked." });
      }
      if (vent.blockedQuantity !== undefined && vent.blockedShare !== undefined) {
        ctx.addIssue({ code: "custom", path: ["blockedShare"], message: "Give either how many are blocked or the share blocked, not both." });
      }
      if (vent.blockedQuantity !== undefined && vent.blockedQuantity > (vent.quantity ?? 1)) {
        ctx.addIssue({ code: "custom", path: ["blockedQuantity"], message: `At most ${vent.quantity ?? 1} can be blocked (the quantity recorded).` });
      }
    } else if (vent.blockedQuantity !== undefined || vent.blockedShare !== undefined) {
      ctx.addIssue({ code: "custom", path: ["condition"], message: "A blocked count or share goes with the condition \"partly blocked\"." });
    }
    if (isMechanicalKind(vent.kind) && vent.condition !== undefined && vent.condition !== "open" && vent.condition !== "damaged") {
      ctx.addIssue({ code: "custom", path: ["condition"], message: "A fan is recorded as open or damaged; check it with the fan checks." });
    }
    const nfaFields = ["nfaSqIn", "nfaSqInPerUnit", "lengthFt", "nfaSqInPerFt", "grossWidthIn", "grossHeightIn", "covering"] as const;
    if (isMechanicalKind(vent.kind)) {
      if (vent.cfm === undefined) {
        ctx.addIssue({ code: "custom", path: ["cfm"], message: "A powered fan needs its rated airflow in cfm." });
      }
      for (const field of nfaFields) {
        if (vent[field] !== undefined) {
          ctx.addIssue({
            code: "custom",
            path: [field],
            message: "A powered fan moves air mechanically and has no net free area; give its airflow in cfm instead.",
          });
        }
      }
      return;
    }
    if (vent.cfm !== undefined) ctx.addIssue({ code: "custom", path: ["cfm"], message: "Only powered fans have a cfm rating; give this vent's net free area." });
    if (vent.diagnostics !== undefined) ctx.addIssue({ code: "custom", path: ["diagnostics"], message: "Fan checks apply to powered fans only." });
    if (vent.nfaSqIn !== undefined) return; // a rated NFA is enough on its own
    const hasPerUnit = vent.nfaSqInPerUnit !== undefined;
    const hasLength = vent.lengthFt !== undefined || vent.nfaSqInPerFt !== undefined;
    const hasGross = vent.grossWidthIn !== undefined || vent.grossHeightIn !== undefined || vent.covering !== undefined;
    const ways = [hasPerUnit, hasLength, hasGross].filter(Boolean).length;
    if (ways === 0) {
      ctx.addIssue({
        code: "custom",
        path: ["nfaSqIn"],
        message: "Give this vent's size: a rated NFA, a quantity with NFA per unit, a length with NFA per foot, or a gross width and height with the covering.",
      });
      return;
    }
    if (ways > 1) {
      ctx.addIssue({ code: "custom", path: ["nfaSqInPerUnit"], message: "Give the vent's size one way only (per unit, per foot, or gross size with covering)." });
      return;
    }
    if (hasLength) {
      if (vent.lengthFt === undefined) ctx.addIssue({ code: "custom", path: ["lengthFt"], message: "Give the vent's length in feet." });
      if (vent.nfaSqInPerFt === undefined) ctx.addIssue({ code: "custom", path: ["nfaSqInPerFt"], message: "Give the NFA per foot (from the product label)." });
    }
    if (hasGross) {
      if (vent.grossWidthIn === undefined) ctx.addIssue({ code: "custom", path: ["grossWidthIn"], message: "Give the opening's gross width in inches." });
      if (vent.grossHeightIn === undefined) ctx.addIssue({ code: "custom", path: ["grossHeightIn"], message: "Give the opening's gross height in inches." });
      if (vent.covering === undefined) ctx.addIssue({ code: "custom", path: ["covering"], message: "Say what covers the opening (mesh size and whether it has louvers)." });
    }
  });

/** IECC moisture regime: A moist, B dry, C marine; zones 7 and 8 carry none [SOURCES.md S20, S21]. */
export const MoistureRegimeSchema = z.enum(["A", "B", "C"]);
/** A space of enclosed rafter bays: how many bays, and the rafter spacing. */
export const EnclosedRafterBaysSchema = z.object({
  bayCount: z.number().int("Bays are counted in whole numbers.").min(1, "At least one bay.").max(500),
  baySpacingIn: z.number().min(8, "Rafter spacing is at least 8 in.").max(96, "Rafter spacing is at most 96 in."),
});
export const AtticAssemblySchema = z.enum(["vented", "unvented"]);
/** How an unvented (sealed) roof assembly is built — what IRC R806.5 checks [SOURCES.md S7, S25]. */
export const UnventedAssemblySchema = z.object({
  insulation: z.enum(["air-impermeable-only", "air-impermeable-and-air-permeable", "rigid-above-deck-and-air-permeable", "air-permeable-only"]),
  /** R-value of the spray foam against the deck, or of the rigid board above it. */
  airImpermeableRValue: z.number().min(0).max(100).optional(),
  /** The foam is itself a Class II vapor retarder (closed-cell at normal thickness) or is coated with one. */
  foamIsClassII: z.boolean().optional(),
  /** The insulated roof line and air barrier enclose the whole attic (it is inside the thermal envelope). */
  isInsideThermalEnvelope: z.boolean().optional(),
  roofCovering: z.enum(["asphalt-shingles", "wood-shingles-or-shakes", "tile-or-metal", "other"]).optional(),
  /** For wood shingles or shakes: a 1/4 in vented air space under them. */
  hasVentedGapUnderShakes: z.boolean().optional(),
});

export const SiteSchema = z.object({
  /** A natural-draft (atmospheric) gas or oil appliance in the house: water heater, furnace, boiler. */
  atmosphericCombustionAppliance: z.boolean().optional(),
  /** A gable-mounted fan is sealed to its opening. */
  gableFanSealed: z.boolean().optional(),
  /** Insulation blocks the soffit vents (IRC R806.3). */
  soffitsBlocked: z.boolean().optional(),
  /** Insulation baffles (vent chutes) are in the rafter bays at the eaves. */
  bafflesPresent: z.boolean().optional(),
  /** A bath fan exhausts into the attic instead of outdoors. */
  bathFanIntoAttic: z.boolean().optional(),
  /** A kitchen hood or dryer exhausts into the attic. */
  kitchenOrDryerIntoAttic: z.boolean().optional(),
  /** The ceiling (top plates, penetrations, hatch) has been air-sealed. */
  ceilingAirSealed: z.boolean().optional(),
});

export const AtticInputSchema = z
  .object({
    codeBasis: CodeBasisSchema,
    climateZone: z.number().int("Climate zone is a whole number 1–8.").min(1, "Climate zone is 1–8.").max(8, "Climate zone is 1–8."),
    ceilingVaporRetarder: VaporRetarderSchema,
    roofColor: RoofColorSchema,
    /** IECC moisture letter with the zone (4C marine …); zones 7–8 have none. Optional for older surveys. */
    moistureRegime: MoistureRegimeSchema.nullable().optional(),
    /** A space of enclosed rafter bays (cathedral ceiling): each bay is vented on its own (IRC R806.1). */
    enclosedRafterBays: EnclosedRafterBaysSchema.optional(),
    /** "unvented" for a sealed attic (IRC R806.5); vented when absent. */
    assembly: AtticAssemblySchema.optional(),
    unvented: UnventedAssemblySchema.optional(),
    /** The company's reading of the upper-vent share; the literal "required" when absent. */
    upperShareBase: UpperShareBaseSchema.optional(),
    sections: z.array(SectionSchema).min(1, "Add at least one section of attic floor.").max(LIMITS.maxSections, `At most ${LIMITS.maxSections} sections in one space.`),
    vents: z.array(VentSchema).max(LIMITS.maxVents, `At most ${LIMITS.maxVents} vent rows in one space (give a row a quantity for identical vents).`),
    site: SiteSchema.optional(),
  })
  .superRefine((input, ctx) => {
    if (input.assembly === "unvented" && input.unvented === undefined) {
      ctx.addIssue({ code: "custom", path: ["unvented"], message: "Say how the unvented roof is insulated (spray foam, rigid board above the deck, or batts only)." });
    }
    const sectionIds = new Set<string>();
    input.sections.forEach((section, index) => {
      if (section.id === undefined) return;
      if (sectionIds.has(section.id)) ctx.addIssue({ code: "custom", path: ["sections", index, "id"], message: `Section id "${section.id}" is used twice.` });
      sectionIds.add(section.id);
    });
    const ventIds = new Set<string>();
    input.vents.forEach((vent, index) => {
      if (ventIds.has(vent.id)) ctx.addIssue({ code: "custom", path: ["vents", index, "id"], message: `Vent id "${vent.id}" is used twice.` });
      ventIds.add(vent.id);
      if (vent.sectionId !== undefined && !sectionIds.has(vent.sectionId)) {
        ctx.addIssue({ code: "custom", path: ["vents", index, "sectionId"], message: `No section has the id "${vent.sectionId}".` });
      }
    });
  });

export type CodeBasis = z.infer<typeof CodeBasisSchema>;
export type VaporRetarder = z.infer<typeof VaporRetarderSchema>;
export type UpperShareBase = z.infer<typeof UpperShareBaseSchema>;
export type VentCondition = z.infer<typeof VentConditionSchema>;
export type MoistureRegime = z.infer<typeof MoistureRegimeSchema>;
export type UnventedAssembly = z.infer<typeof UnventedAssemblySchema>;
export type RoofColor = z.infer<typeof RoofColorSchema>;
export type VentLocation = z.infer<typeof VentLocationSchema>;
export type Section = z.infer<typeof SectionSchema>;
export type Vent = z.infer<typeof VentSchema>;
export type Site = z.infer<typeof SiteSchema>;
export type AtticInput = z.infer<typeof AtticInputSchema>;

/**
 * The same schema, its output marked as checked. Parse with it once at the boundary (the server's
 * request, the client's form) and hand the result to `analyzeParsedAttic`, which trusts it and does
 * not validate again (issue 17: the input was validated twice on both paths). The mark is a type
 * only; at run time it is AtticInputSchema.
 */
export const ParsedAtticSchema = AtticInputSchema.brand<"ParsedAttic">();
export type ParsedAttic = z.output<typeof ParsedAtticSchema>;
