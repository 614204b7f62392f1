/**
 * The design generator: from one surveyed attic space, its roof constraints and the catalog, it
 * proposes options that meet the code minimum, each with ONE exhaust type, and explains every
 * quantity with its arithmetic. Pure and deterministic: no clock, no I/O, no randomness.
 *
 * Option types (each proposed only when it fits; otherwise listed in `skipped` with the reason):
 * - "ridge-and-continuous-soffit": a ridge vent with continuous soffit intake. Every other
 *   exhaust — box vents, turbines, gable louvers, powered fans — is removed and its opening
 *   patched or sealed: a fan or gable louver beside a ridge vent short-circuits it (common
 *   practice; SOURCES.md §5.4, S19).
 * - "static-vents-and-individual-soffit": static (box) vents in a row under the ridge with
 *   individual soffit vents; all other exhaust removed. For hip roofs with short ridges.
 * - "remove-fan-passive" (only when the survey has a powered fan): the fan is disconnected and
 *   removed, its roof opening reused for a static vent or patched (a gable fan's opening sealed),
 *   and the passive exhaust already there is kept and topped up with the same kind, with intake of
 *   the kind already there. Powered fans can depressurize the house (SOURCES.md §5.1–5.2).
 *
 * Sizing (IRC R806.2, per the project's code basis — the core decides, the generator aims):
 * - First aim for 1/300 when the code basis offers it: half the required area in exhaust within
 *   3 ft of the ridge (at least 40 %, or 50 % under IRC 2009), the balance low at the eaves.
 *   Fall back to 1/150 when 1/300 is not available or the core does not confirm it.
 * - Exhaust aims at 50 % of the required area and may go down to the rule's minimum share (40 %)
 *   when the roof has no room for more; intake is at least the exhaust and at least the balance
 *   (intake ≥ exhaust always: SOURCES.md §5.3, BC Housing S18).
 * - Quantities are what is bought: whole vents, linear vents in whole pieces where they fit.
 * - Every proposal is checked by analyzeAttic on the attic as it would be after the work; only
 *   compliant proposals with one exhaust type, intake ≥ exhaust and no powered fan are returned.
 */
import { formatCents, priceOption, DEFAULT_PRICING_SETTINGS, type OptionPrice, type PricingSettings } from "../pricing/index";
import { ACCESSORY_LABELS, type CatalogItem } from "../schemas/catalog";
import type { AddedItem, DesignOptionInput, OptionSpace, VentAction } from "../schemas/options";
import type { SpaceSurvey } from "../schemas/survey";
import { toAtticInput, type ProjectBasis } from "../survey/to-attic-input";
import { ceilWhole, formatNumber } from "../units/format";
import {
  analyzeAttic,
  ATTIC_SAFETY_CAUTION,
  COMBUSTION_SAFETY_CAUTION,
  EAVE_KINDS,
  FAN_SAFETY_CAUTION,
  isMechanicalKind,
  isPoweredKind,
  ratioArithmetic,
  ROOF_SAFETY_CAUTION,
  sectionRiseFt,
  tryAnalyzeAttic,
  VENT_KIND_LABELS,
  ventDisplayName,
  ventListPhrase,
  type AtticAnalysis,
  type Ratio,
  type Vent,
  type VentKind,
} from "../ventilation/index";
import { applyOption } from "./apply-option";
import { pickVentItem, pickWorkItem } from "./pick-catalog-item";
import {
  DEFAULT_RAFTER_SPACING_IN,
  rafterBays,
  roofConstraints,
  STATIC_VENT_DROP_FT,
  staticVentCapacity,
  usableRidgeFt,
  type RoofConstraints,
} from "./roof-constraints";
import { sizeVentItem, type SizeResult, type VentRoom } from "./size-vent-item";
import { codeBasisRule } from "../ventilation/requirement";

export const OPTION_TYPES = ["ridge-and-continuous-soffit", "static-vents-and-individual-soffit", "remove-fan-passive"] as const;
export type OptionType = (typeof OPTION_TYPES)[number];

export const OPTION_TYPE_NAMES: Readonly<Record<OptionType, string>> = {
  "ridge-and-continuous-soffit": "Ridge vent with continuous soffit intake",
  "static-vents-and-individual-soffit": "Static roof vents with individual soffit vents",
  "remove-fan-passive": "Remove the powered fan; passive vents only",
};

export interface GeneratorSettings {
  pricing: PricingSettings;
  /** Rafter or truss spacing, inches on centre: one baffle or soffit vent per bay. */
  rafterSpacingIn: number;
  /** Labour rate for the install line; null takes the catalog's active "labor" hour item. */
  laborRateCentsPerHour: number | null;
}

export const DEFAULT_GENERATOR_SETTINGS: GeneratorSettings = {
  pricing: DEFAULT_PRICING_SETTINGS,
  rafterSpacingIn: DEFAULT_RAFTER_SPACING_IN,
  laborRateCentsPerHour: null,
};

export interface GenerateOptionsInput {
  project: ProjectBasis;
  spaceId: string;
  space: SpaceSurvey;
  catalog: readonly CatalogItem[];
  settings?: Partial<GeneratorSettings>;
}

export interface GeneratedOption {
  type: OptionType;
  option: DesignOptionInput;
  /** The attic as it would be after the work. */
  applied: SpaceSurvey;
  analysis: AtticAnalysis;
  price: OptionPrice;
}

export interface SkippedOption {
  type: OptionType;
  reason: string;
}

export interface GenerateOptionsResult {
  /** The attic as surveyed, analysed; null when the survey can't be analysed yet. */
  baseline: AtticAnalysis | null;
  options: GeneratedOption[];
  skipped: SkippedOption[];
}

/** Passive high vents that exhaust air (powered fans are handled on their own). */
const PASSIVE_EXHAUST_KINDS: readonly VentKind[] = ["ridge", "box", "off-ridge", "turbine", "cupola", "gable-louver"];
/** Roof-mounted vents whose removal leaves a hole in the roof deck to patch. */
const ROOF_OPENING_KINDS: ReadonlySet<VentKind> = new Set<VentKind>(["box", "off-ridge", "turbine", "cupola", "ridge", "powered-roof"]);
const RATIONALE_MAX_CHARS = 1_000;
const NOISE = 1e-9;

