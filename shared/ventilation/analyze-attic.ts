/**
 * analyzeAttic: one attic space in, one explained analysis out. Pure: no I/O, no clock.
 */
import { fanControlFindings } from "../diagnostics/fan-controls";
import { diagnoseFan } from "../diagnostics/fan-diagnostics";
import { formatNumber, roundTo, SQ_IN_PER_SQ_FT } from "../units/format";
import { sectionGeometry } from "./attic-volume";
import { meetsRequiredArea, providedNfa, type ProvidedNfa } from "./balance";
import { fanIntakeNeededSqIn, recommendFanCfm, STEEP_PITCH_IN_12 } from "./fan-sizing";
import { describeSectionArea, sectionAreaSqFt } from "./floor-area";
import { sortFindings, unventedFindings, ventilationFindings, type Finding } from "./findings";
import { requiredNfa, unventedRequirement, type Requirement } from "./requirement";
import { checkRafterBays, type RafterBayCheck } from "./rafter-bays";
import { aboveMinimum, type Recommendation } from "./recommendations";
import { checkUnventedAssembly, type UnventedCheck } from "./unvented";
import { ParsedAtticSchema, type AtticInput, type ParsedAttic } from "./schema";
import { isPoweredKind } from "./vent-kinds";
import { ventNfa } from "./vent-nfa";
import { riseLookup, ventPosition } from "./vent-position";

export interface SectionAnalysis {
  index: number;
  id?: string;
  areaSqFt: number;
  /** e.g. "40 ft × 30 ft = 1,200 sq ft". */
  areaExplanation: string;
  riseFt: number | null;
  volumeCuFt: number | null;
  /** How the volume was found, or why it could not be. */
  volumeExplanation: string;
}

export interface FanAnalysis {
  /** Installed powered-fan airflow, cfm. */
  installedCfm: number;
  recommendedCfm: number;
  areaMethodCfm: number;
  airChangeMethodCfm: number | null;
  isDarkOrSteep: boolean;
  /** Intake NFA the installed fans need (1 sq ft per 300 cfm), sq in. */
  intakeNeededSqIn: number;
  /** Intake NFA a fan of the recommended size would need, sq in. */
  intakeNeededForRecommendedSqIn: number;
  /** Passive intake NFA provided, sq in. */
  intakeProvidedSqIn: number;
  reasons: string[];
}

export interface AtticAnalysis {
  /** Plan-view attic floor area, sq ft. */
  floorAreaSqFt: number;
  sections: SectionAnalysis[];
  /** Attic air volume, cu ft, or null when a section lacks roof form, pitch or span. */
  volumeCuFt: number | null;
  requirement: Requirement;
  provided: ProvidedNfa;
  /** Powered-fan sizing, or null when the attic has no powered fan. */
  fan: FanAnalysis | null;
  /**
   * Meets the code minimum: passive NFA provided ≥ the exact required NFA (IRC R806.2; never rounded) and the eave
   * vents are not blocked by insulation (IRC R806.3).
   */
  compliant: boolean;
  /** "unvented" for a sealed attic (IRC R806.5): no vent area is required or recommended. */
  assembly: "vented" | "unvented";
  /** The R806.5 conditions of an unvented attic, or null for a vented one. */
  unvented: UnventedCheck | null;
  /** Per-bay check of a space of enclosed rafter bays, or null. */
  rafterBays: RafterBayCheck | null;
  /** Above the minimum: common-practice recommendations with their sources, clearly not code. */
  recommendations: Recommendation[];
  /** One plain sentence a homeowner can read. */
  summary: string;
  /** Critical first, then warnings, then notes. */
  findings: Finding[];
}

/**
 * Analyses one attic space. The input is validated with AtticInputSchema first; invalid input
 * throws the ZodError (use `tryAnalyzeAttic` for a result instead, or `analyzeParsedAttic` when the
 * input was parsed already).
 *
 * @example
 * // SOURCES.md §8 E1: 1,500 sq ft at 1/150 → 10 sq ft = 1,440 sq in
 * const a = analyzeAttic({ codeBasis: "strict-150", climateZone: 4, ceilingVaporRetarder: "none", roofColor: "medium",
 *   sections: [{ kind: "area", areaSqFt: 1500 }], vents: [] });
 * a.requirement.totalSqIn // 1440
 * a.requirement.reasons.at(-2) // "Required: 1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in."
 */
export function analyzeAttic(input: AtticInput): AtticAnalysis {
  return analyzeParsedAttic(ParsedAtticSchema.parse(input));
}

/**
 * The core itself, for input already parsed with `ParsedAtticSchema` at the boundary: it trusts the
 * input and does not validate it again. Same answer as `analyzeAttic`.
 *
 * @example
 * const parsed = ParsedAtticSchema.safeParse(surveyInput);
 * if (parsed.success) analyzeParsedAttic(parsed.data).compliant // the verdict, never rounded
 */
