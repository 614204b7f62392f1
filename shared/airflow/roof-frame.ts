/**
 * The roof cross-section the airflow picture is drawn on: which section, its span and pitch, and
 * schematic proportions scaled to the span (feet, y downward from the ridge; see types.ts).
 */
import type { AtticAnalysis, AtticInput, Section } from "../ventilation";
import { formatNumber, sectionAreaSqFt } from "../ventilation";
import { clamp, unit } from "./geometry";
import type { DrawPointFt } from "./types";

/** Pitch drawn when none was recorded: a common residential pitch (common practice). */
export const DEFAULT_DRAWN_PITCH_IN_12 = 6;
/** Flatter roofs are drawn at this pitch so the air path under the deck stays visible. */
export const MIN_DRAWN_PITCH_IN_12 = 3;
/** Steeper roofs are drawn at this pitch so the picture stays a readable shape on a phone. */
export const MAX_DRAWN_PITCH_IN_12 = 16;
/** The span is 32 drawing units; strokes, gaps and text are multiples of one unit. */
export const UNITS_PER_SPAN = 32;

export type SlopeSide = "left" | "right";

export interface SlopePoint {
  pointFt: DrawPointFt;
  /** Along the deck, left to right. */
  alongFt: DrawPointFt;
  /** Out of the roof, away from the attic. */
  outwardFt: DrawPointFt;
}

export interface RoofFrame {
  roofForm: "gable" | "hip" | "shed";
  sectionIndex: number;
  section: Section;
  spanFt: number;
  recordedPitchIn12: number | null;
  drawnPitchIn12: number;
  /** Rise of the drawn roof, top of wall to ridge, ft. */
  riseFt: number;
  /** Rise of the real roof from the recorded pitch, or null. */
  recordedRiseFt: number | null;
  unitFt: number;
  /** Height of the deck above the ceiling at the wall line (the heel), ft. */
  heelFt: number;
  insulationFt: number;
  overhangFt: number;
  ceilingYFt: number;
  soffitYFt: number;
  houseBottomYFt: number;
  /** The highest point of the deck: mid-span for gable and hip, the high wall for a shed. */
  apexFt: DrawPointFt;
  /** Eaves with intake soffits: both for gable and hip, the low one for a shed. */
  eaveSides: SlopeSide[];
  notes: string[];
}

function pickSectionIndex(input: AtticInput, analysis: AtticAnalysis, requested: number | undefined): number {
  const count = input.sections.length;
  if (requested !== undefined && Number.isInteger(requested) && requested >= 0 && requested < count) return requested;
  let best = 0;
  let bestAreaSqFt = -Infinity;
  for (let i = 0; i < count; i++) {
    const areaSqFt = analysis.sections[i]?.areaSqFt ?? sectionAreaSqFt(input.sections[i]!);
    if (areaSqFt > bestAreaSqFt) {
      best = i;
      bestAreaSqFt = areaSqFt;
    }
  }
  return best;
}

function spanOf(section: Section, areaSqFt: number): { spanFt: number; note?: string } {
  if (section.spanFt !== undefined) return { spanFt: section.spanFt };
  if (section.kind === "rect") {
    return { spanFt: section.roofForm === "hip" ? Math.min(section.lengthFt, section.widthFt) : section.widthFt };
  }
  const spanFt = Math.sqrt(Math.max(areaSqFt, 0));
  return {
    spanFt,
    note: `The span across the roof was not recorded, so the picture uses the square root of the floor area (${formatNumber(spanFt, { maxFractionDigits: 1 })} ft).`,
  };
}

/**
 * @example
 * const frame = roofFrame(input, analysis) // 30 ft gable at 6/12
 * frame.riseFt // 7.5
 * frame.unitFt // 0.9375
 */