const fmt = (n: number) => formatNumber(n);
const clip = (text: string) => (text.length <= RATIONALE_MAX_CHARS ? text : `${text.slice(0, RATIONALE_MAX_CHARS - 1)}…`);
const kindLabel = (kind: VentKind) => VENT_KIND_LABELS[kind];
const unitsOf = (vent: Vent) => vent.quantity ?? 1;
const isGableMounted = (vent: Vent) => vent.kind === "powered-gable" || vent.mounting === "gable";

interface Context {
  input: GenerateOptionsInput;
  settings: GeneratorSettings;
  baseline: AtticAnalysis;
  roof: RoofConstraints;
  nfaById: Map<string, number>;
  qualifyingIds: Set<string>;
  fans: Vent[];
  passiveExhaust: Vent[];
  intake: Vent[];
  /** Smallest rise of any section, ft; null when unknown. */
  minRiseFt: number | null;
  ratios: Ratio[];
  ratioNote: string;
}

interface Plan {
  type: OptionType;
  exhaustKind: VentKind;
  exhaustItem: CatalogItem | null;
  /** Existing vents of the exhaust kind that stay. */
  keptExhaust: Vent[];
  exhaustRoom: VentRoom;
  /** Roof fans whose opening takes a new static vent instead of a patch. */
  reusedFanOpenings: Vent[];
  intakeItem: CatalogItem | null;
  intakeRoom: VentRoom;
  /** Opening lines of the rationale for this plan. */
  intro: string[];
}

type PlanResult = { plan: Plan } | { skip: string };

interface Design {
  optionSpace: OptionSpace;
  rationale: string[];
}

function nfaOf(ctx: Context, vents: readonly Vent[]): number {
  return vents.reduce((acc, v) => acc + (ctx.nfaById.get(v.id) ?? 0), 0);
}

function buildContext(input: GenerateOptionsInput, baseline: AtticAnalysis): Context {
  const settings: GeneratorSettings = { ...DEFAULT_GENERATOR_SETTINGS, ...input.settings };
  const { project, space } = input;
  const attic = toAtticInput(project, space);
  const rises = attic.sections.map((s) => sectionRiseFt(s));
  const minRiseFt = rises.length > 0 && rises.every((r) => r !== null) ? Math.min(...(rises as number[])) : null;

  let ratios: Ratio[] = [300, 150];
  let ratioNote = "";
  if (project.codeBasis === "strict-150") {
    ratios = [150];
    ratioNote = "This project uses strict 1/150 with no exceptions.";
  } else if (codeBasisRule(project.codeBasis) === "irc-2018" && project.climateZone >= 6 && project.ceilingVaporRetarder !== "class-I" && project.ceilingVaporRetarder !== "class-II") {
    ratios = [150];
    ratioNote = `Under the 2018/2021/2024 text, 1/300 in climate zone ${project.climateZone} also needs a Class I or II ceiling vapor retarder, which is not recorded, so the design is sized at 1/150 (IRC R806.2 exception).`;
  }
  return {
    input,
    settings,
    baseline,
    roof: roofConstraints(space),
    nfaById: new Map(baseline.provided.perVent.map((v) => [v.ventId, v.nfaSqIn])),
    qualifyingIds: new Set(baseline.requirement.qualifyingUpperVentIds),
    fans: space.vents.filter((v) => isPoweredKind(v.kind)),
    // A whole-house fan is neither: it stays as it is, and its outlet is every attic vent.
    passiveExhaust: space.vents.filter((v) => !isMechanicalKind(v.kind) && (v.location === "upper" || v.kind === "gable-louver")),
    intake: space.vents.filter((v) => !isMechanicalKind(v.kind) && v.location === "lower" && v.kind !== "gable-louver"),
    minRiseFt,
    ratios,
    ratioNote,
  };
}

/* ---------- room on the roof ---------- */

function ridgeRoom(ctx: Context, keptRidge: readonly Vent[]): VentRoom | { skip: string } {
  const { ridge, ridgeCount } = ctx.roof;
  if (ridge.lengthFt === null) return { skip: ridge.explanation };
  const usableFt = usableRidgeFt(ridge.lengthFt, ridgeCount);
  const usedFt = keptRidge.reduce((acc, v) => acc + (v.lengthFt ?? usableFt), 0);
  const amount = Math.max(0, usableFt - usedFt);
  const source = ridge.source === "recorded" ? "recorded" : "estimated";
  const kept = keptRidge.length > 0 ? `, less ${fmt(Math.min(usedFt, usableFt))} ft taken by the ridge vent kept` : "";
  return {
    amount,
    explanation: `${fmt(ridge.lengthFt)} ft of ridge (${source}) less 6 in at each end of ${ridgeCount === 1 ? "the ridge" : `${ridgeCount} ridges`} = ${fmt(usableFt)} ft${kept}`,
  };
}

function staticRoom(ctx: Context, keptCount: number): VentRoom | { skip: string } {
  const { ridge } = ctx.roof;
  if (ridge.lengthFt === null) return { skip: ridge.explanation };
  const hipCount = ctx.input.space.sections.filter((s) => (s.roofForm ?? ctx.input.space.roof.form) === "hip").length;
  const capacity = staticVentCapacity({ form: ctx.roof.form, pitchIn12: ctx.roof.pitchIn12, ridgeLengthFt: ridge.lengthFt, hipCount });
  const amount = Math.max(0, capacity.count - keptCount);
  return { amount, explanation: `${capacity.explanation}${keptCount > 0 ? ` Less the ${fmt(keptCount)} kept: ${fmt(amount)}.` : ""}` };
}

