/**
 * Required net free area by code basis — IRC R806.2, each edition's own rule
 * [SOURCES.md §1; issue 3].
 *
 * - Every edition: NFA ≥ 1/150 of the vented floor area (IRC R806.2 base rule; S1, S2, S7).
 * - `strict-150`: always 1/150 (a local or company choice).
 * - `irc-2009`: 1/300 when EITHER (a) 50–80 % of the required area is in upper vents at least 3 ft
 *   above the eave vents, the balance in eave vents [S3; from memory for exact wording], OR (b) a
 *   Class I or II vapor retarder is on the warm-in-winter side of the ceiling [from memory].
 * - `irc-2012` (2012/2015 text): 1/300 when ONE OR MORE of (1) climate zones 6–8 with a Class I/II
 *   ceiling vapor retarder; (2) 40–50 % of the required area in upper vents not more than 3 ft
 *   below the ridge, the balance in eave vents [S4 quotes condition 2; "one or more" is from memory].
 * - `irc-2018` (2018/2021/2024 text): 1/300 only when BOTH (1) in climate zones 6–8 a Class I/II
 *   ceiling vapor retarder — in zones 1–5 this condition does not apply [PRACTICE: the common
 *   reading, confirm with the AHJ] — and (2) 40–50 % in upper vents ≤ 3 ft below the ridge, the
 *   balance in the bottom third of the attic [from memory + S5; 2024 unverified, SOURCES.md §1].
 *
 * How Eavesight reads the percentages (stated in the reasons): with R the 1/300 area, the
 * qualifying upper vents must give at least the low share (40 % or 50 %) of R; the qualifying low
 * vents must give the balance, R minus the upper vents counted up to the high share (50 % or 80 %);
 * and the high share caps the upper vents:
 * - `upperShareBase: "required"` (the default, the literal text: "… percent of the required
 *   ventilating area" [S4]): all upper passive vents together give at most the high share of R;
 * - `upperShareBase: "provided"` (a local reading a company may choose in its profile): the upper
 *   vents are at most the high share of all the passive vent area provided.
 * The reading not chosen is worked out too, and a note says when it would decide differently.
 * The framing-conflict allowance of 2012+ (upper vents placed lower where framing prevents it) is
 * not modelled.
 */
import { ceilWhole, floorWhole, formatNumber, formatPercent, SQ_IN_PER_SQ_FT } from "../units/format";
import type { CodeBasis, UpperShareBase, VaporRetarder } from "./schema";
import { ventDisplayName } from "./vent-kinds";
import type { VentNfa } from "./vent-nfa";
import type { VentPosition } from "./vent-position";

export type Ratio = 150 | 300;

export interface RequirementSplit {
  /** True when the code itself sets this split (the 1/300 vent-placement route). */
  isCodeRule: boolean;
  upperShareMin: number;
  upperShareMax: number;
  /** Whole sq in: minimums rounded up, maximums rounded down; lower = total − upper. */
  upperMinSqIn: number;
  upperMaxSqIn: number;
  lowerMinSqIn: number;
  lowerMaxSqIn: number;
  /** Where the split comes from, in words. */
  basis: string;
}

export type ConditionStatus = "met" | "not-met" | "not-applicable";

export interface ExceptionCondition {
  id: "vapor-retarder" | "vent-placement";
  status: ConditionStatus;
  reason: string;
}

