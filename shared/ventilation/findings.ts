/**
 * Findings: what the analysis noticed, each with a severity, a title, a plain detail that says
 * what to do, and the vents involved. Codes are part of the contract (DESIGN.md §4).
 */
import { ATTIC_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION, ROOF_SAFETY_CAUTION } from "../diagnostics/cautions";
import { formatNumber, formatPercent } from "../units/format";
import { meetsRequiredArea, type ProvidedNfa } from "./balance";
import { FAN_OVERSIZED_ABOVE, FAN_UNDERSIZED_BELOW } from "./fan-sizing";
import { codeBasisRule, type Requirement } from "./requirement";
import type { Site, Vent } from "./schema";
import { EAVE_KINDS, VENT_KIND_LABELS, ventListPhrase, type VentKind } from "./vent-kinds";
import type { UnventedCheck } from "./unvented";
import { wholeHouseFanFindings } from "./whole-house-fan";
import type { VentNfa } from "./vent-nfa";

export const FINDING_CODES = [
  // ventilation (DESIGN.md §4)
  "below-minimum",
  "meets-minimum-narrowly",
  "no-intake",
  "no-exhaust",
  "exhaust-exceeds-intake",
  "powered-with-passive-exhaust",
  "mixed-exhaust",
  "gable-with-ridge",
  "fan-intake-short",
  "fan-undersized",
  "fan-oversized",
  "backdraft-risk",
  "exception-not-met",
  "upper-vent-too-low",
  "gable-fan-unsealed",
  "soffits-blocked",
  // further site findings
  "baffles-missing",
  "bath-fan-into-attic",
  "appliance-exhaust-into-attic",
  "powered-fan-depressurization",
  "upper-vent-position-unknown",
  "upper-share-reading",
  "vent-height-impossible",
  // enclosed rafter bays (IRC R806.1)
  "rafter-bays-not-vented",
  // vent condition
  "vents-blocked",
  "vent-damaged",
  // whole-house fans
  "whole-house-fan-outlet-short",
  "whole-house-fan-operation",
  // unvented attics (IRC R806.5)
  "unvented-assembly",
  "unvented-condition-not-met",
  "unvented-condition-unknown",
  "vents-in-unvented-attic",
  "vent-location-unusual",
  // fan diagnostics (shared/diagnostics)
  "fan-power-not-verified",
  "fan-power-verified",
  "fan-lockout-missing",
  "fan-tester-not-proven",
  "fan-safety-steps-not-recorded",
  "fan-winding-open",
  "fan-winding-shorted",
  "fan-winding-grounded",
  "fan-ground-ok",
  "fan-capacitor-failed",
  "fan-capacitor-ok",
  "fan-winding-suspect",
  "fan-winding-ok",
  "fan-bearings-seized",
  "fan-bearings-ok",
  "fan-thermostat-failed",
  "fan-thermostat-inconclusive",
  "fan-thermostat-ok",
  "fan-control-cold-climate",
  "fan-set-point-unusual",
  "fan-override-untested",
  "fan-override-failed",
] as const;

export type FindingCode = (typeof FINDING_CODES)[number];
export type Severity = "critical" | "warning" | "info";

export interface Finding {
  code: FindingCode;
  severity: Severity;
  title: string;
  /** Plain words: what is wrong, the numbers, and what to do about it. */
  detail: string;
  ventIds: string[];
  /** The safety caution to show with it, when the fix is physical work. */
  caution?: string;
}

/** Critical first, then warnings, then notes; stable within a severity. */
export function sortFindings(findings: Finding[]): Finding[] {
  const critical: Finding[] = [];
  const warning: Finding[] = [];
  const info: Finding[] = [];
  for (const finding of findings) (finding.severity === "critical" ? critical : finding.severity === "warning" ? warning : info).push(finding);
  return critical.concat(warning, info);
}

export interface FanSummary {
  installedCfm: number;
  recommendedCfm: number;
  intakeNeededSqIn: number;
  intakeProvidedSqIn: number;
}