export function analyzeParsedAttic(attic: ParsedAttic): AtticAnalysis {
  const site = attic.site ?? {};

  const sections: SectionAnalysis[] = attic.sections.map(analyzeSection);
  // Rounded to 1e-6 sq ft only to drop float noise from outlines; tiny sections must not vanish.
  const floorAreaSqFt = roundTo(sections.reduce((acc, s) => acc + s.areaSqFt, 0), 6);
  const unknownVolume = sections.find((s) => s.volumeCuFt === null);
  const volumeCuFt = unknownVolume ? null : roundTo(sections.reduce((acc, s) => acc + (s.volumeCuFt ?? 0), 0), 2);

  const riseOf = riseLookup(attic.sections);
  const vents = attic.vents.map((vent) => ({
    vent,
    nfa: ventNfa(vent),
    position: ventPosition(vent, riseOf(vent.sectionId)),
    label: vent.label,
  }));
  const provided = providedNfa(vents.map((v) => v.nfa));
  const isUnvented = attic.assembly === "unvented" && attic.unvented !== undefined;
  const unvented = isUnvented ? checkUnventedAssembly(attic.unvented!, attic.climateZone, attic.moistureRegime, attic.ceilingVaporRetarder) : null;
  const requirement = isUnvented ? unventedRequirement(attic.codeBasis) : requiredNfa({
    floorAreaSqFt,
    codeBasis: attic.codeBasis,
    climateZone: attic.climateZone,
    ceilingVaporRetarder: attic.ceilingVaporRetarder,
    upperShareBase: attic.upperShareBase,
    vents,
  });

  let fan: FanAnalysis | null = null;
  if (provided.poweredCfm > 0 && !isUnvented) {
    const isSteep = attic.sections.some((s) => s.pitchIn12 !== undefined && s.pitchIn12 >= STEEP_PITCH_IN_12);
    const sizing = recommendFanCfm({
      floorAreaSqFt,
      volumeCuFt,
      isDark: attic.roofColor === "dark",
      isSteep,
      volumeUnknownReason: unknownVolume
        ? `for section ${unknownVolume.index + 1}${unknownVolume.id ? ` (${unknownVolume.id})` : ""} ${unknownVolume.volumeExplanation}`
        : undefined,
    });
    const intakeNeededSqIn = fanIntakeNeededSqIn(provided.poweredCfm);
    fan = {
      installedCfm: provided.poweredCfm,
      recommendedCfm: sizing.recommendedCfm,
      areaMethodCfm: sizing.areaMethodCfm,
      airChangeMethodCfm: sizing.airChangeMethodCfm,
      isDarkOrSteep: sizing.isDarkOrSteep,
      intakeNeededSqIn,
      intakeNeededForRecommendedSqIn: fanIntakeNeededSqIn(sizing.recommendedCfm),
      intakeProvidedSqIn: provided.intakeSqIn,
      reasons: [
        ...sizing.reasons,
        `Intake the installed ${formatNumber(provided.poweredCfm)} cfm needs (HVI: 1 sq ft per 300 cfm): ${formatNumber(provided.poweredCfm)} ÷ 300 = ${formatNumber(provided.poweredCfm / 300, { maxFractionDigits: 3 })} sq ft = ${formatNumber(intakeNeededSqIn)} sq in; the intake vents give ${formatNumber(provided.intakeSqIn)} sq in.`,
      ],
    };
  }

  const rafterBays =
    attic.enclosedRafterBays && !isUnvented
      ? checkRafterBays(attic.enclosedRafterBays, floorAreaSqFt, requirement.ratio, vents.map((v) => ({ vent: v.vent, nfa: v.nfa })))
      : null;
  const findings = (isUnvented ? unventedFindings : ventilationFindings)({
    floorAreaSqFt,
    vents: attic.vents,
    perVent: provided.perVent,
    provided,
    requirement,
    fan,
    site,
    required300SqIn: (floorAreaSqFt * SQ_IN_PER_SQ_FT) / 300,
    climateZone: attic.climateZone,
    impossibleHeights: vents.filter((v) => v.position.isHeightImpossible).map((v) => ({ vent: v.vent, riseFt: v.position.riseFt ?? 0 })),
    unvented,
  });
  if (rafterBays && !rafterBays.isMet) {
    const unvented = rafterBays.bayCount - Math.min(rafterBays.baysWithIntake, rafterBays.baysWithExhaust);
    findings.push({
      code: "rafter-bays-not-vented",
      severity: "critical",
      title: unvented > 0 ? "Some rafter bays are not cross-ventilated" : "Rafter bays short of vent area",
      detail:
        `${rafterBays.reasons.join(" ")} ` +
        (unvented > 0
          ? `Each bay is closed off from the next, so every bay needs its own intake at the eave and exhaust at the top (IRC R806.1); ${formatNumber(unvented)} of ${formatNumber(rafterBays.bayCount)} lack one or both. Continuous soffit and ridge vents across every bay are the usual fix.`
          : `Each bay needs ${formatNumber(rafterBays.requiredPerBaySqIn)} sq in; the least-vented gets ${formatNumber(rafterBays.leastPerBaySqIn)} sq in.`),
      ventIds: attic.vents.map((v) => v.id),
    });
  }
  for (const vent of attic.vents) {
    if (vent.diagnostics) for (const finding of diagnoseFan(vent.diagnostics, vent.id)) findings.push(finding);
    if (isPoweredKind(vent.kind)) for (const finding of fanControlFindings(vent, attic.climateZone)) findings.push(finding);
  }

  // "Not less than" (IRC R806.2): the exact figures, never rounded [SOURCES.md S1, S7].
  const meetsArea = meetsRequiredArea(provided.exactTotalSqIn, requirement.exactSqIn);
  let compliant: boolean;
  let summary: string;
  if (unvented) {
    const openings = attic.vents.length;
    compliant = unvented.isMet && openings === 0;
    const open = unvented.conditions.filter((c) => c.status === "not-met").length;
    const unknown = unvented.conditions.filter((c) => c.status === "unknown").length;
    summary =
      "Unvented (sealed) attic: under IRC R806.5 it needs no vent area, and none should be added. " +
      (unvented.isMet
        ? openings === 0
          ? "The conditions recorded are met."
          : "The conditions recorded are met, but vents or fans open it to the outside."
        : `${open > 0 ? `${open} of its conditions ${open === 1 ? "is" : "are"} not met` : ""}${open > 0 && unknown > 0 ? " and " : ""}${unknown > 0 ? `${unknown} ${unknown === 1 ? "condition is" : "conditions are"} not recorded` : ""}.`);
  } else {
    compliant = meetsArea && site.soffitsBlocked !== true && (rafterBays === null || rafterBays.isMet);
    // Enough digits that two different figures never print alike ("1,185.119 of 1,185.12").
    const digits = Math.abs(provided.exactTotalSqIn - requirement.exactSqIn) < 0.01 ? 3 : 2;
    const providedText = formatNumber(provided.exactTotalSqIn, { maxFractionDigits: digits });
    const requiredText = formatNumber(requirement.exactSqIn, { maxFractionDigits: digits });
    summary = meetsArea
      ? compliant
        ? `Meets the code minimum: ${providedText} sq in of vent area provided, ${requiredText} sq in required at 1/${requirement.ratio}.`
        : `Enough vent area on paper (${providedText} of ${requiredText} sq in at 1/${requirement.ratio}), but insulation blocks the soffit vents, so it does not meet the code (IRC R806.3).`
      : `Below the code minimum: ${providedText} sq in of vent area provided, ${requiredText} sq in required at 1/${requirement.ratio}.`;
  }

  return {
    floorAreaSqFt,
    sections,
    volumeCuFt,
    requirement,
    provided,
    fan,
    compliant,
    assembly: isUnvented ? "unvented" : "vented",
    rafterBays,
    recommendations: aboveMinimum({
      requiredExactSqIn: requirement.exactSqIn,
      maxPitchIn12: attic.sections.reduce<number | null>((max, s) => (s.pitchIn12 === undefined ? max : Math.max(max ?? 0, s.pitchIn12)), null),
      wholeHouseFanCfm: provided.wholeHouseFanCfm,
      ceilingAirSealed: site.ceilingAirSealed,
      isUnvented,
    }),
    unvented,
    summary,
    findings: sortFindings(findings),
  };
}

