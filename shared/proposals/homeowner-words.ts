/**
 * Findings in a homeowner's words. The core's titles and details are written for the trade
 * ("Powered fan with passive exhaust", "the winding reads open (OL)"); a proposal first says in
 * one plain sentence what the finding means for the house, and keeps the core's detail (the
 * rule, the numbers) folded away beside it, without the technician's safety instructions.
 *
 * Codes the homeowner never sees are the technician's own checks (power verified off, a winding
 * that reads normally). A code this file does not know (the core grows) keeps the core's title
 * and no plain sentence, so nothing is hidden and nothing is made up.
 */
import { ATTIC_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION, ROOF_SAFETY_CAUTION } from "../diagnostics/cautions";
import type { Finding } from "../ventilation/findings";
import type { SnapshotFinding } from "./types";

interface HomeownerWords {
  /** A short heading. */
  title: string;
  /** What it means for the house, in one sentence that stands alone. */
  plain: string;
}

const WORDS: Readonly<Record<string, HomeownerWords>> = {
  "below-minimum": { title: "The attic has less ventilation than the building code asks for", plain: "Too little air moves through the attic, so heat builds up in summer and moisture can collect on the roof deck in winter." },
  "no-intake": { title: "Fresh air has no way in at the eaves", plain: "Without openings low at the eaves, the roof vents have no fresh air to replace what they let out." },
  "no-exhaust": { title: "Warm, damp air has no way out near the top of the roof", plain: "Hot, damp air rises to the top of the attic and stays there, because there is no vent high on the roof to let it out." },
  "exhaust-exceeds-intake": { title: "More air is let out at the top than can come in at the eaves", plain: "The roof vents can pull in rain, snow or air from the house when the eaves do not let in enough fresh air to feed them." },
  "powered-with-passive-exhaust": { title: "The attic fan pulls outside air in through the roof vents instead of through the eaves", plain: "The fan and the roof vent sit close together, so the fan mostly draws air through the nearby roof vent and the rest of the attic stays hot." },
  "mixed-exhaust": { title: "Two kinds of roof vent are working against each other", plain: "When two kinds of roof vent share an attic, one can draw air in through the other instead of from the eaves, leaving most of the attic unvented." },
  "gable-with-ridge": { title: "The gable vents and the ridge vent are working against each other", plain: "Air can flow from the gable vents straight out of the ridge vent, bypassing the eaves and the lower part of the roof." },
  "fan-intake-short": { title: "The attic fan does not have enough openings to draw air from", plain: "A fan that cannot get enough fresh air from the eaves pulls air from the house instead, which wastes cooled air and can draw in fumes." },
  "fan-undersized": { title: "The attic fan is small for the size of the attic", plain: "The fan moves less air than an attic this size needs, so it runs a long time without cooling the attic much." },
  "fan-oversized": { title: "The attic fan is larger than the attic needs", plain: "A fan bigger than the attic needs pulls harder on the house below and costs more to run." },
  "backdraft-risk": { title: "The attic fan could pull exhaust from a gas appliance back into the house", plain: "A powered attic fan can lower the air pressure in the house enough to pull exhaust, including carbon monoxide, from a gas water heater or furnace back inside." },
  "exception-not-met": { title: "The attic does not qualify for the reduced vent amount", plain: "The code allows half the venting only when certain conditions are met; this house does not meet them, so the full amount applies." },
  "upper-vent-too-low": { title: "Some roof vents sit too low to count as top vents", plain: "A roof vent placed too far below the ridge acts more like an intake than an exhaust, so it cannot be counted as letting warm air out." },
  "gable-fan-unsealed": { title: "The gable fan is not sealed to its opening, so it stirs the same air", plain: "Air leaks around the fan and is blown straight back in, so the fan runs without clearing the attic." },
  "soffits-blocked": { title: "Insulation is blocking the vents under the eaves", plain: "Fresh air cannot get in at the eaves because insulation covers the vents, so the attic does not breathe as it should." },
  "baffles-missing": { title: "There are no baffles to keep insulation away from the eave vents", plain: "Without baffles, insulation can slide against the eave vents over time and block the fresh air coming in." },
  "bath-fan-into-attic": { title: "A bathroom fan blows damp air into the attic", plain: "Shower steam blown into the attic condenses on the cold roof deck, which can lead to mould and rot; it should be ducted outside through a roof or wall cap." },
  "appliance-exhaust-into-attic": { title: "An appliance vents into the attic", plain: "A kitchen or dryer exhaust that ends in the attic leaves grease, lint or moisture there; it should be ducted to the outside." },
  "powered-fan-depressurization": { title: "The attic fan can draw air out of the rooms below", plain: "A powered attic fan pulls some air from the house through ceiling gaps, which wastes heating and cooling and can affect gas appliances." },
  "upper-vent-position-unknown": { title: "We could not confirm how high some roof vents sit", plain: "The height of some roof vents was not measured, so we counted them cautiously." },
  "vent-location-unusual": { title: "A vent sits in an unusual place", plain: "One vent sits where that kind of vent does not usually go, so it may not work as intended." },
  "fan-winding-open": { title: "The attic fan's motor has failed", plain: "The fan's motor has burned out and cannot run; it would need a new motor or a new fan." },
  "fan-winding-suspect": { title: "The attic fan's motor may be failing", plain: "A test of the fan's motor gave an unusual reading, so the motor may fail soon." },
  "fan-bearings-seized": { title: "The attic fan is stuck", plain: "The fan blade does not turn freely, so the fan cannot move air even when it has power." },
  "fan-thermostat-failed": { title: "The attic fan's thermostat does not work", plain: "The switch that turns the fan on and off with the attic temperature has failed, so the fan either never runs or never stops." },
  "fan-thermostat-inconclusive": { title: "We could not confirm that the fan's thermostat works", plain: "A test of the switch that turns the fan on and off was not clear, so it may need a closer look." },
  "meets-minimum-narrowly": { title: "The attic meets the code's ventilation amount, with almost nothing to spare", plain: "The vents add up to the code minimum, but only just: a vent blocked later by insulation or debris would put the attic below it." },
  "upper-share-reading": { title: "Building departments read one part of the vent rule in two ways", plain: "One part of the vent rule is read two ways by different building departments; we followed the reading your contractor uses, and the other is noted for the inspector." },
  "vent-height-impossible": { title: "One vent's recorded height needs checking", plain: "A vent was recorded higher than the roof itself, so it was left out of the figures until it is measured again." },
  "vents-blocked": { title: "Some vents are blocked, so they let no air through", plain: "Blocked or painted-over vents look open from outside but let no air through, so the attic gets less fresh air than it seems." },
  "vent-damaged": { title: "Some vents are damaged and can let in rain or animals", plain: "A damaged vent can let rain, snow, birds or insects into the attic and should be repaired or replaced." },
  "unvented-assembly": { title: "This attic is sealed on purpose and needs no vents", plain: "Your attic is insulated at the roof deck and sealed on purpose, so it is kept inside the house's envelope and must not be vented." },
  "unvented-condition-not-met": { title: "Part of the sealed attic's insulation needs attention", plain: "A sealed attic stays dry only when its insulation meets certain rules; one of them is not met yet, which can let moisture collect under the roof." },
  "unvented-condition-unknown": { title: "We still need to check part of the sealed attic's insulation", plain: "We could not yet confirm every rule a sealed attic must meet, so one more look is needed before anything is changed." },
  "vents-in-unvented-attic": { title: "Vents let outside air into an attic that is meant to be sealed", plain: "Vents in a sealed attic let humid outside air reach the cold roof deck, where it can condense; they should be closed, not added to." },
  "whole-house-fan-outlet-short": { title: "The attic doesn't have enough vents to let the whole-house fan's air out", plain: "A whole-house fan pushes a lot of house air into the attic; without enough roof and eave vents that air pushes back into the house or stays in the attic." },
  "whole-house-fan-operation": { title: "Open windows whenever the whole-house fan runs", plain: "A whole-house fan must draw its air through open windows; run with the windows closed, it can pull fumes from a gas appliance or fireplace into the house." },
  "fan-control-cold-climate": { title: "The attic fan's control can pull damp house air into the attic in winter", plain: "A fan run by a humidity switch, or always on, pulls warm, moist house air into a cold attic in winter, where it can condense on the roof deck." },
  "fan-set-point-unusual": { title: "The attic fan's temperature setting is unusual", plain: "The fan's thermostat is set far from the usual setting, so it runs much more, or much less, than intended." },
  "fan-override-failed": { title: "The attic fan did not start when switched on", plain: "The fan did not start when it was switched on by hand, so it is not moving any air." },
  "fan-winding-shorted": { title: "The attic fan's motor has a short circuit", plain: "The fan's motor has failed electrically and should not be run; it needs a new motor or a new fan." },
  "fan-winding-grounded": { title: "The attic fan's motor leaks electricity to its metal frame", plain: "The fan's motor is unsafe to run until an electrician has replaced it or the fan." },
  "fan-capacitor-failed": { title: "A part that helps the fan motor start has worn out", plain: "A worn starting part keeps the fan from starting or running at full speed; it can be replaced." },
};