export interface Requirement {
  codeBasis: CodeBasis;
  ratio: Ratio;
  /** Unrounded required NFA, sq in (floor area × 144 ÷ ratio). */
  exactSqIn: number;
  /** Required NFA rounded up to a whole sq in. */
  totalSqIn: number;
  /** Required NFA, sq ft (floor area ÷ ratio). */
  totalSqFt: number;
  split: RequirementSplit;
  exception: {
    /** The code basis offers a 1/300 route at all. */
    isAvailable: boolean;
    isMet: boolean;
    /** "either" (2009), "one-or-more" (2012), "both" (2018). */
    connector: "either" | "one-or-more" | "both" | null;
    conditions: ExceptionCondition[];
  };
  /** Upper passive vents that qualify as "upper" under this basis. */
  qualifyingUpperVentIds: string[];
  /** Upper passive vents known to sit too low for this basis's upper-vent rule. */
  tooLowUpperVentIds: string[];
  /** Upper passive vents whose position can't be known from the survey. */
  unknownPositionVentIds: string[];
  /** Which area the 40–50 % (50–80 %) share is taken of. */
  upperShareBase: UpperShareBase;
  /**
   * The reading not chosen, when it would decide the 1/300 exception differently; null when both
   * agree or the exception does not turn on the vent placement.
   */
  otherReading: { upperShareBase: UpperShareBase; wouldBeMet: boolean; reason: string } | null;
  /** Plain sentences: which rule applied and why, with the arithmetic. */
  reasons: string[];
}

export interface RequirementInput {
  floorAreaSqFt: number;
  codeBasis: CodeBasis;
  climateZone: number;
  ceilingVaporRetarder: VaporRetarder;
  /** Default "required", the literal text. */
  upperShareBase?: UpperShareBase | undefined;
  vents: ReadonlyArray<{ nfa: VentNfa; position: VentPosition; label?: string | undefined }>;
}

/** The R806.2 rule an edition shares (its text as read here) [SOURCES.md S5; 2021 and 2024 from memory, S26]. */
export type CodeBasisRule = "irc-2018" | "irc-2012" | "irc-2009" | "strict-150";

/**
 * @example
 * codeBasisRule("irc-2024") // "irc-2018": the 2021 and 2024 editions keep the 2018 R806.2 text
 */
export function codeBasisRule(codeBasis: CodeBasis): CodeBasisRule {
  return codeBasis === "irc-2024" || codeBasis === "irc-2021" ? "irc-2018" : codeBasis;
}

export const CODE_BASIS_NAMES: Record<CodeBasis, string> = {
  "irc-2024": "IRC 2024, section R806.2 (the same rule as the 2018 and 2021 text: both conditions for 1/300)",
  "irc-2021": "IRC 2021, section R806.2 (the same rule as the 2018 text: both conditions for 1/300)",
  "irc-2018": "IRC 2018/2021/2024 text, section R806.2",
  "irc-2012": "IRC 2012/2015 text, section R806.2",
  "irc-2009": "IRC 2009, section R806.2",
  "strict-150": "strict 1/150 (no exceptions)",
};

/** "1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in" (plus "rounded up to …" when needed). */
export function ratioArithmetic(floorAreaSqFt: number, ratio: Ratio): string {
  const sqFt = floorAreaSqFt / ratio;
  const exactSqIn = (floorAreaSqFt * SQ_IN_PER_SQ_FT) / ratio;
  const total = ceilWhole(exactSqIn);
  const rounded = Math.abs(total - exactSqIn) > 1e-6 ? `, rounded up to ${formatNumber(total)} sq in` : "";
  return `${formatNumber(floorAreaSqFt)} sq ft ÷ ${ratio} = ${formatNumber(sqFt, { maxFractionDigits: 3 })} sq ft = ${formatNumber(exactSqIn)} sq in${rounded}`;
}

function makeSplit(totalSqIn: number, exactSqIn: number, shareMin: number, shareMax: number, isCodeRule: boolean, basis: string): RequirementSplit {
  const upperMinSqIn = Math.min(ceilWhole(exactSqIn * shareMin), totalSqIn);
  const upperMaxSqIn = Math.max(floorWhole(exactSqIn * shareMax), upperMinSqIn);
  return {
    isCodeRule,
    upperShareMin: shareMin,
    upperShareMax: shareMax,
    upperMinSqIn,
    upperMaxSqIn,
    lowerMinSqIn: Math.max(0, totalSqIn - upperMaxSqIn),
    lowerMaxSqIn: Math.max(0, totalSqIn - upperMinSqIn),
    basis,
  };
}

const PRACTICE_SPLIT_BASIS =
  "The code sets no split for this ratio; Eavesight suggests 40–50 % in high vents and the rest, at least as much, at the eaves, so intake is never smaller than exhaust (common practice: BC Housing, HVI).";