/** Area and volume of one section, with the arithmetic in words. */
function analyzeSection(section: ParsedAttic["sections"][number], index: number): SectionAnalysis {
  const areaSqFt = sectionAreaSqFt(section);
  const geometry = sectionGeometry(section, formatPlain);
  const areaExplanation = describeSectionArea(section, formatPlain);
  const riseFt = geometry.isKnown ? geometry.riseFt : null;
  const volumeCuFt = geometry.isKnown ? geometry.volumeCuFt : null;
  const volumeExplanation = geometry.isKnown ? geometry.explanation : geometry.reason;
  // Plain literals in the key order the JSON has always had (a spread cost microseconds, issue 17).
  return section.id !== undefined
    ? { index, id: section.id, areaSqFt, areaExplanation, riseFt, volumeCuFt, volumeExplanation }
    : { index, areaSqFt, areaExplanation, riseFt, volumeCuFt, volumeExplanation };
}

const formatPlain = (value: number): string => formatNumber(value);

export type TryAnalyzeResult =
  | { ok: true; analysis: AtticAnalysis }
  | { ok: false; issues: { path: string; message: string }[] };

/**
 * Like analyzeAttic, for untrusted input (a form being typed): never throws on bad input.
 *
 * @example
 * tryAnalyzeAttic({ codeBasis: "irc-2018" }).ok // false
 */
export function tryAnalyzeAttic(input: unknown): TryAnalyzeResult {
  const parsed = ParsedAtticSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      issues: parsed.error.issues.map((issue) => ({ path: issue.path.map(String).join("."), message: issue.message })),
    };
  }
  return { ok: true, analysis: analyzeParsedAttic(parsed.data) };
}