function intakeRoom(ctx: Context, item: CatalogItem): VentRoom | { skip: string } {
  const { eave } = ctx.roof;
  if (eave.lengthFt === null) return { skip: eave.explanation };
  if (item.unit === "linear-ft") {
    const strips = ctx.intake.filter((v) => v.kind === "soffit-continuous");
    const usedFt = strips.reduce((acc, v) => acc + (v.lengthFt ?? eave.lengthFt!), 0);
    const amount = Math.max(0, eave.lengthFt - usedFt);
    return { amount, explanation: `${fmt(eave.lengthFt)} ft of eave (${eave.source})${usedFt > 0 ? ` less ${fmt(Math.min(usedFt, eave.lengthFt))} ft of continuous soffit already there` : ""}` };
  }
  const bays = rafterBays(eave.lengthFt, ctx.settings.rafterSpacingIn);
  const used = ctx.intake.filter((v) => v.kind === "soffit-individual").reduce((acc, v) => acc + unitsOf(v), 0);
  const amount = Math.max(0, bays - used);
  return {
    amount,
    explanation: `one per rafter bay: ${fmt(eave.lengthFt)} ft of eave (${eave.source}) × 12 ÷ ${fmt(ctx.settings.rafterSpacingIn)} in = ${fmt(bays)} bays${used > 0 ? ` less ${fmt(used)} vents already there` : ""} (common practice)`,
  };
}

/* ---------- plans per option type ---------- */

function ridgePlans(ctx: Context): PlanResult[] {
  const exhaustItem = pickVentItem(ctx.input.catalog, "ridge", "linear-ft");
  const intakeItem = pickVentItem(ctx.input.catalog, "soffit-continuous", "linear-ft");
  if (!exhaustItem) return [{ skip: "The catalog has no active ridge vent sold by the foot with an NFA per foot." }];
  if (!intakeItem) return [{ skip: "The catalog has no active continuous soffit vent sold by the foot with an NFA per foot." }];
  const room = intakeRoom(ctx, intakeItem);
  if ("skip" in room) return [{ skip: room.skip }];
  const existingRidge = ctx.passiveExhaust.filter((v) => v.kind === "ridge");
  const variants: Vent[][] = existingRidge.length > 0 ? [existingRidge, []] : [[]];
  return variants.map((kept) => {
    const exhaustRoom = ridgeRoom(ctx, kept);
    if ("skip" in exhaustRoom) return { skip: exhaustRoom.skip };
    const intro =
      existingRidge.length === 0
        ? []
        : kept.length > 0
          ? [`The ridge vent already there (${kept.map((v) => v.id).join(", ")}) is kept and counted; new ridge vent is added only where the ridge has room.`]
          : [`The ridge vent already there (${existingRidge.map((v) => v.id).join(", ")}) is replaced by new ridge vent along the whole usable ridge.`];
    return {
      plan: { type: "ridge-and-continuous-soffit", exhaustKind: "ridge", exhaustItem, keptExhaust: kept, exhaustRoom, reusedFanOpenings: [], intakeItem, intakeRoom: room, intro },
    };
  });
}

function staticPlans(ctx: Context): PlanResult[] {
  const exhaustItem = pickVentItem(ctx.input.catalog, "box", "each");
  const intakeItem = pickVentItem(ctx.input.catalog, "soffit-individual", "each");
  if (!exhaustItem) return [{ skip: "The catalog has no active static (box) roof vent with an NFA per unit." }];
  if (!intakeItem) return [{ skip: "The catalog has no active individual soffit vent with an NFA per unit." }];
  const room = intakeRoom(ctx, intakeItem);
  if ("skip" in room) return [{ skip: room.skip }];
  const kept = ctx.passiveExhaust.filter((v) => v.kind === "box");
  const exhaustRoom = staticRoom(ctx, kept.reduce((acc, v) => acc + unitsOf(v), 0));
  if ("skip" in exhaustRoom) return [{ skip: exhaustRoom.skip }];
  const intro = kept.length > 0 ? [`The static vents already there (${kept.map((v) => v.id).join(", ")}) are kept and counted.`] : [];
  return [{ plan: { type: "static-vents-and-individual-soffit", exhaustKind: "box", exhaustItem, keptExhaust: kept, exhaustRoom, reusedFanOpenings: [], intakeItem, intakeRoom: room, intro } }];
}

function removeFanPlans(ctx: Context): PlanResult[] {
  if (ctx.fans.length === 0) return [{ skip: "The survey records no powered fan in this attic." }];
  // Keep the passive exhaust kind that gives the most area already; ties follow PASSIVE_EXHAUST_KINDS order.
  let keptKind: VentKind | null = null;
  let bestSqIn = 0;
  for (const kind of PASSIVE_EXHAUST_KINDS) {
    const sqIn = nfaOf(ctx, ctx.passiveExhaust.filter((v) => v.kind === kind));
    if (sqIn > bestSqIn + NOISE) {
      keptKind = kind;
      bestSqIn = sqIn;
    }
  }
  const exhaustKind: VentKind = keptKind ?? "box";
  const kept = ctx.passiveExhaust.filter((v) => v.kind === exhaustKind);
  const isLinear = exhaustKind === "ridge";
  const exhaustItem = pickVentItem(ctx.input.catalog, exhaustKind, isLinear ? "linear-ft" : "each");
  const reusedFanOpenings = keptKind === null && exhaustItem ? ctx.fans.filter((v) => !isGableMounted(v) && v.kind === "powered-roof") : [];

  let exhaustRoom: VentRoom | { skip: string };
  if (!exhaustItem) exhaustRoom = { amount: 0, explanation: `the catalog has no ${kindLabel(exhaustKind)} to add` };
  else if (isLinear) exhaustRoom = ridgeRoom(ctx, kept);
  else if (exhaustKind === "gable-louver") exhaustRoom = { amount: 0, explanation: "new gable openings are not cut" };
  else exhaustRoom = staticRoom(ctx, kept.reduce((acc, v) => acc + unitsOf(v), 0) + reusedFanOpenings.reduce((acc, v) => acc + unitsOf(v), 0));
  if ("skip" in exhaustRoom) return [{ skip: exhaustRoom.skip }];

  // Intake of the kind already there; continuous when there is none and the catalog has it.
  const hasStrip = ctx.intake.some((v) => v.kind === "soffit-continuous");
  const hasIndividual = ctx.intake.some((v) => v.kind === "soffit-individual");
  const strip = pickVentItem(ctx.input.catalog, "soffit-continuous", "linear-ft");
  const individual = pickVentItem(ctx.input.catalog, "soffit-individual", "each");
  const intakeItem = hasStrip ? strip : hasIndividual ? individual : (strip ?? individual);
  if (!intakeItem) return [{ skip: "The catalog has no active soffit intake vent with an NFA rating." }];
  const room = intakeRoom(ctx, intakeItem);
  if ("skip" in room) return [{ skip: room.skip }];

  const fanWords = ventListPhrase(ctx.fans).replace(/^the /, "");
  const intro = [
    `The ${fanWords} ${ctx.fans.length === 1 ? "is" : "are"} removed: a powered fan can pull conditioned air out of the house and backdraft natural-draft gas appliances, and the EPA (ENERGY STAR) and the DOE weatherization specification advise passive ventilation instead.`,
    keptKind !== null
      ? `The passive exhaust already there is kept as the one exhaust type: ${kindLabel(exhaustKind)} (${kept.map((v) => v.id).join(", ")}, ${fmt(bestSqIn)} sq in).`
      : reusedFanOpenings.length > 0
        ? `There is no passive exhaust; the roof fan opening${reusedFanOpenings.length === 1 ? "" : "s"} (${reusedFanOpenings.map((v) => v.id).join(", ")}) take${reusedFanOpenings.length === 1 ? "s" : ""} a static vent instead of a patch, and more static vents are added as needed.`
        : "There is no passive exhaust; static vents are added under the ridge.",
  ];
  return [{ plan: { type: "remove-fan-passive", exhaustKind, exhaustItem, keptExhaust: kept, exhaustRoom, reusedFanOpenings, intakeItem, intakeRoom: room, intro } }];
}

