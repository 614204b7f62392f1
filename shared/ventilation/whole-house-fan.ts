/**
 * Whole-house fans: a ceiling fan that pulls house air — and outdoor air through open windows —
 * up INTO the attic, so the attic's vents (all of them, a ridge vent included) are its outlet.
 * - Outlet area: at least 1 sq ft of attic net free area per 750 cfm of rated airflow, or the
 *   manufacturer's figure if larger (California Energy Code §150.1(c)12(B), 2022 and 2025 editions
 *   [SOURCES.md S33, read in a secondary summary]). Manufacturers often ask for 1 sq ft per 500 cfm
 *   [S34]: shown as a recommendation, not code.
 * - It must run only with windows open; with them shut it depressurizes the house and can pull
 *   flue gases from natural-draft appliances [common practice; S13, S14 for depressurization].
 * Nothing here ever asks to close a vent: an attic with a whole-house fan needs its vents.
 */
import { COMBUSTION_SAFETY_CAUTION } from "../diagnostics/cautions";
import { formatNumber, SQ_IN_PER_SQ_FT } from "../units/format";
import type { Finding } from "./findings";

/** cfm per sq ft of attic outlet NFA (California Energy Code §150.1(c)12(B)) [S33]. */
export const WHOLE_HOUSE_FAN_CFM_PER_SQ_FT_OF_OUTLET = 750;
/** cfm per sq ft that fan makers commonly ask for (above the code figure) [S34, common practice]. */
export const WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT = 500;

/**
 * Attic outlet NFA a whole-house fan needs, exact sq in.
 *
 * @example
 * wholeHouseFanOutletSqIn(4500) // 864 (4,500 ÷ 750 = 6 sq ft × 144)
 */
export function wholeHouseFanOutletSqIn(airflowCfm: number, cfmPerSqFt: number = WHOLE_HOUSE_FAN_CFM_PER_SQ_FT_OF_OUTLET): number {
  return (airflowCfm / cfmPerSqFt) * SQ_IN_PER_SQ_FT;
}

export function wholeHouseFanFindings(input: {
  wholeHouseFanCfm: number;
  fanIds: string[];
  /** All the attic's passive vent area (every vent is an outlet for this fan), exact sq in. */
  atticNfaSqIn: number;
  hasAtmosphericAppliance: boolean | undefined;
  climateZone: number;
}): Finding[] {
  const { wholeHouseFanCfm: cfm, fanIds } = input;
  if (cfm <= 0) return [];
  const findings: Finding[] = [];
  const neededSqIn = wholeHouseFanOutletSqIn(cfm);
  const recommendedSqIn = wholeHouseFanOutletSqIn(cfm, WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT);
  const arithmetic = `${formatNumber(cfm)} cfm ÷ 750 = ${formatNumber(cfm / 750, { maxFractionDigits: 3 })} sq ft = ${formatNumber(neededSqIn)} sq in`;
  if (input.atticNfaSqIn < neededSqIn) {
    findings.push({
      code: "whole-house-fan-outlet-short",
      severity: "warning",
      title: "Not enough attic vent area for the whole-house fan",
      detail:
        `A whole-house fan blows house air into the attic, and the attic's vents — every one, the ridge vent included — must let it out: at least 1 sq ft of net free area per 750 cfm (California Energy Code §150.1(c)12(B)), ${arithmetic}; the attic has ${formatNumber(input.atticNfaSqIn)} sq in. ` +
        "Without it the fan pushes hot attic air back into the house and moves less air. Add attic vent area (keep every vent open), or follow the fan maker's figure if it asks for more.",
      ventIds: fanIds,
    });
  }
  findings.push({
    code: "whole-house-fan-operation",
    severity: input.hasAtmosphericAppliance === true ? "critical" : "info",
    title: "Whole-house fan: windows open whenever it runs",
    detail:
      `This whole-house fan (${formatNumber(cfm)} cfm) cools by pulling outdoor air in through open windows and pushing it out through the attic vents, so keep the attic vents open — never close a ridge or other vent for it. ` +
      `Run it only with windows open: with them shut it pulls air down chimneys and flues.` +
      (input.hasAtmosphericAppliance === true ? " This house has a natural-draft gas or oil appliance, so that can pull exhaust (carbon monoxide) into the house. " + COMBUSTION_SAFETY_CAUTION : "") +
      ` Fan makers commonly ask for 1 sq ft of attic vent per 500 cfm, ${formatNumber(recommendedSqIn)} sq in here (a recommendation above the code figure).` +
      (input.climateZone >= 4 ? " In the heating season cover or seal its ceiling shutter, which otherwise leaks warm, moist house air into the attic (common practice)." : ""),
    ventIds: fanIds,
    caution: COMBUSTION_SAFETY_CAUTION,
  });
  return findings;
}