export function roofFrame(input: AtticInput, analysis: AtticAnalysis, requestedIndex?: number): RoofFrame {
  const notes: string[] = [];
  const sectionIndex = pickSectionIndex(input, analysis, requestedIndex);
  const section = input.sections[sectionIndex] ?? input.sections[0]!;
  if (input.sections.length > 1) {
    notes.push(`The attic has ${input.sections.length} sections; the picture shows section ${sectionIndex + 1}${section.label ? ` (${section.label})` : ""}.`);
  }
  const areaSqFt = analysis.sections[sectionIndex]?.areaSqFt ?? sectionAreaSqFt(section);
  const span = spanOf(section, areaSqFt);
  // A positive, finite span is guaranteed by the schema; the floor keeps the maths finite anyway.
  const spanFt = Number.isFinite(span.spanFt) && span.spanFt > 0 ? span.spanFt : 1;
  if (span.note) notes.push(span.note);

  const roofForm = section.roofForm ?? "gable";
  if (section.roofForm === undefined) notes.push("The roof form was not recorded, so the roof is drawn as a gable.");
  if (roofForm === "hip") {
    notes.push("Hip roof: drawn as a cut through the middle of the roof, like a gable. The hip ends slope down too and have no gable walls.");
  }

  const recordedPitchIn12 = section.pitchIn12 ?? null;
  const drawnPitchIn12 =
    recordedPitchIn12 === null ? DEFAULT_DRAWN_PITCH_IN_12 : clamp(recordedPitchIn12, MIN_DRAWN_PITCH_IN_12, MAX_DRAWN_PITCH_IN_12);
  if (recordedPitchIn12 === null) notes.push(`The roof pitch was not recorded, so it is drawn at ${DEFAULT_DRAWN_PITCH_IN_12}/12.`);
  else if (recordedPitchIn12 < MIN_DRAWN_PITCH_IN_12) {
    notes.push(`The roof is nearly flat (${formatNumber(recordedPitchIn12)}/12); it is drawn at ${MIN_DRAWN_PITCH_IN_12}/12 so the airflow can be seen.`);
  } else if (recordedPitchIn12 > MAX_DRAWN_PITCH_IN_12) {
    notes.push(`The roof is very steep (${formatNumber(recordedPitchIn12)}/12); it is drawn at ${MAX_DRAWN_PITCH_IN_12}/12 to fit the page.`);
  }

  const runFt = roofForm === "shed" ? spanFt : spanFt / 2;
  const riseFt = (runFt * drawnPitchIn12) / 12;
  const recordedRiseFt = recordedPitchIn12 === null ? null : (runFt * recordedPitchIn12) / 12;
  const unitFt = spanFt / UNITS_PER_SPAN;
  const heelFt = 2 * unitFt;
  const insulationFt = 1.1 * unitFt;
  const overhangFt = 3 * unitFt;
  const ceilingYFt = riseFt + heelFt;
  const fasciaFt = 0.8 * unitFt;
  const soffitYFt = Math.max(ceilingYFt, riseFt + (overhangFt * drawnPitchIn12) / 12 + fasciaFt);
  const houseBottomYFt = Math.max(ceilingYFt, soffitYFt) + 3 * unitFt;
  const apexFt: DrawPointFt = roofForm === "shed" ? [spanFt, 0] : [spanFt / 2, 0];

  return {
    roofForm,
    sectionIndex,
    section,
    spanFt,
    recordedPitchIn12,
    drawnPitchIn12,
    riseFt,
    recordedRiseFt,
    unitFt,
    heelFt,
    insulationFt,
    overhangFt,
    ceilingYFt,
    soffitYFt,
    houseBottomYFt,
    apexFt,
    eaveSides: roofForm === "shed" ? ["left"] : ["left", "right"],
    notes,
  };
}

/** y of the top of the roof deck at x (the overhang continues the slope past the walls). */
export function deckYAt(frame: RoofFrame, xFt: number): number {
  const slope = frame.drawnPitchIn12 / 12;
  if (frame.roofForm === "shed") return (frame.spanFt - xFt) * slope;
  return Math.abs(xFt - frame.spanFt / 2) * slope;
}

/**
 * A point on the deck `fraction` of the way from the ridge (0) to the wall line (1), on one side.
 * A shed has one slope; `side` is ignored.
 */
export function slopePoint(frame: RoofFrame, side: SlopeSide, fraction: number): SlopePoint {
  const f = clamp(fraction, 0, 1);
  const { spanFt, riseFt } = frame;
  let pointFt: DrawPointFt;
  let alongFt: DrawPointFt;
  if (frame.roofForm === "shed") {
    pointFt = [spanFt * (1 - f), riseFt * f];
    alongFt = unit([spanFt, -riseFt]);
  } else if (side === "left") {
    pointFt = [(spanFt / 2) * (1 - f), riseFt * f];
    alongFt = unit([spanFt / 2, -riseFt]);
  } else {
    pointFt = [(spanFt / 2) * (1 + f), riseFt * f];
    alongFt = unit([spanFt / 2, riseFt]);
  }
  const outwardFt: DrawPointFt = [alongFt[1], -alongFt[0]];
  return { pointFt, alongFt, outwardFt };
}

/** Length of one slope of the drawn roof, ft. */
export function slopeLengthFt(frame: RoofFrame): number {
  const runFt = frame.roofForm === "shed" ? frame.spanFt : frame.spanFt / 2;
  return Math.hypot(runFt, frame.riseFt);
}

/** A point `insetFt` below the deck (measured square to it) at x, for air running under the roof. */
export function underDeckPoint(frame: RoofFrame, xFt: number, insetFt: number): DrawPointFt {
  const slope = frame.drawnPitchIn12 / 12;
  return [xFt, deckYAt(frame, xFt) + insetFt * Math.hypot(1, slope)];
}

/** Mirror an x on the left half to the given side (a shed has only its left eave). */
export const sideX = (frame: RoofFrame, side: SlopeSide, xFromEaveFt: number): number =>
  side === "left" ? xFromEaveFt : frame.spanFt - xFromEaveFt;