/* ---------- sizing one plan at one ratio ---------- */

class IdMaker {
  private n = 0;
  constructor(private readonly prefix: string) {}
  next(): string {
    this.n += 1;
    return `${this.prefix}-${this.n}`;
  }
}

function upperShareMin(ctx: Context, ratio: Ratio): number {
  return ratio === 300 && codeBasisRule(ctx.input.project.codeBasis) === "irc-2009" ? 0.5 : 0.4;
}

/** The most passive exhaust the 1/300 route allows, sq in: 50 % (2009: 80 %) of the exact required area under the literal reading; unlimited otherwise. */
function exhaustCapSqIn(ctx: Context, ratio: Ratio, areaSqFt: number): number {
  if (ratio !== 300 || (ctx.input.project.upperShareBase ?? "required") !== "required") return Infinity;
  return ((areaSqFt * 144) / 300) * upperShareMax(ctx);
}

function upperShareMax(ctx: Context): number {
  return codeBasisRule(ctx.input.project.codeBasis) === "irc-2009" ? 0.8 : 0.5;
}

/** The smallest bought quantity of `item` giving at least `minSqIn` and at most `maxSqIn`, or null. */
function sizeWithinCap(item: CatalogItem, minSqIn: number, maxSqIn: number, room: VentRoom): Extract<SizeResult, { fits: true }> | null {
  const atMin = sizeVentItem(item, minSqIn, room);
  if (atMin.fits && atMin.nfaSqIn <= maxSqIn + 1e-9) return atMin;
  if (item.unit !== "linear-ft" || item.nfaSqInPerFt === null) return null;
  const perFt = item.nfaSqInPerFt;
  const feet = Math.ceil(minSqIn / perFt - 1e-9);
  if (feet * perFt > maxSqIn + 1e-9 || feet > room.amount + 1e-9) return null;
  return {
    fits: true,
    quantity: feet,
    nfaSqIn: feet * perFt,
    explanation: `${item.name} gives ${fmt(perFt)} sq in per ft: ${fmt(minSqIn)} ÷ ${fmt(perFt)} → ${fmt(feet)} ft, the last piece cut so the exhaust stays within the 50 % limit. ${fmt(feet)} ft × ${fmt(perFt)} = ${fmt(feet * perFt)} sq in.`,
  };
}

function staticDropFt(ctx: Context): number {
  return ctx.minRiseFt !== null ? Math.min(STATIC_VENT_DROP_FT, ctx.minRiseFt / 2) : STATIC_VENT_DROP_FT;
}