/** The technician's own checks: they say how the survey was done, not what is wrong with the house. */
const TECHNICIAN_ONLY_CODES: ReadonlySet<string> = new Set([
  "fan-power-verified", "fan-power-not-verified", "fan-winding-ok", "fan-bearings-ok", "fan-thermostat-ok",
  "fan-override-untested", "fan-lockout-missing", "fan-tester-not-proven",
]);

/** Findings whose technical detail is a meter reading and a repair instruction for the technician: the homeowner gets the plain sentence alone. */
const TECHNICIAN_DETAIL_CODES: ReadonlySet<string> = new Set([
  "fan-winding-open", "fan-winding-suspect", "fan-bearings-seized", "fan-thermostat-failed", "fan-thermostat-inconclusive",
  "fan-winding-shorted", "fan-winding-grounded", "fan-capacitor-failed",
]);

/** Cautions written for whoever does the work; a homeowner's copy of a finding leaves them out. */
const TECHNICIAN_CAUTIONS = [LIVE_VOLTAGE_TEST_CAUTION, FAN_SAFETY_CAUTION, ATTIC_SAFETY_CAUTION, ROOF_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION];

/** The gentler title, or the core's own when there is none. */
export function homeownerTitle(code: string, coreTitle: string): string {
  return WORDS[code]?.title ?? coreTitle;
}

