/**
 * How much roof a design can use: ridge length for a ridge vent, the band near the ridge for
 * static vents, and eave length for soffit intake. Recorded lengths win; otherwise they are
 * estimated from rectangular sections and the estimate is said in words.
 *
 * Estimates (plan rectangle L along the ridge × W across it):
 * - ridge: gable and shed L; hip |L − W| (the hip ridge, as in shared/ventilation/attic-volume.ts);
 * - eave: gable 2 × L (the two long eaves; gable ends have rakes, not eaves); hip 2 × (L + W)
 *   (eaves all round); shed L (the low eave only).
 *   Polygons and entered areas give no estimate: measure on site.
 *
 * Rules of thumb used (common practice, from memory; the product's instructions win):
 * - a ridge vent stops about 6 in short of each end of its ridge (RIDGE_VENT_END_CLEARANCE_FT);
 * - static (box) vents sit in a row close under the ridge, about one per 4 ft along the roof
 *   (STATIC_VENT_SPACING_FT), centred 1.5 ft below the ridge measured vertically
 *   (STATIC_VENT_DROP_FT), which keeps them inside the 3 ft of the 1/300 rule (IRC R806.2);
 * - individual soffit vents go one per rafter bay (rafter spacing, default 24 in on centre).
 */
import type { SpaceSurvey } from "../schemas/survey";
import type { Section } from "../ventilation/schema";
import { formatNumber } from "../units/format";
import type { RoofForm } from "../ventilation/index";

export const RIDGE_VENT_END_CLEARANCE_FT = 0.5;
export const STATIC_VENT_SPACING_FT = 4;
export const STATIC_VENT_DROP_FT = 1.5;
/** Pitches flatter than this are treated as this when laying out the band under the ridge. */
export const MIN_LAYOUT_PITCH_IN_12 = 2;
export const DEFAULT_RAFTER_SPACING_IN = 24;

export interface LengthEstimate {
  lengthFt: number | null;
  source: "recorded" | "estimated" | "unknown";
  /** How the figure was found, in words. */
  explanation: string;
}

export interface RoofConstraints {
  form: RoofForm;
  pitchIn12: number;
  /** Separate ridges (one per section when estimated; at least 1). */
  ridgeCount: number;
  ridge: LengthEstimate;
  eave: LengthEstimate;
}

const formOf = (section: Section, space: SpaceSurvey): RoofForm => section.roofForm ?? space.roof.form;

function estimate(space: SpaceSurvey, what: "ridge" | "eave"): LengthEstimate {
  if (space.sections.length === 0) return { lengthFt: null, source: "unknown", explanation: `No sections are recorded, so the ${what} length is unknown.` };
  const parts: string[] = [];
  let totalFt = 0;
  for (const section of space.sections) {
    const form = formOf(section, space);
    if (section.kind !== "rect") {
      return {
        lengthFt: null,
        source: "unknown",
        explanation: `The ${what} length was not recorded and can't be estimated from an ${section.kind === "area" ? "entered area" : "outline"}; measure it on site.`,
      };
    }
    const { lengthFt: l, widthFt: w } = section;
    let ft: number;
    let words: string;
    if (what === "ridge") {
      ft = form === "hip" ? Math.abs(l - w) : l;
      words = form === "hip" ? `hip ${formatNumber(l)} × ${formatNumber(w)} ft: ${formatNumber(Math.max(l, w))} − ${formatNumber(Math.min(l, w))} = ${formatNumber(ft)} ft` : `${form} ${formatNumber(l)} ft long`;
    } else {
      ft = form === "hip" ? 2 * (l + w) : form === "shed" ? l : 2 * l;
      words =
        form === "hip"
          ? `hip: eaves all round, 2 × (${formatNumber(l)} + ${formatNumber(w)}) = ${formatNumber(ft)} ft`
          : form === "shed"
            ? `shed: the low eave, ${formatNumber(l)} ft`
            : `gable: two eaves of ${formatNumber(l)} ft = ${formatNumber(ft)} ft`;
    }
    totalFt += ft;
    parts.push(words);
  }
  return {
    lengthFt: totalFt,
    source: "estimated",
    explanation: `The ${what} length was not recorded; estimated from the sections (${parts.join("; ")}) as ${formatNumber(totalFt)} ft. Measure it on site before ordering.`,
  };
}