function designAt(ctx: Context, plan: Plan, ratio: Ratio): Design | { failure: string } {
  const { space, catalog, spaceId } = ctx.input;
  const areaSqFt = ctx.baseline.floorAreaSqFt;
  const requiredSqIn = ceilWhole((areaSqFt * 144) / ratio);
  const shareMin = upperShareMin(ctx, ratio);
  const rationale: string[] = [];
  const ids = new IdMaker(plan.type === "ridge-and-continuous-soffit" ? "ridge" : plan.type === "static-vents-and-individual-soffit" ? "static" : "nofan");
  const added: AddedItem[] = [];
  const ventActions: Record<string, VentAction> = {};

  rationale.push(clip(`Required at 1/${ratio}: ${ratioArithmetic(areaSqFt, ratio)}.`));
  if (ratio === 300) {
    rationale.push(
      codeBasisRule(ctx.input.project.codeBasis) === "irc-2009"
        ? "Aiming for 1/300 by vent placement (IRC 2009 R806.2): 50–80 % of the area in upper vents at least 3 ft above the eave vents, the rest at the eaves; here exhaust is held to 50 % so intake is never smaller."
        : "Aiming for 1/300 by vent placement (IRC R806.2 exception): 40–50 % of the area in exhaust no more than 3 ft below the ridge, measured vertically, the balance low at the eaves.",
    );
  }

  // Exhaust: kept vents of the chosen kind, then what to add.
  const keptAllSqIn = nfaOf(ctx, plan.keptExhaust);
  const keptQualifyingSqIn = ratio === 300 ? nfaOf(ctx, plan.keptExhaust.filter((v) => ctx.qualifyingIds.has(v.id))) : keptAllSqIn;
  const reusedUnits = plan.reusedFanOpenings.reduce((acc, v) => acc + unitsOf(v), 0);
  const reusedNfaEach = plan.exhaustItem?.unit === "each" ? (plan.exhaustItem.nfaSqInPerUnit ?? 0) : 0;
  const reusedSqIn = reusedUnits * reusedNfaEach;
  const reusedQualifyingSqIn =
    ratio === 300 && codeBasisRule(ctx.input.project.codeBasis) !== "irc-2009"
      ? plan.reusedFanOpenings.filter((v) => v.dropBelowRidgeFt !== undefined && v.dropBelowRidgeFt <= 3).reduce((acc, v) => acc + unitsOf(v) * reusedNfaEach, 0)
      : ratio === 150
        ? reusedSqIn
        : 0;

  const aimSqIn = ceilWhole(requiredSqIn * 0.5);
  const minSqIn = ceilWhole(requiredSqIn * shareMin);
  const haveSqIn = keptQualifyingSqIn + reusedQualifyingSqIn;
  if (keptAllSqIn > 0) rationale.push(`Kept ${kindLabel(plan.exhaustKind)} gives ${fmt(keptAllSqIn)} sq in${ratio === 300 && keptQualifyingSqIn < keptAllSqIn ? `, of which ${fmt(keptQualifyingSqIn)} sq in is known to be within 3 ft of the ridge` : ""}.`);
  if (reusedSqIn > 0) rationale.push(`Static vents in the old fan opening${reusedUnits === 1 ? "" : "s"}: ${fmt(reusedUnits)} × ${fmt(reusedNfaEach)} = ${fmt(reusedSqIn)} sq in.`);

  let newExhaustQty = 0;
  let newExhaustSqIn = 0;
  const exhaustNeed = Math.max(0, aimSqIn - haveSqIn);
  if (exhaustNeed > 0) {
    if (!plan.exhaustItem) return { failure: `At 1/${ratio} the exhaust needs ${fmt(exhaustNeed)} sq in more, and the catalog has no ${kindLabel(plan.exhaustKind)} to add.` };
    let sized = sizeVentItem(plan.exhaustItem, exhaustNeed, plan.exhaustRoom);
    let aimWords = `Exhaust aim: half of ${fmt(requiredSqIn)} = ${fmt(aimSqIn)} sq in${haveSqIn > 0 ? `, less ${fmt(haveSqIn)} already counted = ${fmt(exhaustNeed)} sq in to add` : ""}.`;
    if (!sized.fits) {
      const minNeed = Math.max(0, minSqIn - haveSqIn);
      const fallback = sizeVentItem(plan.exhaustItem, minNeed, plan.exhaustRoom);
      if (!fallback.fits) {
        return { failure: `At 1/${ratio} (${fmt(requiredSqIn)} sq in required) the exhaust needs at least ${fmt(shareMin * 100)} % = ${fmt(minSqIn)} sq in: ${fallback.reason}` };
      }
      aimWords = `Exhaust: half of ${fmt(requiredSqIn)} sq in does not fit (${sized.reason}) so the exhaust is held to the minimum share, ${fmt(shareMin * 100)} % = ${fmt(minSqIn)} sq in${haveSqIn > 0 ? `, less ${fmt(haveSqIn)} already counted` : ""}.`;
      sized = fallback;
    }
    // IRC 2012+ R806.2 condition 2, literal reading: upper vents at most 50 % of the REQUIRED area
    // [SOURCES.md S4]. Whole pieces can overshoot it; then aim at the minimum share, then cut the
    // last piece of a linear vent to whole feet; if even that overshoots, 1/300 is not offered.
    const capSqIn = exhaustCapSqIn(ctx, ratio, areaSqFt) - keptAllSqIn - reusedSqIn;
    if (sized.nfaSqIn > capSqIn + 1e-9) {
      const within = sizeWithinCap(plan.exhaustItem, Math.max(0, minSqIn - haveSqIn), capSqIn, plan.exhaustRoom);
      if (!within) {
        return { failure: `At 1/${ratio} the exhaust must stay within ${fmt(shareMin * 100)}–${fmt(upperShareMax(ctx) * 100)} % of the ${fmt((areaSqFt * 144) / ratio)} sq in required (IRC R806.2), and ${plan.exhaustItem.name} can't be bought in a quantity that lands there.` };
      }
      aimWords = `${aimWords} Held to at most ${fmt(upperShareMax(ctx) * 100)} % of the required area (IRC R806.2: "not more than ${upperShareMax(ctx) === 0.8 ? "80" : "50"} percent of the required ventilating area").`;
      sized = within;
    }
    rationale.push(clip(aimWords));
    if (sized.quantity > 0) {
      rationale.push(clip(sized.explanation));
      newExhaustQty = sized.quantity;
      newExhaustSqIn = sized.nfaSqIn;
    }
  } else if (haveSqIn > 0) {
    rationale.push(`Exhaust aim: half of ${fmt(requiredSqIn)} = ${fmt(aimSqIn)} sq in; the ${fmt(haveSqIn)} sq in already counted is enough, so no exhaust is added.`);
  }

  const exhaustAllSqIn = keptAllSqIn + reusedSqIn + newExhaustSqIn;
  const exhaustCountedSqIn = haveSqIn + newExhaustSqIn;

  // Intake: at least the exhaust and at least the balance of the requirement.
  const keptIntake = ratio === 300 ? ctx.intake.filter((v) => EAVE_KINDS.has(v.kind)) : ctx.intake;
  const keptIntakeSqIn = nfaOf(ctx, keptIntake);
  const balanceSqIn = Math.max(0, requiredSqIn - exhaustCountedSqIn);
  const intakeNeedSqIn = ceilWhole(Math.max(exhaustAllSqIn, balanceSqIn));
  const intakeToAdd = Math.max(0, intakeNeedSqIn - keptIntakeSqIn);
  rationale.push(
    clip(
      `Intake must be at least the exhaust (${fmt(exhaustAllSqIn)} sq in) and at least the balance (${fmt(requiredSqIn)} − ${fmt(exhaustCountedSqIn)} = ${balanceSqIn > 0 ? `${fmt(balanceSqIn)} sq in` : "nothing left"}): ${fmt(intakeNeedSqIn)} sq in` +
        (keptIntakeSqIn > 0 ? `; the eave vents kept give ${fmt(keptIntakeSqIn)} sq in, so ${intakeToAdd > 0 ? `${fmt(intakeToAdd)} sq in is added` : "no intake is added"}.` : "."),
    ),
  );
  let newIntakeQty = 0;
  if (intakeToAdd > 0) {
    if (!plan.intakeItem) return { failure: `At 1/${ratio} the intake needs ${fmt(intakeToAdd)} sq in more and the catalog has no soffit vent to add.` };
    const sized = sizeVentItem(plan.intakeItem, intakeToAdd, plan.intakeRoom);
    if (!sized.fits) return { failure: `At 1/${ratio} there is not enough eave for the intake: ${sized.reason}` };
    rationale.push(clip(sized.explanation));
    newIntakeQty = sized.quantity;
  }

  // Vent actions: everything that is not the one exhaust type goes, with its opening closed.
  const keptIds = new Set(plan.keptExhaust.map((v) => v.id));
  const reusedIds = new Set(plan.reusedFanOpenings.map((v) => v.id));
  const removed: Vent[] = [];
  for (const vent of space.vents) {
    const isExhaustOpening = isPoweredKind(vent.kind) || ctx.passiveExhaust.includes(vent);
    if (!isExhaustOpening || keptIds.has(vent.id)) continue;
    if (reusedIds.has(vent.id)) {
      ventActions[vent.id] = "replace";
      continue;
    }
    ventActions[vent.id] = "remove";
    removed.push(vent);
  }

  // Added vents.
  for (const fan of plan.reusedFanOpenings) {
    const item = plan.exhaustItem!;
    added.push({ id: ids.next(), catalogItemId: item.id, quantity: unitsOf(fan), location: "upper", replacesVentId: fan.id, note: `In the opening of ${ventDisplayName(fan)}.` });
  }
  if (newExhaustQty > 0 && plan.exhaustItem) {
    const isStatic = plan.exhaustItem.unit === "each" && plan.exhaustKind !== "ridge";
    added.push({
      id: ids.next(),
      catalogItemId: plan.exhaustItem.id,
      quantity: newExhaustQty,
      location: "upper",
      ...(isStatic && !["off-ridge", "cupola"].includes(plan.exhaustKind) ? { dropBelowRidgeFt: staticDropFt(ctx), note: `Centred ${fmt(staticDropFt(ctx))} ft below the ridge, measured vertically.` } : {}),
    });
  }
  if (newIntakeQty > 0 && plan.intakeItem) {
    added.push({ id: ids.next(), catalogItemId: plan.intakeItem.id, quantity: newIntakeQty, location: "lower" });
  }

  // Closing the openings left by removed vents.
  // A ridge vent swapped for new ridge vent reuses its slot: nothing to patch.
  const patchUnits = removed.filter((v) => v.kind !== plan.exhaustKind).filter((v) => ROOF_OPENING_KINDS.has(v.kind) || (v.kind === "solar-powered" && !isGableMounted(v))).reduce((acc, v) => acc + unitsOf(v), 0);
  const sealUnits = removed.filter((v) => v.kind === "gable-louver" || (isPoweredKind(v.kind) && isGableMounted(v))).reduce((acc, v) => acc + unitsOf(v), 0);
  const wiredFanUnits = [...removed, ...plan.reusedFanOpenings].filter((v) => v.kind === "powered-roof" || v.kind === "powered-gable").reduce((acc, v) => acc + unitsOf(v), 0);
  const accessory = (kind: CatalogItem["kind"], quantity: number, what: string, note: string) => {
    if (quantity <= 0) return;
    const item = pickWorkItem(catalog, kind, ["each"]);
    if (!item) {
      rationale.push(`${what}: ${fmt(quantity)}; the catalog has no item to ${ACCESSORY_LABELS[kind as keyof typeof ACCESSORY_LABELS] ?? "do this"}, so price that work by hand.`);
      return;
    }
    added.push({ id: ids.next(), catalogItemId: item.id, quantity, note });
    rationale.push(`${what}: ${fmt(quantity)} × ${item.name}.`);
  };
  if (removed.length > 0) {
    const words = removed.map((v) => `${ventDisplayName(v).replace(/^the /, "")}${unitsOf(v) > 1 ? ` (${fmt(unitsOf(v))})` : ""}`).join(", ");
    rationale.push(
      clip(
        `Removed so that ${kindLabel(plan.exhaustKind)} is the only exhaust: ${words}. Different exhaust vents feed each other and a fan or gable louver beside other high vents short-circuits them (common practice among roofers and home inspectors).`,
      ),
    );
  }
  accessory("patch-vent-opening", patchUnits, "Roof openings to patch", "Openings left by removed roof vents or fans.");
  accessory("seal-gable-opening", sealUnits, "Gable openings to seal from inside", "Gable louvers or gable fan openings closed off.");
  accessory("electrical-disconnect", wiredFanUnits, "Fan circuits to disconnect", "A licensed electrician disconnects and makes safe each fan circuit.");

  // Deck cut for new ridge vent.
  const newRidgeFt = plan.exhaustKind === "ridge" && plan.exhaustItem?.unit === "linear-ft" ? newExhaustQty : 0;
  if (newRidgeFt > 0) {
    const cut = pickWorkItem(catalog, "deck-cut", ["linear-ft"]);
    if (cut) {
      added.push({ id: ids.next(), catalogItemId: cut.id, quantity: newRidgeFt, note: "Slot cut under the new ridge vent." });
      rationale.push(`Ridge slot to cut: ${fmt(newRidgeFt)} ft (${cut.name}).`);
    }
  }

  // Soffits blocked or without baffles: pull insulation back and baffle every bay (IRC R806.3; NREL SWS, S9).
  const site = space.site;
  const needsBaffles = site.soffitsBlocked === true || site.bafflesPresent === false;
  let clearsBlockedSoffits = false;
  if (needsBaffles) {
    clearsBlockedSoffits = true;
    const eaveFt = ctx.roof.eave.lengthFt;
    rationale.push(
      site.soffitsBlocked === true
        ? "Insulation blocks the soffits: it is pulled back and a baffle goes in every rafter bay, keeping at least 1 in of air space to the sheathing (IRC R806.3) and reaching above the insulation (NREL SWS)."
        : "No baffles are recorded at the eaves: a baffle goes in every rafter bay so insulation can't slide over the intake (IRC R806.3; NREL SWS).",
    );
    if (eaveFt === null) {
      rationale.push("The eave length is unknown, so count the rafter bays on site for the baffles.");
    } else {
      const bays = rafterBays(eaveFt, ctx.settings.rafterSpacingIn);
      const baffle = pickWorkItem(catalog, "baffle", ["each"]);
      if (baffle && bays > 0) {
        added.push({ id: ids.next(), catalogItemId: baffle.id, quantity: bays, location: "lower" });
        rationale.push(`Baffles: ${fmt(eaveFt)} ft of eave × 12 ÷ ${fmt(ctx.settings.rafterSpacingIn)} in spacing = ${fmt(bays)} bays → ${fmt(bays)} × ${baffle.name}.`);
      } else if (!baffle) {
        rationale.push("The catalog has no baffle item; price the baffles by hand.");
      }
      if (site.soffitsBlocked === true) {
        const clearing = pickWorkItem(catalog, "insulation-clearing", ["linear-ft", "each"]);
        if (clearing) {
          const quantity = clearing.unit === "linear-ft" ? eaveFt : bays;
          if (quantity > 0) {
            added.push({ id: ids.next(), catalogItemId: clearing.id, quantity });
            rationale.push(`Insulation pulled back: ${fmt(quantity)} ${clearing.unit === "linear-ft" ? "ft of eave" : "bays"} (${clearing.name}).`);
          }
        }
      }
    }
  }

  // A bath fan dumping shower steam into the attic wets the roof deck whatever the vents do.
  let ductsBathFan = false;
  if (site.bathFanIntoAttic === true) {
    ductsBathFan = true;
    const reason = "A bath fan blows damp air into the attic: it is ducted to a roof or wall cap so the moisture leaves the house (IRC M1501.1: exhaust air goes outdoors, never into an attic; section from memory, check the edition in force).";
    const duct = pickWorkItem(catalog, "bath-fan-duct", ["each"]);
    if (duct) {
      added.push({ id: ids.next(), catalogItemId: duct.id, quantity: 1, note: "Duct the bath fan to a roof or wall cap." });
      rationale.push(`${reason} 1 × ${duct.name}.`);
    } else {
      rationale.push(`${reason} The catalog has no item to duct a bath fan outside; price that work by hand.`);
    }
  }

  const siteFixes: OptionSpace["siteFixes"] = {};
  if (clearsBlockedSoffits) siteFixes.clearsBlockedSoffits = true;
  if (ductsBathFan) siteFixes.ductsBathFan = true;
  return { optionSpace: { spaceId, ventActions, added, siteFixes }, rationale };
}