function listVents(items: ReadonlyArray<{ nfa: VentNfa; label?: string | undefined }>): string {
  let text = "";
  for (const v of items) {
    text += `${text === "" ? "" : ", "}${ventDisplayName({ kind: v.nfa.kind, label: v.label })} (${formatNumber(v.nfa.nfaSqIn)} sq in)`;
  }
  return text;
}

/** Exact NFA of the vents, sq in (never rounded: it feeds the verdicts). */
function sumExactSqIn(items: ReadonlyArray<{ nfa: VentNfa }>): number {
  let total = 0;
  for (const v of items) total += v.nfa.exactNfaSqIn;
  return total;
}

interface PlacementCheck {
  isMet: boolean;
  /** The verdict under the reading not chosen, and the sentence that explains it. */
  otherIsMet: boolean;
  otherReason: string;
  reason: string;
  qualifyingUpperVentIds: string[];
  tooLowUpperVentIds: string[];
  unknownPositionVentIds: string[];
}

/** The vent-placement condition: 2009 alternative 1, or 2012+ condition 2. */
function checkPlacement(input: RequirementInput, edition: "2009" | "2012" | "2018", required300SqIn: number, base: UpperShareBase): PlacementCheck {
  const passive = input.vents.filter((v) => !v.nfa.isPowered && v.nfa.nfaSqIn > 0);
  const upper = passive.filter((v) => v.nfa.location === "upper");
  const lower = passive.filter((v) => v.nfa.location === "lower");
  const shareMin = edition === "2009" ? 0.5 : 0.4;
  const shareMax = edition === "2009" ? 0.8 : 0.5;

  const qualifying: typeof upper = [];
  const tooLow: typeof upper = [];
  const unknown: typeof upper = [];
  const assumedAtRidge: typeof upper = [];
  for (const v of upper) {
    if (v.position.isHeightImpossible) {
      unknown.push(v);
      continue;
    }
    if (edition === "2009") {
      const h = v.position.heightAboveEaveFt;
      if (h === null) unknown.push(v);
      else if (h >= 3) qualifying.push(v);
      else tooLow.push(v);
    } else {
      const d = v.position.dropBelowRidgeFt;
      if (d === null) unknown.push(v);
      else if (d <= 3) qualifying.push(v);
      else tooLow.push(v);
    }
    if (v.position.dropSource === "at-ridge-kind") assumedAtRidge.push(v);
  }
  const lowQualifying: typeof lower = [];
  const lowOther: typeof lower = [];
  for (const v of lower) {
    if (edition === "2018" ? v.position.isInBottomThird : v.position.isEaveVent) lowQualifying.push(v);
    else lowOther.push(v);
  }

  const upperQSqIn = sumExactSqIn(qualifying);
  const lowerQSqIn = sumExactSqIn(lowQualifying);
  const upperAllSqIn = sumExactSqIn(upper);
  const passiveSqIn = sumExactSqIn(passive);

  const upperNeedSqIn = required300SqIn * shareMin;
  const upperCountedSqIn = Math.min(upperQSqIn, required300SqIn * shareMax);
  const lowerNeedSqIn = Math.max(0, required300SqIn - upperCountedSqIn);
  const upperShareOfProvided = passiveSqIn > 0 ? upperAllSqIn / passiveSqIn : 0;

  const isUpperMet = upperQSqIn + 1e-9 >= upperNeedSqIn && upperQSqIn > 0;
  const isLowerMet = lowerQSqIn + 1e-9 >= lowerNeedSqIn && lowerQSqIn > 0;
  const upperCapSqIn = required300SqIn * shareMax;
  const isCapOfRequiredMet = passiveSqIn > 0 && upperAllSqIn <= upperCapSqIn * (1 + 1e-12);
  const isCapOfProvidedMet = passiveSqIn > 0 && upperShareOfProvided <= shareMax + 1e-12;
  const isCapMet = base === "required" ? isCapOfRequiredMet : isCapOfProvidedMet;
  const capOfRequiredText = `All the high vents together give ${formatNumber(upperAllSqIn)} sq in; the text allows at most ${formatPercent(shareMax)} of ${formatNumber(required300SqIn)} sq in = ${formatNumber(upperCapSqIn)} sq in of the required area: ${isCapOfRequiredMet ? "met" : "not met"}.`;
  const capOfProvidedText =
    passiveSqIn > 0
      ? `High vents are ${formatPercent(upperShareOfProvided)} of all the passive vent area (${formatNumber(upperAllSqIn)} of ${formatNumber(passiveSqIn)} sq in); at most ${formatPercent(shareMax)} is allowed: ${isCapOfProvidedMet ? "met" : "not met"}.`
      : "There is no passive vent area at all: not met.";

  const upperRule = edition === "2009" ? "at least 3 ft above the eave vents" : "no more than 3 ft below the ridge";
  const lowerRule = edition === "2018" ? "in the bottom third of the attic" : "in eave or cornice vents";
  const parts: string[] = [];
  parts.push(
    `Upper vents ${upperRule} give ${formatNumber(upperQSqIn)} sq in; the rule needs ${formatPercent(shareMin)} of ${formatNumber(required300SqIn)} sq in = ${formatNumber(upperNeedSqIn)} sq in or more: ${isUpperMet ? "met" : "not met"}.`,
  );
  parts.push(
    `Low vents ${lowerRule} give ${formatNumber(lowerQSqIn)} sq in; the balance needed is ${formatNumber(required300SqIn)} − ${formatNumber(upperCountedSqIn)} = ${formatNumber(lowerNeedSqIn)} sq in or more: ${isLowerMet ? "met" : "not met"}.`,
  );
  parts.push(base === "required" ? capOfRequiredText : capOfProvidedText);
  if (assumedAtRidge.length > 0) {
    parts.push(`Taken as sitting at the ridge because of their kind (no drop was recorded): ${listVents(assumedAtRidge)}.`);
  }
  if (tooLow.length > 0) parts.push(`Too low to count as upper vents: ${listVents(tooLow)}.`);
  if (unknown.length > 0) {
    parts.push(
      edition === "2009"
        ? `Height above the eave vents unknown or impossible (record the roof pitch and span, or the vent's height above the eaves): ${listVents(unknown)}; they are taken as not meeting the rule and not counted.`
        : `Drop below the highest point unknown or impossible (record it, or the roof pitch and span with the vent's height above the eaves): ${listVents(unknown)}; they are taken as not meeting the rule and not counted.`,
    );
  }
  if (lowOther.length > 0) {
    parts.push(
      edition === "2018"
        ? `Low vents not known to be in the bottom third are not counted toward the balance: ${listVents(lowOther)}.`
        : `Low vents that are not eave or cornice vents are not counted toward the balance: ${listVents(lowOther)}.`,
    );
  }
  const otherCapMet = base === "required" ? isCapOfProvidedMet : isCapOfRequiredMet;
  return {
    isMet: isUpperMet && isLowerMet && isCapMet,
    otherIsMet: isUpperMet && isLowerMet && otherCapMet,
    otherReason: base === "required" ? capOfProvidedText : capOfRequiredText,
    reason: parts.join(" "),
    qualifyingUpperVentIds: qualifying.map((v) => v.nfa.ventId),
    tooLowUpperVentIds: tooLow.map((v) => v.nfa.ventId),
    unknownPositionVentIds: unknown.map((v) => v.nfa.ventId),
  };
}

