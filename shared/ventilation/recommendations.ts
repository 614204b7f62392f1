/**
 * Above the minimum: common-practice recommendations shown beside the code figure, each marked as
 * a recommendation with its source — never as code, never part of the verdict.
 * - Steep roofs: 20 % more net free area for pitches from 7/12 to 10/12, 30 % more above 10/12
 *   (JLC field guide, labelled "recommended practice") [SOURCES.md S11].
 * - Intake a little above exhaust (BC Housing; HVI) [S18, S6].
 * - An airtight ceiling matters more for attic moisture than extra vent area [S12, S7].
 * - Whole-house fans: 1 sq ft of attic vent per 500 cfm, as fan makers commonly ask [S34].
 */
import { ceilWhole, formatNumber } from "../units/format";
import { WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT, wholeHouseFanOutletSqIn } from "./whole-house-fan";

export interface Recommendation {
  id: "steep-roof-extra-area" | "intake-above-exhaust" | "air-seal-ceiling" | "whole-house-fan-maker-area";
  title: string;
  detail: string;
  /** The area recommended, sq in (rounded up), when the recommendation is an area. */
  recommendedSqIn: number | null;
  /** Where it comes from; always "common practice", never code. */
  source: string;
  isCode: false;
}

export const STEEP_EXTRA_FROM_PITCH_IN_12 = 7;
export const VERY_STEEP_ABOVE_PITCH_IN_12 = 10;

/**
 * @example
 * // 1,440 sq in required, 8/12 pitch → 1,440 × 1.2 = 1,728 sq in recommended
 * aboveMinimum({ requiredExactSqIn: 1440, maxPitchIn12: 8, wholeHouseFanCfm: 0, ceilingAirSealed: true, isUnvented: false })[0]?.recommendedSqIn // 1728
 */
export function aboveMinimum(input: { requiredExactSqIn: number; maxPitchIn12: number | null; wholeHouseFanCfm: number; ceilingAirSealed: boolean | undefined; isUnvented: boolean }): Recommendation[] {
  const out: Recommendation[] = [];
  if (input.isUnvented) return out; // a sealed attic gets no vents, recommended or required
  const pitch = input.maxPitchIn12;
  if (pitch !== null && pitch >= STEEP_EXTRA_FROM_PITCH_IN_12 && input.requiredExactSqIn > 0) {
    const factor = pitch > VERY_STEEP_ABOVE_PITCH_IN_12 ? 1.3 : 1.2;
    const exact = input.requiredExactSqIn * factor;
    out.push({
      id: "steep-roof-extra-area",
      title: "More vent area for a steep roof (recommended, not code)",
      detail: `A ${formatNumber(pitch)}/12 roof holds a tall attic; roofing guides recommend ${formatNumber((factor - 1) * 100)} % more vent area than the code minimum: ${formatNumber(input.requiredExactSqIn)} × ${formatNumber(factor)} = ${formatNumber(exact)} sq in. This is common practice (JLC field guide), not a code requirement.`,
      recommendedSqIn: ceilWhole(exact),
      source: "Common practice: JLC Roof Ventilation Field Guide (recommended practice)",
      isCode: false,
    });
  }
  if (input.requiredExactSqIn > 0) {
    out.push({
      id: "intake-above-exhaust",
      title: "A little more intake than exhaust (recommended, not code)",
      detail: "Put slightly more of the vent area low at the eaves than high on the roof, so the attic is never pulled below the house's pressure and drawing house air through ceiling leaks. Common practice (BC Housing, HVI), not a code requirement.",
      recommendedSqIn: null,
      source: "Common practice: BC Housing; Home Ventilating Institute",
      isCode: false,
    });
  }
  if (input.ceilingAirSealed !== true) {
    out.push({
      id: "air-seal-ceiling",
      title: "Air-seal the ceiling (recommended, not code)",
      detail: "Most attic moisture comes up from the house through gaps at light fixtures, top plates and the hatch. Sealing them does more for a dry attic than extra vents. Common practice, not a code requirement.",
      recommendedSqIn: null,
      source: "Common practice: JLC Q&A on roof venting (citing W. B. Rose)",
      isCode: false,
    });
  }
  if (input.wholeHouseFanCfm > 0) {
    const exact = wholeHouseFanOutletSqIn(input.wholeHouseFanCfm, WHOLE_HOUSE_FAN_RECOMMENDED_CFM_PER_SQ_FT);
    out.push({
      id: "whole-house-fan-maker-area",
      title: "Whole-house fan: the makers' vent area (recommended)",
      detail: `Fan makers commonly ask for 1 sq ft of attic vent per 500 cfm: ${formatNumber(input.wholeHouseFanCfm)} ÷ 500 = ${formatNumber(input.wholeHouseFanCfm / 500, { maxFractionDigits: 3 })} sq ft = ${formatNumber(exact)} sq in, more than the energy code's 1 per 750 cfm. Follow the installation instructions of the fan.`,
      recommendedSqIn: ceilWhole(exact),
      source: "Manufacturers' installation instructions (common practice)",
      isCode: false,
    });
  }
  return out;
}