/* ---------- checks, labour, price ---------- */

/** Problems that make a proposal unacceptable whatever the code says (common practice, §5). */
function designProblems(applied: SpaceSurvey, analysis: AtticAnalysis): string[] {
  const problems: string[] = [];
  if (!analysis.compliant) problems.push(analysis.summary);
  const upperKinds = new Set(analysis.provided.perVent.filter((v) => !v.isPowered && v.location === "upper" && v.nfaSqIn > 0).map((v) => v.kind));
  if (upperKinds.size > 1) problems.push(`More than one exhaust type: ${[...upperKinds].join(", ")}.`);
  if (applied.vents.some((v) => isPoweredKind(v.kind))) problems.push("A powered fan remains.");
  if (applied.vents.some((v) => v.kind === "gable-louver") && upperKinds.has("ridge")) problems.push("A gable louver remains beside a ridge vent.");
  if (analysis.provided.intakeSqIn + NOISE < analysis.provided.exhaustSqIn) problems.push("Intake is smaller than exhaust.");
  return problems;
}

function laborRateCents(ctx: Context): { rateCents: number; source: string } | null {
  if (ctx.settings.laborRateCentsPerHour !== null) return { rateCents: ctx.settings.laborRateCentsPerHour, source: "the company's labour rate" };
  const item = pickWorkItem(ctx.input.catalog, "labor", ["hour"]);
  return item ? { rateCents: item.sellPriceCents, source: `the catalog's "${item.name}"` } : null;
}

