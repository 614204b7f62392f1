/**
 * Attic air volume and rise from roof form and pitch, for the air-change method of fan sizing
 * (HVI: at least 10 air changes per hour [SOURCES.md §3, S6]) and for the 2009 rule's
 * "3 ft above the eave vents" test.
 *
 * Geometry (plan rectangle L along the ridge × W across it, pitch p inches of rise per 12 in of run):
 * - gable: two slopes meeting at a ridge over the middle of W. Rise = (W / 2) × p / 12. The
 *   cross-section is a triangle W wide and rise high, so volume = ½ × W × rise × L.
 * - hip: four slopes of the same pitch; the ridge is L − W long (L ≥ W). Rise = (W / 2) × p / 12.
 *   Volume = gable prism over the ridge part plus a pyramid made of the two hip ends:
 *   ½ W·rise·(L − W) + ⅓ W²·rise = W·rise·(3L − W) / 6. When L = W it is a pyramid (⅓ W²·rise).
 * - shed: one slope rising across the whole W. Rise = W × p / 12; volume = ½ × W × rise × L.
 *
 * For a polygon or an entered area the span across the slope must be given (`spanFt`); the
 * volume is then area × mean height, with mean height rise/2 (gable, shed) or, for a hip, the
 * mean height of an equivalent rectangle of that span. That is an approximation; it is exact for
 * rectangles. Volume is measured to the underside of the roof from the attic floor, ignoring
 * framing and any knee walls — good enough for a rule of thumb that is itself approximate.
 */
import type { SectionShape } from "./floor-area";
import { sectionAreaSqFt } from "./floor-area";

export type RoofForm = "gable" | "hip" | "shed";

export interface RoofGeometry {
  roofForm?: RoofForm | undefined;
  pitchIn12?: number | undefined;
  /** Horizontal distance across the slope(s), eave to eave (gable, hip) or low to high eave (shed). */
  spanFt?: number | undefined;
}

export type SectionWithRoof = SectionShape & RoofGeometry;

export type GeometryResult =
  | { isKnown: true; riseFt: number; volumeCuFt: number; explanation: string }
  | { isKnown: false; reason: string };

/** The span across the slope: `spanFt` if given, else the rectangle's width (hip: the shorter side). */
export function sectionSpanFt(section: SectionWithRoof): number | null {
  if (section.spanFt !== undefined) return section.spanFt;
  if (section.kind !== "rect") return null;
  if (section.roofForm === "hip") return Math.min(section.lengthFt, section.widthFt);
  return section.widthFt;
}

/**
 * Rise from the attic floor at the eave to the ridge (or high side of a shed).
 *
 * @example
 * sectionRiseFt({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 }) // 7.5
 */
export function sectionRiseFt(section: SectionWithRoof): number | null {
  if (section.roofForm === undefined || section.pitchIn12 === undefined) return null;
  const spanFt = sectionSpanFt(section);
  if (spanFt === null) return null;
  const runFt = section.roofForm === "shed" ? spanFt : spanFt / 2;
  return (runFt * section.pitchIn12) / 12;
}

/**
 * Volume of one section's attic space, or why it can't be known.
 *
 * @example
 * // SOURCES.md §8 E8: 30 × 40 ft gable at 6:12 → rise 7.5 ft, ½ × 30 × 7.5 × 40 = 4,500 cu ft
 * sectionGeometry({ kind: "rect", lengthFt: 40, widthFt: 30, roofForm: "gable", pitchIn12: 6 })
 * // { isKnown: true, riseFt: 7.5, volumeCuFt: 4500, ... }
 */
export function sectionGeometry(section: SectionWithRoof, fmt: (n: number) => string = String): GeometryResult {
  if (section.roofForm === undefined) return { isKnown: false, reason: "the roof form (gable, hip or shed) was not recorded" };
  if (section.pitchIn12 === undefined) return { isKnown: false, reason: "the roof pitch was not recorded" };
  const spanFt = sectionSpanFt(section);
  const riseFt = sectionRiseFt(section);
  if (spanFt === null || riseFt === null) {
    return { isKnown: false, reason: "the span across the roof slope was not recorded for this outline" };
  }
  const areaSqFt = sectionAreaSqFt(section);
  const form = section.roofForm;
  if (section.kind === "rect" && section.spanFt === undefined) {
    const longFt = Math.max(section.lengthFt, section.widthFt);
    const alongRidgeFt = form === "hip" ? longFt : section.lengthFt;
    if (form === "hip") {
      const volumeCuFt = (spanFt * riseFt * (3 * alongRidgeFt - spanFt)) / 6;
      return {
        isKnown: true,
        riseFt,
        volumeCuFt,
        explanation: `hip roof: rise ${fmt(spanFt)} ft ÷ 2 × ${fmt(section.pitchIn12)}/12 = ${fmt(riseFt)} ft; volume ${fmt(spanFt)} × ${fmt(riseFt)} × (3 × ${fmt(alongRidgeFt)} − ${fmt(spanFt)}) ÷ 6 = ${fmt(volumeCuFt)} cu ft`,
      };
    }
    const volumeCuFt = 0.5 * spanFt * riseFt * alongRidgeFt;
    const riseText = form === "shed" ? `${fmt(spanFt)} ft` : `${fmt(spanFt)} ft ÷ 2`;
    return {
      isKnown: true,
      riseFt,
      volumeCuFt,
      explanation: `${form} roof: rise ${riseText} × ${fmt(section.pitchIn12)}/12 = ${fmt(riseFt)} ft; volume ½ × ${fmt(spanFt)} × ${fmt(riseFt)} × ${fmt(alongRidgeFt)} = ${fmt(volumeCuFt)} cu ft`,
    };
  }
  // Outline or entered area with a given span: area × mean height.
  let meanHeightFt = riseFt / 2;
  if (form === "hip") {
    // Equivalent rectangle of the same area and span; a hip no longer than wide is a pyramid.
    const alongRidgeFt = Math.max(areaSqFt / spanFt, spanFt);
    meanHeightFt = (riseFt * (3 * alongRidgeFt - spanFt)) / (6 * alongRidgeFt);
  }
  const volumeCuFt = areaSqFt * meanHeightFt;
  return {
    isKnown: true,
    riseFt,
    volumeCuFt,
    explanation: `${form} roof over ${fmt(areaSqFt)} sq ft, span ${fmt(spanFt)} ft at ${fmt(section.pitchIn12)}/12: rise ${fmt(riseFt)} ft, mean height about ${fmt(meanHeightFt)} ft, volume about ${fmt(volumeCuFt)} cu ft`,
  };
}