/**
 * @example
 * roofConstraints({ roof: { form: "gable", pitchIn12: 6, ridgeLengthFt: null, eaveLengthFt: null },
 *   sections: [{ kind: "rect", lengthFt: 40, widthFt: 25 }], ... }).ridge
 * // { lengthFt: 40, source: "estimated", explanation: "The ridge length was not recorded; estimated … as 40 ft. …" }
 */
export function roofConstraints(space: SpaceSurvey): RoofConstraints {
  const ridge: LengthEstimate =
    space.roof.ridgeLengthFt !== null
      ? { lengthFt: space.roof.ridgeLengthFt, source: "recorded", explanation: `Ridge length recorded: ${formatNumber(space.roof.ridgeLengthFt)} ft.` }
      : estimate(space, "ridge");
  const eave: LengthEstimate =
    space.roof.eaveLengthFt !== null
      ? { lengthFt: space.roof.eaveLengthFt, source: "recorded", explanation: `Eave length available for intake recorded: ${formatNumber(space.roof.eaveLengthFt)} ft.` }
      : estimate(space, "eave");
  return { form: space.roof.form, pitchIn12: space.roof.pitchIn12, ridgeCount: Math.max(1, space.sections.length), ridge, eave };
}

/**
 * Ridge length a ridge vent can use: the ridge less the end clearance at both ends of each ridge.
 *
 * @example
 * usableRidgeFt(40, 1) // 39
 */
export function usableRidgeFt(ridgeLengthFt: number, ridgeCount: number): number {
  return Math.max(0, ridgeLengthFt - 2 * RIDGE_VENT_END_CLEARANCE_FT * ridgeCount);
}

/**
 * How many static vents fit in the row under the ridge. The row runs along both main slopes of a
 * gable (2 × ridge), the one slope of a shed, and on a hip also round the hip ends: at a drop d
 * below the ridge the run from the ridge line is d × 12 ÷ pitch, so each main slope's row is
 * ridge + 2 × run and each hip end's row is 2 × run, in all 2 × ridge + 8 × run per hip roof.
 *
 * @example
 * staticVentCapacity({ form: "gable", pitchIn12: 6, ridgeLengthFt: 40, hipCount: 0 }) // 20  (80 ft ÷ 4 ft)
 * staticVentCapacity({ form: "hip", pitchIn12: 6, ridgeLengthFt: 6, hipCount: 1 }) // 9  (12 + 8 × 3 = 36 ft ÷ 4 ft)
 */
export function staticVentCapacity(input: { form: RoofForm; pitchIn12: number; ridgeLengthFt: number; hipCount: number }): { count: number; rowLengthFt: number; explanation: string } {
  const pitch = Math.max(input.pitchIn12, MIN_LAYOUT_PITCH_IN_12);
  const runFt = (STATIC_VENT_DROP_FT * 12) / pitch;
  let rowLengthFt: number;
  let words: string;
  if (input.form === "shed") {
    rowLengthFt = input.ridgeLengthFt;
    words = `one slope along the ${formatNumber(input.ridgeLengthFt)} ft high side`;
  } else if (input.form === "hip") {
    const hips = Math.max(1, input.hipCount);
    rowLengthFt = 2 * input.ridgeLengthFt + 8 * runFt * hips;
    words = `2 × ${formatNumber(input.ridgeLengthFt)} ft of ridge + ${8 * hips} × ${formatNumber(runFt)} ft round the hip ends (${formatNumber(STATIC_VENT_DROP_FT)} ft drop × 12 ÷ ${formatNumber(pitch)} pitch) = ${formatNumber(rowLengthFt)} ft`;
  } else {
    rowLengthFt = 2 * input.ridgeLengthFt;
    words = `both slopes, 2 × ${formatNumber(input.ridgeLengthFt)} ft = ${formatNumber(rowLengthFt)} ft`;
  }
  const count = Math.floor(rowLengthFt / STATIC_VENT_SPACING_FT + 1e-9);
  return {
    count,
    rowLengthFt,
    explanation: `A row of static vents under the ridge runs ${words}; at one per ${STATIC_VENT_SPACING_FT} ft that is room for ${formatNumber(count)} (common practice).`,
  };
}

/**
 * Rafter bays along an eave, one baffle or individual soffit vent each.
 *
 * @example
 * rafterBays(80, 24) // 40
 */
export function rafterBays(eaveLengthFt: number, rafterSpacingIn: number): number {
  return Math.floor((eaveLengthFt * 12) / rafterSpacingIn + 1e-9);
}