function laborLine(ctx: Context, added: readonly AddedItem[], rationale: string[]): DesignOptionInput["laborLines"] {
  const byId = new Map(ctx.input.catalog.map((item) => [item.id, item]));
  const minutes = added.reduce((acc, a) => acc + (byId.get(a.catalogItemId)?.laborMinutesPerUnit ?? 0) * a.quantity, 0);
  if (minutes <= 0) return [];
  const hours = Math.ceil(minutes / 15 - NOISE) / 4;
  const rate = laborRateCents(ctx);
  if (!rate) {
    rationale.push(`Labour from the catalog's minutes: ${fmt(minutes)} min = ${fmt(hours)} h (rounded up to the quarter hour); no labour rate is set, so price it by hand.`);
    return [];
  }
  rationale.push(`Labour from the catalog's minutes per unit: ${fmt(minutes)} min → ${fmt(hours)} h, rounded up to the quarter hour (common practice), at ${source(rate)}.`);
  return [{ id: "labor-1", description: "Installation labour", hours, rateCents: rate.rateCents, hoursBasis: "catalog" }];
}
const source = (rate: { rateCents: number; source: string }) => `${formatCents(rate.rateCents)} per hour, ${rate.source}`;

function cautionsFor(optionSpace: OptionSpace, space: SpaceSurvey): string {
  const removed = space.vents.filter((v) => optionSpace.ventActions[v.id] === "remove" || optionSpace.ventActions[v.id] === "replace");
  const parts = [ROOF_SAFETY_CAUTION, ATTIC_SAFETY_CAUTION];
  if (removed.some((v) => isPoweredKind(v.kind))) parts.push(FAN_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION);
  return parts.join("\n\n");
}

/** True when a design changes nothing: nothing added, every vent kept, no site fix. */
function isNoWork(optionSpace: OptionSpace): boolean {
  return optionSpace.added.length === 0 && Object.values(optionSpace.ventActions).every((a) => a === "keep") && Object.keys(optionSpace.siteFixes).length === 0;
}

function signature(optionSpace: OptionSpace): string {
  const actions = Object.entries(optionSpace.ventActions).sort(([a], [b]) => (a < b ? -1 : 1));
  const added = optionSpace.added.map((a) => `${a.catalogItemId}:${a.quantity}:${a.replacesVentId ?? ""}`).sort();
  return JSON.stringify([actions, added, optionSpace.siteFixes]);
}

