/**
 * Findings in a homeowner's words: the core's titles are written for the trade ("Powered fan
 * with passive exhaust"); a proposal says what that means for the house. The core's `detail`
 * (the rule, the numbers) is kept as it is. Codes without an entry keep the core's title.
 */
import type { Finding } from "../ventilation/findings";
import type { SnapshotFinding } from "./types";

const HOMEOWNER_TITLES: Readonly<Record<string, string>> = {
  "below-minimum": "The attic has less ventilation than the building code asks for",
  "no-intake": "Fresh air has no way in at the eaves",
  "no-exhaust": "Warm, damp air has no way out near the top of the roof",
  "exhaust-exceeds-intake": "More air is let out at the top than can come in at the eaves",
  "powered-with-passive-exhaust": "The attic fan pulls outside air in through the roof vents instead of through the eaves",
  "mixed-exhaust": "Two kinds of roof vent are working against each other",
  "gable-with-ridge": "The gable vents and the ridge vent are working against each other",
  "fan-intake-short": "The attic fan does not have enough openings to draw air from",
  "fan-undersized": "The attic fan is small for the size of the attic",
  "fan-oversized": "The attic fan is larger than the attic needs",
  "backdraft-risk": "The attic fan could pull exhaust from a gas appliance back into the house",
  "exception-not-met": "The attic does not qualify for the reduced vent amount",
  "upper-vent-too-low": "Some roof vents sit too low to count as top vents",
  "gable-fan-unsealed": "The gable fan is not sealed to its opening, so it stirs the same air",
  "soffits-blocked": "Insulation is blocking the vents under the eaves",
  "baffles-missing": "There are no baffles to keep insulation away from the eave vents",
  "bath-fan-into-attic": "A bathroom fan blows damp air into the attic",
  "appliance-exhaust-into-attic": "An appliance vents into the attic",
  "powered-fan-depressurization": "The attic fan can draw air out of the rooms below",
  "upper-vent-position-unknown": "We could not confirm how high some roof vents sit",
  "vent-location-unusual": "A vent sits in an unusual place",
  "meets-minimum-narrowly": "The attic meets the code's ventilation amount, with almost nothing to spare",
  "upper-share-reading": "Building departments read one part of the vent rule in two ways",
  "vent-height-impossible": "One vent's recorded height needs checking",
  "vents-blocked": "Some vents are blocked, so they let no air through",
  "vent-damaged": "Some vents are damaged and can let in rain or animals",
  "unvented-assembly": "This attic is sealed on purpose and needs no vents",
  "unvented-condition-not-met": "Part of the sealed attic's insulation needs attention",
  "unvented-condition-unknown": "We still need to check part of the sealed attic's insulation",
  "vents-in-unvented-attic": "Vents let outside air into an attic that is meant to be sealed",
  "whole-house-fan-outlet-short": "The attic doesn't have enough vents to let the whole-house fan's air out",
  "whole-house-fan-operation": "Open windows whenever the whole-house fan runs",
  "fan-control-cold-climate": "The attic fan's control can pull damp house air into the attic in winter",
  "fan-set-point-unusual": "The attic fan's temperature setting is unusual",
  "fan-override-untested": "We have not yet seen the attic fan run",
  "fan-override-failed": "The attic fan did not start when switched on",
  "fan-winding-shorted": "The attic fan's motor has a short circuit",
  "fan-winding-grounded": "The attic fan's motor leaks electricity to its metal frame",
  "fan-capacitor-failed": "A part that helps the fan motor start has worn out",
  "fan-lockout-missing": "The fan checks were stopped: the power was not locked off",
  "fan-tester-not-proven": "The fan checks were stopped: the tester was not proven first",
};

/** The gentler title, or the core's own when there is none. */
export function homeownerTitle(code: string, coreTitle: string): string {
  return HOMEOWNER_TITLES[code] ?? coreTitle;
}

/**
 * @example
 * toHomeownerFinding({ code: "soffits-blocked", severity: "critical", title: "Soffit vents blocked", detail: "…", ventIds: [] }).title
 * // "Insulation is blocking the vents under the eaves"
 */
export function toHomeownerFinding(finding: Pick<Finding, "code" | "severity" | "title" | "detail">): SnapshotFinding {
  return { code: finding.code, severity: finding.severity, title: homeownerTitle(finding.code, finding.title), detail: finding.detail };
}