export interface FindingContext {
  floorAreaSqFt: number;
  vents: ReadonlyArray<Vent>;
  perVent: ReadonlyArray<VentNfa>;
  provided: ProvidedNfa;
  requirement: Requirement;
  fan: FanSummary | null;
  site: Site;
  required300SqIn: number;
  /** IECC climate zone 1–8 (cold-climate advice). */
  climateZone?: number;
  /** The R806.5 check of an unvented attic; null or absent for a vented one. */
  unvented?: UnventedCheck | null;
  /** Vents whose recorded height or drop is above the highest rise of the space. */
  impossibleHeights?: ReadonlyArray<{ vent: Vent; riseFt: number }>;
}

const PASSIVE_EXHAUST_KINDS: ReadonlySet<VentKind> = new Set<VentKind>(["ridge", "box", "turbine", "off-ridge", "cupola", "gable-louver"]);

const kindLabel = (kind: VentKind) => VENT_KIND_LABELS[kind];
const plural = (n: number, one: string, many: string) => (n === 1 ? one : many);
const capitalize = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
const ids = (items: ReadonlyArray<VentNfa>): string[] => items.map(ventIdOf);
const ventIdOf = (v: VentNfa): string => v.ventId;

/** Every ventilation finding for one attic space (fan diagnostics are added by the caller). */
export function ventilationFindings(ctx: FindingContext): Finding[] {
  const findings: Finding[] = [];
  const { provided, requirement, site } = ctx;
  const passive = ctx.perVent.filter((v) => !v.isPowered && !v.isWholeHouseFan);
  const powered = ctx.perVent.filter((v) => v.isPowered);
  const passiveUpper = passive.filter((v) => v.location === "upper" && v.nfaSqIn > 0);
  const passiveLower = passive.filter((v) => v.location === "lower" && v.nfaSqIn > 0);

  // IRC R806.2 minimum: "not less than" — exact figures, never rounded [SOURCES.md S1, S7].
  const meetsArea = meetsRequiredArea(provided.exactTotalSqIn, requirement.exactSqIn);
  if (!meetsArea) {
    const shortSqIn = requirement.exactSqIn - provided.exactTotalSqIn;
    findings.push({
      code: "below-minimum",
      severity: "critical",
      title: "Less vent area than the code minimum",
      detail:
        `The attic has ${formatNumber(provided.exactTotalSqIn)} sq in of net free vent area; at 1/${requirement.ratio} it needs ${formatNumber(requirement.exactSqIn)} sq in, ` +
        `${formatNumber(shortSqIn, { maxFractionDigits: shortSqIn < 1 ? 3 : 2 })} sq in short. Add vent area — intake at the eaves first, then exhaust high on the roof — keeping intake at least equal to exhaust.`,
      ventIds: ids(passive),
      caution: ROOF_SAFETY_CAUTION,
    });
  } else if (provided.exactTotalSqIn < requirement.totalSqIn) {
    // Meets the exact figure but not the whole number a buyer rounds up to: say so plainly.
    findings.push({
      code: "meets-minimum-narrowly",
      severity: "info",
      title: "Meets the minimum by less than 1 sq in",
      detail:
        `The ${formatNumber(provided.exactTotalSqIn)} sq in provided is not less than the exact ${formatNumber(requirement.exactSqIn)} sq in the code asks for at 1/${requirement.ratio}, so it meets the minimum. ` +
        `Figures shown and bought are rounded up to ${formatNumber(requirement.totalSqIn)} sq in; any vent that closes up (paint, insulation, a nest) would put this attic below the minimum.`,
      ventIds: [],
    });
  }

  if (passiveLower.length === 0) {
    findings.push({
      code: "no-intake",
      severity: "critical",
      title: "No intake vents",
      detail:
        "Nothing lets outside air in low at the eaves, so any exhaust vent or fan draws its air from the house or from other high vents. Add soffit or other eave intake, with baffles so insulation can't block it.",
      ventIds: ids([...passiveUpper, ...powered]),
      caution: ATTIC_SAFETY_CAUTION,
    });
  }
  if (passiveUpper.length === 0 && powered.length === 0) {
    findings.push({
      code: "no-exhaust",
      severity: "critical",
      title: "No exhaust vents",
      detail:
        "Nothing lets warm, moist attic air out high on the roof. Add one kind of exhaust near the ridge — a ridge vent is usual — sized with the intake.",
      ventIds: ids(passiveLower),
      caution: ROOF_SAFETY_CAUTION,
    });
  }

  if (provided.exhaustSqIn > provided.intakeSqIn && passiveLower.length > 0) {
    findings.push({
      code: "exhaust-exceeds-intake",
      severity: "warning",
      title: "More exhaust than intake",
      detail:
        `Exhaust vents give ${formatNumber(provided.exhaustSqIn)} sq in but intake only ${formatNumber(provided.intakeSqIn)} sq in. With more exhaust than intake the attic pulls air from the house through ceiling leaks. ` +
        "Add intake at the eaves (or reduce exhaust) until intake is at least equal to exhaust.",
      ventIds: ids(passiveUpper),
    });
  }

  // Short-circuiting [PRACTICE; SOURCES.md §5.4, S19].
  const highOpenings = passive.filter((v) => v.location === "upper" && PASSIVE_EXHAUST_KINDS.has(v.kind));
  if (powered.length > 0 && highOpenings.length > 0) {
    findings.push({
      code: "powered-with-passive-exhaust",
      severity: "critical",
      title: "Powered fan short-circuits through other high vents",
      detail:
        `A fan pulls air from the nearest, easiest opening. With ${ventListPhrase(highOpenings)} in the same attic, ` +
        "it draws outside air in through them instead of through the soffits, so the attic floor and roof deck are not swept. " +
        "Either remove the fan and rely on passive vents, or close off the other high vents so the fan draws from the eaves.",
      ventIds: [...ids(powered), ...ids(highOpenings)],
      caution: ROOF_SAFETY_CAUTION,
    });
  }

  const exhaustKinds = new Set(passiveUpper.map((v) => v.kind));
  const hasRidge = exhaustKinds.has("ridge");
  const gables = passive.filter((v) => v.kind === "gable-louver" && v.nfaSqIn > 0);
  const isGableWithRidge = hasRidge && gables.length > 0;
  if (isGableWithRidge) {
    const ridges = passiveUpper.filter((v) => v.kind === "ridge");
    findings.push({
      code: "gable-with-ridge",
      severity: "warning",
      title: "Gable louvers together with a ridge vent",
      detail:
        "The ridge vent draws air in through the gable louvers, close by and high up, instead of from the soffits, leaving most of the roof deck unvented. " +
        "Close off the gable louvers from the inside when a ridge vent serves the attic (common practice).",
      ventIds: [...ids(ridges), ...ids(gables)],
    });
  }
  const mixKinds = [...exhaustKinds].filter((k) => !(isGableWithRidge && k === "gable-louver"));
  if (mixKinds.length >= 2) {
    const mixed = passiveUpper.filter((v) => mixKinds.includes(v.kind));
    findings.push({
      code: "mixed-exhaust",
      severity: "warning",
      title: "More than one kind of exhaust vent",
      detail:
        `This attic has ${mixKinds.map(kindLabel).join(", ")}. Different exhaust vents can feed each other — one draws outside air in through the other — so air bypasses the soffit-to-ridge path. ` +
        "Use one kind of exhaust per attic space (common practice; manufacturers' instructions usually say the same) and close off the rest.",
      ventIds: ids(mixed),
      caution: ROOF_SAFETY_CAUTION,
    });
  }

  // Powered fans [HVI, S6; cautions SOURCES.md §5].
  if (ctx.fan && powered.length > 0) {
    const fan = ctx.fan;
    if (fan.intakeProvidedSqIn < fan.intakeNeededSqIn) {
      findings.push({
        code: "fan-intake-short",
        severity: "warning",
        title: "Not enough intake for the fan",
        detail:
          `The fan${plural(powered.length, "", "s")} move${plural(powered.length, "s", "")} ${formatNumber(fan.installedCfm)} cfm and need${plural(powered.length, "s", "")} 1 sq ft of intake per 300 cfm: ` +
          `${formatNumber(fan.installedCfm)} ÷ 300 × 144 = ${formatNumber(fan.intakeNeededSqIn)} sq in; the eaves give ${formatNumber(fan.intakeProvidedSqIn)} sq in. ` +
          "A starved fan pulls conditioned air out of the house. Add intake vents or use a smaller fan.",
        ventIds: ids(powered),
      });
    }
    if (fan.installedCfm < fan.recommendedCfm * FAN_UNDERSIZED_BELOW) {
      findings.push({
        code: "fan-undersized",
        severity: "warning",
        title: "Fan far smaller than recommended",
        detail:
          `Installed ${formatNumber(fan.installedCfm)} cfm is ${formatPercent(fan.installedCfm / fan.recommendedCfm)} of the recommended ${formatNumber(fan.recommendedCfm)} cfm. ` +
          "Consider passive ventilation instead, or a fan sized to the recommendation with intake to match.",
        ventIds: ids(powered),
      });
    } else if (fan.installedCfm > fan.recommendedCfm * FAN_OVERSIZED_ABOVE) {
      findings.push({
        code: "fan-oversized",
        severity: "warning",
        title: "Fan far larger than recommended",
        detail:
          `Installed ${formatNumber(fan.installedCfm)} cfm is ${formatPercent(fan.installedCfm / fan.recommendedCfm)} of the recommended ${formatNumber(fan.recommendedCfm)} cfm. ` +
          "An oversized fan is more likely to pull conditioned air and combustion gases out of the house; use a smaller fan or passive vents.",
        ventIds: ids(powered),
      });
    }
    if (site.atmosphericCombustionAppliance === true) {
      findings.push({
        code: "backdraft-risk",
        severity: "critical",
        title: "Risk of backdrafting a gas appliance",
        detail:
          "This house has a natural-draft (atmospheric) combustion appliance and a powered attic fan. " + COMBUSTION_SAFETY_CAUTION +
          " Until a combustion safety test has passed, consider switching the fan off; passive ventilation avoids the risk.",
        ventIds: ids(powered),
        caution: COMBUSTION_SAFETY_CAUTION,
      });
    } else {
      findings.push({
        code: "powered-fan-depressurization",
        severity: "info",
        title: "Powered fans can depressurize the house",
        detail:
          (site.atmosphericCombustionAppliance === false
            ? "No atmospheric combustion appliance was recorded, but "
            : "Check whether the house has a natural-draft gas water heater, furnace or boiler: ") +
          COMBUSTION_SAFETY_CAUTION +
          (site.ceilingAirSealed === true ? "" : " Air-sealing the ceiling first reduces how much house air the fan can pull."),
        ventIds: ids(powered),
        caution: COMBUSTION_SAFETY_CAUTION,
      });
    }
    const gableFans = ctx.vents.filter(
      (v) => (v.kind === "powered-gable" || v.mounting === "gable") && (v.sealedToOpening === false || (v.sealedToOpening === undefined && site.gableFanSealed === false)),
    );
    if (gableFans.length > 0) {
      findings.push({
        code: "gable-fan-unsealed",
        severity: "warning",
        title: "Gable fan not sealed to its opening",
        detail:
          "Gaps around a gable fan let it blow air in a circle, from the fan back into the attic, instead of out. Seal the fan to the louver opening with a shroud or a plywood baffle.",
        ventIds: gableFans.map((v) => v.id),
        caution: FAN_SAFETY_CAUTION,
      });
    }
  }

  // Exception and upper-vent position (IRC R806.2, per edition).
  if (requirement.exception.isAvailable && requirement.ratio === 150 && !meetsArea) {
    const wouldPass = meetsRequiredArea(provided.exactTotalSqIn, ctx.required300SqIn);
    const failed = requirement.exception.conditions.filter((c) => c.status === "not-met").map((c) => c.reason);
    findings.push({
      code: "exception-not-met",
      severity: wouldPass ? "warning" : "info",
      title: "The 1/300 exception does not apply",
      detail:
        (wouldPass
          ? `The ${formatNumber(provided.totalSqIn)} sq in provided would meet 1/300 (${formatNumber(ctx.required300SqIn)} sq in), but the exception's conditions are not met, so 1/150 applies. `
          : "Even the 1/300 route would need more vent area than is provided. ") +
        `What falls short: ${failed.join(" ")} To use 1/300, place 40–50 % of the vent area (50–80 % under IRC 2009) high near the ridge and the balance at the eaves, or meet the vapor-retarder condition where it applies.`,
      ventIds: [],
    });
  }
  if (requirement.otherReading !== null) {
    const other = requirement.otherReading;
    const chosenIsLiteral = requirement.upperShareBase === "required";
    findings.push({
      code: "upper-share-reading",
      severity: "info",
      title: chosenIsLiteral ? "Another reading of the 40–50 % rule" : "This company reads the 40–50 % rule locally",
      detail: chosenIsLiteral
        ? `The code text takes the upper-vent share as a percentage of the required area, and that is what Eavesight checks. Your building department may read it as a share of the vent area provided; under that reading the 1/300 route ${other.wouldBeMet ? "would be met" : "would not be met"}. ${other.reason} Ask the building department which reading it uses.`
        : `This company's setting takes the upper-vent share as a percentage of the vent area provided. Under the literal text (a percentage of the required area) the 1/300 route ${other.wouldBeMet ? "would be met" : "would not be met"}. ${other.reason}`,
      ventIds: [],
    });
  }
  for (const { vent, riseFt } of ctx.impossibleHeights ?? []) {
    const recorded =
      vent.heightAboveEaveFt !== undefined && vent.heightAboveEaveFt > riseFt
        ? `recorded ${formatNumber(vent.heightAboveEaveFt)} ft above the eaves`
        : `recorded ${formatNumber(vent.dropBelowRidgeFt ?? 0)} ft below the ridge`;
    findings.push({
      code: "vent-height-impossible",
      severity: "warning",
      title: "A vent's recorded height can't be right",
      detail: `${capitalize(ventListPhrase([vent]))} is ${recorded}, but the highest point of this space is only ${formatNumber(riseFt)} ft above the eaves (from the roof pitch and span). Check the measurement or the pitch; until then the vent is not counted as an upper vent for the 1/300 route.`,
      ventIds: [vent.id],
    });
  }
  if (requirement.tooLowUpperVentIds.length > 0) {
    const isIrc2009 = codeBasisRule(requirement.codeBasis) === "irc-2009";
    findings.push({
      code: "upper-vent-too-low",
      severity: requirement.exception.isMet ? "info" : "warning",
      title: "Upper vents too low to count as upper vents",
      detail:
        (isIrc2009
          ? "Under IRC 2009 the upper vents for the 1/300 route must be at least 3 ft above the eave vents; these are lower."
          : "For the 1/300 route the upper vents must be no more than 3 ft below the ridge, measured vertically; these are lower.") +
        " They still count toward the 1/150 total. Move exhaust up near the ridge (a ridge vent or vents within 3 ft of it) if the 1/300 route is wanted.",
      ventIds: requirement.tooLowUpperVentIds,
    });
  }
  if (requirement.unknownPositionVentIds.length > 0 && !requirement.exception.isMet) {
    findings.push({
      code: "upper-vent-position-unknown",
      severity: "info",
      title: "Upper vent position not recorded",
      detail:
        "Eavesight can't tell whether these vents are high enough for the 1/300 route. Record each vent's drop below the ridge (or the roof pitch and span with the vent's height above the eaves).",
      ventIds: requirement.unknownPositionVentIds,
    });
  }

  // Insulation at the eaves: IRC R806.3 (1 in air space) [S1, S2]; baffles per NREL SWS [S9].
  const eaveVents = passiveLower.filter((v) => EAVE_KINDS.has(v.kind));
  if (site.soffitsBlocked === true) {
    findings.push({
      code: "soffits-blocked",
      severity: "critical",
      title: "Insulation blocks the soffit vents",
      detail:
        "IRC R806.3 requires that insulation not block the free flow of air at eave vents, with at least a 1 in air space between insulation and roof sheathing. " +
        "Pull the insulation back and install baffles (vent chutes) in every rafter bay, reaching above the insulation; until then the soffit intake counts for little.",
      ventIds: ids(eaveVents),
      caution: ATTIC_SAFETY_CAUTION,
    });
  }
  // Vent condition: what is blocked counts for nothing; the finding says how much area is lost.
  const blockedVents = passive.filter((v) => v.openShare < 1);
  if (blockedVents.length > 0) {
    const lostSqIn = blockedVents.reduce((acc, v) => acc + (v.fullNfaSqIn - v.nfaSqIn), 0);
    const parts = blockedVents.map((v) => `${capitalize(ventListPhrase([v]))}: ${v.explanation.split("; ").slice(-1)[0]}`);
    const byInsulation = ctx.vents.some((v) => blockedVents.some((b) => b.ventId === v.id) && v.blockedBy === "insulation");
    findings.push({
      code: "vents-blocked",
      severity: "warning",
      title: "Some vents are blocked",
      detail:
        `${parts.join(". ")}. Blocked openings pass no air, so ${formatNumber(lostSqIn)} sq in of vent area is not counted. ` +
        (byInsulation
          ? "Pull the insulation back from the vents and fit baffles so it can't slide back (IRC R806.3 asks for at least 1 in of air space at the eaves)."
          : "Clear them (paint can usually be cut out of the slots; replace a vent that can't be opened)."),
      ventIds: blockedVents.map((v) => v.ventId),
      caution: ATTIC_SAFETY_CAUTION,
    });
  }
  const damaged = ctx.vents.filter((v) => v.condition === "damaged");
  if (damaged.length > 0) {
    findings.push({
      code: "vent-damaged",
      severity: "warning",
      title: "Damaged vents",
      detail:
        `${capitalize(ventListPhrase(damaged))} ${damaged.length === 1 ? "is" : "are"} damaged. A broken vent or torn screen lets rain, snow, birds and insects in; vent openings must keep them out (IRC R806.1: openings 1/16 to 1/4 in). Repair or replace ${damaged.length === 1 ? "it" : "them"}.`,
      ventIds: damaged.map((v) => v.id),
      caution: ROOF_SAFETY_CAUTION,
    });
  }

  if (site.bafflesPresent === false && eaveVents.length > 0 && site.soffitsBlocked !== true) {
    findings.push({
      code: "baffles-missing",
      severity: "warning",
      title: "No baffles at the eaves",
      detail:
        "Without baffles, insulation tends to slide over the soffit vents. Install a baffle in every rafter bay at the eaves, keeping at least a 1 in air space to the sheathing (IRC R806.3) and reaching above the insulation.",
      ventIds: ids(eaveVents),
      caution: ATTIC_SAFETY_CAUTION,
    });
  }
  if (site.bathFanIntoAttic === true) {
    findings.push({
      code: "bath-fan-into-attic",
      severity: "warning",
      title: "Bath fan exhausts into the attic",
      detail:
        "Moist bathroom air dumped into the attic condenses on the cold roof deck. Duct the fan to the outdoors through a roof or wall cap (not just toward a soffit vent), with insulated duct in cold climates. Wiring changes are for a licensed electrician.",
      ventIds: [],
      caution: ATTIC_SAFETY_CAUTION,
    });
  }
  if (site.kitchenOrDryerIntoAttic === true) {
    findings.push({
      code: "appliance-exhaust-into-attic",
      severity: "warning",
      title: "Kitchen or dryer exhaust into the attic",
      detail: "Grease- or lint-laden moist air must go outdoors. Duct the exhaust through a proper roof or wall cap as the appliance instructions require.",
      ventIds: [],
      caution: ATTIC_SAFETY_CAUTION,
    });
  }

  findings.push(
    ...wholeHouseFanFindings({
      wholeHouseFanCfm: provided.wholeHouseFanCfm,
      fanIds: ctx.perVent.filter((v) => v.isWholeHouseFan).map((v) => v.ventId),
      atticNfaSqIn: provided.exactTotalSqIn,
      hasAtmosphericAppliance: site.atmosphericCombustionAppliance,
      climateZone: ctx.climateZone ?? 4,
    }),
  );

  const oddLocation = passive.filter((v) => (EAVE_KINDS.has(v.kind) && v.location === "upper") || ((v.kind === "ridge" || v.kind === "off-ridge" || v.kind === "cupola" || v.kind === "turbine") && v.location === "lower"));
  if (oddLocation.length > 0) {
    findings.push({
      code: "vent-location-unusual",
      severity: "info",
      title: "Check where these vents are",
      detail: "These vents are recorded in an unusual place for their kind (for example a soffit vent as an upper vent). Check the survey: intake and exhaust totals depend on it.",
      ventIds: ids(oddLocation),
    });
  }
  return findings;
}