/** One plain sentence on what the finding means for the house, or null for a code without one. */
export function homeownerSentence(code: string): string | null {
  return WORDS[code]?.plain ?? null;
}

export function isShownToHomeowner(code: string): boolean {
  return !TECHNICIAN_ONLY_CODES.has(code);
}

/** The detail without the safety instructions meant for the person doing the work. */
export function withoutTechnicianCautions(detail: string): string {
  let text = detail;
  for (const caution of TECHNICIAN_CAUTIONS) text = text.split(caution).join("");
  return text.replace(/[ \t]{2,}/g, " ").trim();
}

/** The technical note a homeowner may unfold: the rule and the arithmetic, never a meter reading or a technician's safety steps ("" when there is none). */
export function homeownerDetail(code: string, detail: string): string {
  return TECHNICIAN_DETAIL_CODES.has(code) ? "" : withoutTechnicianCautions(detail);
}

/** An option's notes as the homeowner reads them: the generator's crew cautions left out (the proposal has its own safety section); null when nothing is left. */
export function homeownerNotes(notes: string | null): string | null {
  if (!notes) return null;
  const text = withoutTechnicianCautions(notes).replace(/\n{3,}/g, "\n\n").trim();
  return text === "" ? null : text;
}

/**
 * @example
 * toHomeownerFinding({ code: "soffits-blocked", severity: "critical", title: "Soffit vents blocked", detail: "…", ventIds: [] }).title
 * // "Insulation is blocking the vents under the eaves"
 */
export function toHomeownerFinding(finding: Pick<Finding, "code" | "severity" | "title" | "detail">): SnapshotFinding {
  return {
    code: finding.code,
    severity: finding.severity,
    title: homeownerTitle(finding.code, finding.title),
    plain: homeownerSentence(finding.code),
    detail: homeownerDetail(finding.code, finding.detail),
  };
}

/** What a homeowner reads of a snapshot's findings: their checks left out, each with its plain sentence (older snapshots have none stored). */
export function homeownerFindings<T extends SnapshotFinding>(findings: readonly T[]): (T & { plain: string | null })[] {
  return findings
    .filter((f) => isShownToHomeowner(f.code))
    .map((f) => ({ ...f, title: homeownerTitle(f.code, f.title), plain: f.plain ?? homeownerSentence(f.code), detail: homeownerDetail(f.code, f.detail) }));
}