const isClassIorII = (retarder: VaporRetarder) => retarder === "class-I" || retarder === "class-II";

function retarderName(retarder: VaporRetarder): string {
  return retarder === "none" ? "no ceiling vapor retarder" : `a ${retarder.replace("class-", "Class ")} vapor retarder`;
}

/**
 * The required NFA for one attic space, with the reasons.
 *
 * @example
 * // SOURCES.md §8 E1: 1,500 sq ft at 1/150
 * requiredNfa({ floorAreaSqFt: 1500, codeBasis: "strict-150", climateZone: 5, ceilingVaporRetarder: "none", vents: [] })
 * // { ratio: 150, totalSqIn: 1440, reasons: ["… 1,500 sq ft ÷ 150 = 10 sq ft = 1,440 sq in …"], … }
 */
export function requiredNfa(input: RequirementInput): Requirement {
  const { floorAreaSqFt, codeBasis, climateZone, ceilingVaporRetarder } = input;
  const rule = codeBasisRule(codeBasis);
  const upperShareBase: UpperShareBase = input.upperShareBase ?? "required";
  let otherIsMet = false;
  const exact300 = (floorAreaSqFt * SQ_IN_PER_SQ_FT) / 300;
  const reasons: string[] = [
    `Code basis: ${CODE_BASIS_NAMES[codeBasis]}. The base rule is net free area of at least 1/150 of the attic floor: ${ratioArithmetic(floorAreaSqFt, 150)}.`,
  ];
  const conditions: ExceptionCondition[] = [];
  let connector: Requirement["exception"]["connector"] = null;
  let isMet = false;
  let placement: PlacementCheck | null = null;
  let splitByPlacement: { min: number; max: number } | null = null;

  const inColdZone = climateZone >= 6;
  const hasRetarder = isClassIorII(ceilingVaporRetarder);

  if (rule === "irc-2009") {
    connector = "either";
    placement = checkPlacement(input, "2009", exact300, upperShareBase);
    conditions.push({
      id: "vent-placement",
      status: placement.isMet ? "met" : "not-met",
      reason: `Alternative 1 (50–80 % of the area in upper vents at least 3 ft above the eave vents, the rest at the eaves): ${placement.reason}`,
    });
    conditions.push({
      id: "vapor-retarder",
      status: hasRetarder ? "met" : "not-met",
      reason: `Alternative 2 (a Class I or II vapor retarder on the warm-in-winter side of the ceiling, any climate zone): the survey records ${retarderName(ceilingVaporRetarder)}: ${hasRetarder ? "met" : "not met"}.`,
    });
    isMet = placement.isMet || hasRetarder;
    otherIsMet = placement.otherIsMet || hasRetarder;
    if (placement.isMet) splitByPlacement = { min: 0.5, max: 0.8 };
    reasons.push("IRC 2009 allows 1/300 when either of two alternatives is met.");
  } else if (rule === "irc-2012" || rule === "irc-2018") {
    const edition = rule === "irc-2012" ? "2012" : "2018";
    connector = edition === "2012" ? "one-or-more" : "both";
    let retarderCondition: ExceptionCondition;
    if (!inColdZone) {
      retarderCondition = {
        id: "vapor-retarder",
        status: "not-applicable",
        reason:
          edition === "2012"
            ? `Condition 1 (Class I or II ceiling vapor retarder) applies only in climate zones 6–8; this house is in zone ${climateZone}, so this route is not available.`
            : `Condition 1 (Class I or II ceiling vapor retarder) applies only in climate zones 6–8; this house is in zone ${climateZone}, so it does not apply and only the vent placement counts (the usual reading; confirm with the building department).`,
      };
    } else {
      retarderCondition = {
        id: "vapor-retarder",
        status: hasRetarder ? "met" : "not-met",
        reason: `Condition 1: in climate zone ${climateZone} a Class I or II vapor retarder on the warm-in-winter side of the ceiling is needed; the survey records ${retarderName(ceilingVaporRetarder)}: ${hasRetarder ? "met" : "not met"}.`,
      };
    }
    placement = checkPlacement(input, edition, exact300, upperShareBase);
    const placementCondition: ExceptionCondition = {
      id: "vent-placement",
      status: placement.isMet ? "met" : "not-met",
      reason: `Condition 2 (40–50 % of the area in upper vents no more than 3 ft below the ridge, the balance ${edition === "2018" ? "in the bottom third of the attic" : "in eave or cornice vents"}): ${placement.reason}`,
    };
    conditions.push(retarderCondition, placementCondition);
    if (edition === "2012") {
      isMet = retarderCondition.status === "met" || placement.isMet;
      otherIsMet = retarderCondition.status === "met" || placement.otherIsMet;
      reasons.push("The 2012/2015 text allows 1/300 when one or more of two conditions is met.");
    } else {
      isMet = retarderCondition.status !== "not-met" && placement.isMet;
      otherIsMet = retarderCondition.status !== "not-met" && placement.otherIsMet;
      reasons.push("The 2018/2021/2024 text allows 1/300 only when both conditions are met.");
    }
    if (placement.isMet) splitByPlacement = { min: 0.4, max: 0.5 };
  } else {
    reasons.push("This project uses 1/150 with no exceptions.");
  }
  for (const condition of conditions) reasons.push(condition.reason);

  const ratio: Ratio = isMet ? 300 : 150;
  const exactSqIn = (floorAreaSqFt * SQ_IN_PER_SQ_FT) / ratio;
  const totalSqIn = ceilWhole(exactSqIn);
  if (codeBasis !== "strict-150") {
    reasons.push(
      isMet
        ? `The 1/300 exception is met, so the required area is ${ratioArithmetic(floorAreaSqFt, 300)}.`
        : `The 1/300 exception is not met, so 1/150 applies: ${ratioArithmetic(floorAreaSqFt, 150)}.`,
    );
  } else {
    reasons.push(`Required: ${ratioArithmetic(floorAreaSqFt, 150)}.`);
  }

  const split =
    ratio === 300 && splitByPlacement
      ? makeSplit(
          totalSqIn,
          exactSqIn,
          splitByPlacement.min,
          splitByPlacement.max,
          true,
          `Set by the 1/300 vent-placement rule: ${formatNumber(splitByPlacement.min * 100)}–${formatNumber(splitByPlacement.max * 100)} % in upper vents, the balance low.`,
        )
      : makeSplit(totalSqIn, exactSqIn, 0.4, 0.5, false, PRACTICE_SPLIT_BASIS);
  reasons.push(
    `Split: ${formatNumber(split.upperMinSqIn)}–${formatNumber(split.upperMaxSqIn)} sq in high, ${formatNumber(split.lowerMinSqIn)}–${formatNumber(split.lowerMaxSqIn)} sq in low. ${split.basis}`,
  );

  return {
    codeBasis,
    ratio,
    exactSqIn,
    totalSqIn,
    totalSqFt: floorAreaSqFt / ratio,
    split,
    exception: { isAvailable: codeBasis !== "strict-150", isMet, connector, conditions },
    qualifyingUpperVentIds: placement?.qualifyingUpperVentIds ?? [],
    tooLowUpperVentIds: placement?.tooLowUpperVentIds ?? [],
    unknownPositionVentIds: placement?.unknownPositionVentIds ?? [],
    upperShareBase,
    otherReading:
      placement !== null && otherIsMet !== isMet
        ? { upperShareBase: upperShareBase === "required" ? "provided" : "required", wouldBeMet: otherIsMet, reason: placement.otherReason }
        : null,
    reasons,
  };
}

/**
 * The requirement of an unvented attic (IRC R806.5): no net free area at all. Shaped like any
 * requirement so screens and the PDF show "0 sq in required" with the reason.
 */
export function unventedRequirement(codeBasis: CodeBasis): Requirement {
  return {
    codeBasis,
    ratio: 150,
    exactSqIn: 0,
    totalSqIn: 0,
    totalSqFt: 0,
    split: { isCodeRule: false, upperShareMin: 0, upperShareMax: 0, upperMinSqIn: 0, upperMaxSqIn: 0, lowerMinSqIn: 0, lowerMaxSqIn: 0, basis: "An unvented attic has no vents, so there is no split." },
    exception: { isAvailable: false, isMet: false, connector: null, conditions: [] },
    qualifyingUpperVentIds: [],
    tooLowUpperVentIds: [],
    unknownPositionVentIds: [],
    upperShareBase: "required",
    otherReading: null,
    reasons: [
      "This is an unvented (sealed) attic: IRC R806.5 lets an attic go without vents when the insulation is at the roof line and its conditions are met, so no net free area is required and none should be added.",
    ],
  };
}