/** Site findings that hold whatever the assembly (moisture sources, fans and combustion safety). */
const ASSEMBLY_NEUTRAL_CODES: ReadonlySet<FindingCode> = new Set<FindingCode>(["bath-fan-into-attic", "appliance-exhaust-into-attic", "backdraft-risk", "powered-fan-depressurization", "whole-house-fan-operation"]);

/**
 * Findings for an unvented (sealed) attic, IRC R806.5 [SOURCES.md S7, S25]. Never "add vents": the
 * R806.5 conditions are checked instead, vents already open to the outside are flagged, and the
 * moisture and combustion findings that hold for any attic are kept.
 */
export function unventedFindings(ctx: FindingContext): Finding[] {
  const check = ctx.unvented;
  const findings: Finding[] = [];
  findings.push({
    code: "unvented-assembly",
    severity: "info",
    title: "Sealed (unvented) attic: no vents needed",
    detail:
      "The insulation is at the roof line, so this attic is meant to be sealed, not vented (IRC R806.5). It needs no vent area, and vents must not be added: outdoor air let into it would reach the cool side of the insulation and can condense there.",
    ventIds: [],
  });
  for (const condition of check?.conditions ?? []) {
    if (condition.status === "not-met") {
      findings.push({
        code: "unvented-condition-not-met",
        severity: "warning",
        title: "A sealed-attic condition is not met",
        detail: `${condition.reason} The fix is to the insulation or air barrier, not more vents: have the insulation contractor and the building department confirm it.`,
        ventIds: [],
        caution: ATTIC_SAFETY_CAUTION,
      });
    } else if (condition.status === "unknown") {
      findings.push({ code: "unvented-condition-unknown", severity: "info", title: "A sealed-attic condition was not recorded", detail: `${condition.reason} Record it so the check can be completed.`, ventIds: [] });
    }
  }
  const openings = ctx.vents;
  if (openings.length > 0) {
    findings.push({
      code: "vents-in-unvented-attic",
      severity: "warning",
      title: "Vents or fans open a sealed attic to the outside",
      detail: `${capitalize(ventListPhrase(openings))} ${openings.length === 1 ? "opens" : "open"} this sealed attic to outdoor air, which works against the insulation at the roof line. Don't add more. Whether to close ${openings.length === 1 ? "it" : "them"} off is a decision for the insulation contractor and the building department; a fan here pulls conditioned air out of the house.`,
      ventIds: openings.map((v) => v.id),
      caution: ROOF_SAFETY_CAUTION,
    });
  }
  // Combustion safety holds for a fan in any attic; sizing figures are not used by the neutral codes.
  const installedCfm = ctx.perVent.reduce((acc, v) => acc + (v.isPowered ? v.airflowCfm : 0), 0);
  const fan = ctx.fan ?? (installedCfm > 0 ? { installedCfm, recommendedCfm: installedCfm, intakeNeededSqIn: 0, intakeProvidedSqIn: 0 } : null);
  const neutral = ventilationFindings({ ...ctx, fan, unvented: null }).filter((f) => ASSEMBLY_NEUTRAL_CODES.has(f.code));
  return [...findings, ...neutral];
}
