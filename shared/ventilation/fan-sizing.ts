/**
 * Powered attic fan sizing. Guidance only — the IRC sets no cfm requirement for attic fans [from memory].
 * - Area method: 0.7 cfm per sq ft of attic floor, 15 % more for a dark roof or a steep roof
 *   (Home Ventilating Institute attic ventilation guidance) [SOURCES.md §3, S6].
 * - Air-change method: at least 10 air changes per hour of the attic volume (HVI) [S6].
 * - Intake: at least 1 sq ft of net free inlet area per 300 cfm of fan (HVI) [S6].
 * Eavesight recommends the larger of the two methods, the conservative choice
 * [SOURCES.md §8 E8].
 */
import { ceilWhole, formatNumber, SQ_IN_PER_SQ_FT } from "../units/format";

export const CFM_PER_SQ_FT = 0.7; // HVI
export const DARK_OR_STEEP_MULTIPLIER = 1.15; // HVI: +15 %
export const AIR_CHANGES_PER_HOUR = 10; // HVI
export const CFM_PER_SQ_FT_OF_INTAKE = 300; // HVI: 1 sq ft of inlet per 300 cfm
/**
 * "Steep" for the +15 %: pitch 7/12 or more. HVI does not define steep; 7/12 is where the JLC
 * field guide's pitch adjustment for passive vents begins [S11]. Common practice, not a rule.
 */
export const STEEP_PITCH_IN_12 = 7;
/**
 * How far the installed fan may fall below or rise above the recommendation before Eavesight
 * says so. Eavesight's own judgement (common practice, not a published rule).
 */
export const FAN_UNDERSIZED_BELOW = 0.75;
export const FAN_OVERSIZED_ABOVE = 1.5;

function roundedUp(exact: number, rounded: number, unit: string): string {
  return Math.abs(exact - rounded) > 1e-6 ? `, rounded up to ${formatNumber(rounded)} ${unit}` : "";
}

export interface FanSizing {
  areaMethodCfm: number;
  airChangeMethodCfm: number | null;
  recommendedCfm: number;
  isDarkOrSteep: boolean;
  reasons: string[];
}

/**
 * Intake NFA a fan needs: cfm ÷ 300 sq ft, in sq in rounded up.
 *
 * @example
 * // SOURCES.md §8 E6: 1,200 cfm ÷ 300 = 4 sq ft = 576 sq in
 * fanIntakeNeededSqIn(1200) // 576
 */
export function fanIntakeNeededSqIn(airflowCfm: number): number {
  return ceilWhole((airflowCfm / CFM_PER_SQ_FT_OF_INTAKE) * SQ_IN_PER_SQ_FT);
}

/**
 * Recommended fan airflow for an attic.
 *
 * @example
 * // SOURCES.md §8 E5: 1,800 sq ft, dark roof → 1,800 × 0.7 = 1,260 cfm; × 1.15 = 1,449 cfm
 * recommendFanCfm({ floorAreaSqFt: 1800, volumeCuFt: null, isDark: true, isSteep: false }).recommendedCfm // 1449
 */
export function recommendFanCfm(input: {
  floorAreaSqFt: number;
  volumeCuFt: number | null;
  isDark: boolean;
  isSteep: boolean;
  volumeUnknownReason?: string | undefined;
}): FanSizing {
  const { floorAreaSqFt, volumeCuFt, isDark, isSteep } = input;
  const isDarkOrSteep = isDark || isSteep;
  const exactBaseCfm = floorAreaSqFt * CFM_PER_SQ_FT;
  const exactAreaCfm = isDarkOrSteep ? exactBaseCfm * DARK_OR_STEEP_MULTIPLIER : exactBaseCfm;
  const areaMethodCfm = ceilWhole(exactAreaCfm);
  const reasons: string[] = [];
  const why = [isDark ? "a dark roof" : "", isSteep ? `a pitch of ${STEEP_PITCH_IN_12}/12 or steeper` : ""].filter(Boolean).join(" and ");
  reasons.push(
    `Area method (Home Ventilating Institute guidance): ${formatNumber(floorAreaSqFt)} sq ft × 0.7 cfm per sq ft = ${formatNumber(exactBaseCfm)} cfm` +
      (isDarkOrSteep ? `; 15 % more for ${why}: ${formatNumber(exactBaseCfm)} × 1.15 = ${formatNumber(exactAreaCfm)} cfm` : "") +
      roundedUp(exactAreaCfm, areaMethodCfm, "cfm") +
      ".",
  );
  let airChangeMethodCfm: number | null = null;
  if (volumeCuFt !== null) {
    const exactAchCfm = (volumeCuFt * AIR_CHANGES_PER_HOUR) / 60;
    airChangeMethodCfm = ceilWhole(exactAchCfm);
    reasons.push(
      `Air-change method (HVI: 10 air changes an hour): ${formatNumber(volumeCuFt)} cu ft × 10 ÷ 60 minutes = ${formatNumber(exactAchCfm)} cfm${roundedUp(exactAchCfm, airChangeMethodCfm, "cfm")}.`,
    );
  } else {
    reasons.push(`Air-change method not worked out: ${input.volumeUnknownReason ?? "the attic volume is unknown"}.`);
  }
  const recommendedCfm = Math.max(areaMethodCfm, airChangeMethodCfm ?? 0);
  reasons.push(`Recommended: the larger figure, ${formatNumber(recommendedCfm)} cfm.`);
  return { areaMethodCfm, airChangeMethodCfm, recommendedCfm, isDarkOrSteep, reasons };
}