function propose(ctx: Context, plan: Plan): GeneratedOption | { failure: string; final?: true } {
  const { project, space, catalog } = ctx.input;
  const failures: string[] = [];
  for (const ratio of ctx.ratios) {
    const design = designAt(ctx, plan, ratio);
    if ("failure" in design) {
      failures.push(design.failure);
      continue;
    }
    const applied = applyOption(space, design.optionSpace, catalog);
    const analysis = analyzeAttic(toAtticInput(project, applied));
    const problems = designProblems(applied, analysis);
    if (problems.length === 0 && analysis.requirement.ratio === ratio && isNoWork(design.optionSpace)) {
      // Offering "$0, nothing to do" as something to sign would be a proposal with no work in it.
      // Nor is tearing out a working vent to put the same one back: no later plan of this type is tried.
      return { failure: `The attic already has this design and meets the code minimum at 1/${ratio}: there is no work to offer.`, final: true };
    }
    if (problems.length > 0 || analysis.requirement.ratio !== ratio) {
      const why =
        analysis.requirement.ratio !== ratio
          ? `the core applies 1/${analysis.requirement.ratio}: ${analysis.requirement.exception.conditions.filter((c) => c.status === "not-met").map((c) => c.reason).join(" ")}`
          : problems.join(" ");
      failures.push(`At 1/${ratio} the checked design fell short: ${why}`);
      continue;
    }
    const rationale = [
      `Attic floor: ${fmt(analysis.floorAreaSqFt)} sq ft (${ctx.baseline.sections.map((s) => s.areaExplanation).join("; ")}).`,
      ...(ctx.ratioNote ? [ctx.ratioNote] : []),
      ...(ratio === 150 && ctx.ratios.includes(300) ? [clip(`1/300 was tried first and could not be met: ${failures.join(" ")} So the design is sized at 1/150.`)] : []),
      ...design.rationale.slice(0, 1),
      ...plan.intro,
      ...design.rationale.slice(1),
    ];
    const laborLines = laborLine(ctx, design.optionSpace.added, rationale);
    rationale.push(
      clip(
        `Checked by the core: ${fmt(analysis.provided.totalSqIn)} sq in provided (intake ${fmt(analysis.provided.intakeSqIn)}, exhaust ${fmt(analysis.provided.exhaustSqIn)}) against ${fmt(analysis.requirement.totalSqIn)} sq in required at 1/${analysis.requirement.ratio}: ${analysis.compliant ? "meets the code minimum" : "short"}; intake ≥ exhaust; one exhaust type (${kindLabel(plan.exhaustKind)}).`,
      ),
    );
    const option: DesignOptionInput = {
      name: OPTION_TYPE_NAMES[plan.type],
      notes: cautionsFor(design.optionSpace, space),
      spaces: [design.optionSpace],
      laborLines,
      discount: { kind: "none" },
      isKept: false,
      origin: "generated",
      rationale: rationale.slice(0, 50).map(clip),
    };
    return { type: plan.type, option, applied, analysis, price: priceOption(option, catalog, ctx.settings.pricing) };
  }
  return { failure: failures.join(" ") };
}

/**
 * @example
 * // A 1,000 sq ft gable ranch in zone 4 (IRC 2018), 40 ft ridge, two old box vents, no fan:
 * const { options, skipped } = generateOptions({ project, spaceId, space: ranch, catalog: demoCatalog() });
 * options.map((o) => o.type) // ["ridge-and-continuous-soffit", "static-vents-and-individual-soffit"]
 * options[0].analysis.requirement.ratio // 300  (1,000 sq ft ÷ 300 = 480 sq in)
 * skipped // [{ type: "remove-fan-passive", reason: "The survey records no powered fan in this attic." }]
 */
export function generateOptions(input: GenerateOptionsInput): GenerateOptionsResult {
  const tried = tryAnalyzeAttic(toAtticInput(input.project, input.space));
  if (!tried.ok) {
    const reason = `The survey can't be analysed yet: ${tried.issues.map((i) => i.message).join("; ")}`;
    return { baseline: null, options: [], skipped: OPTION_TYPES.map((type) => ({ type, reason: clip(reason) })) };
  }
  if (tried.analysis.assembly === "unvented") {
    // IRC R806.5: a sealed attic gets no vents — adding them is the harm this check exists to prevent.
    const reason = "This attic is an unvented (sealed) roof assembly under IRC R806.5: Eavesight never proposes vents into it. See its findings for the R806.5 conditions to check instead.";
    return { baseline: tried.analysis, options: [], skipped: OPTION_TYPES.map((type) => ({ type, reason })) };
  }
  const ctx = buildContext(input, tried.analysis);
  const options: GeneratedOption[] = [];
  const skipped: SkippedOption[] = [];
  const seen = new Map<string, OptionType>();
  const plansByType: Record<OptionType, () => PlanResult[]> = {
    "ridge-and-continuous-soffit": () => ridgePlans(ctx),
    "static-vents-and-individual-soffit": () => staticPlans(ctx),
    "remove-fan-passive": () => removeFanPlans(ctx),
  };
  for (const type of OPTION_TYPES) {
    const reasons: string[] = [];
    let proposal: GeneratedOption | null = null;
    for (const result of plansByType[type]()) {
      if ("skip" in result) {
        reasons.push(result.skip);
        continue;
      }
      const outcome = propose(ctx, result.plan);
      if ("failure" in outcome) {
        if (outcome.final) {
          reasons.splice(0, reasons.length, outcome.failure);
          break;
        }
        reasons.push(outcome.failure);
      } else {
        proposal = outcome;
        break;
      }
    }
    if (!proposal) {
      skipped.push({ type, reason: clip(reasons.join(" ")) });
      continue;
    }
    const key = signature(proposal.option.spaces[0]!);
    const same = seen.get(key);
    if (same) {
      skipped.push({ type, reason: `It would be the same work as "${OPTION_TYPE_NAMES[same]}".` });
      continue;
    }
    seen.set(key, type);
    options.push(proposal);
  }
  return { baseline: ctx.baseline, options, skipped };
}
