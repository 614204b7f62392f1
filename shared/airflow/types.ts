/**
 * The airflow picture as plain, serialisable data (DESIGN.md §4): a cross-section of one attic
 * section with its vents, the path air is meant to take and the short-circuit paths the analysis
 * found. The client draws it as SVG and the PDF with react-pdf's SVG primitives, so both show the
 * same thing; neither renderer decides geometry.
 *
 * Coordinates are feet in the plane of the cross-section, SVG convention:
 * - x grows to the right, 0 at the outside face of the left (or low, for a shed) wall;
 * - y grows DOWNWARD, 0 at the ridge (the highest point of the roof deck).
 * So the attic floor sits at a positive y and outdoor air above the roof at negative y; a
 * renderer can use the numbers as they are with `viewBox`.
 */
import type { FindingCode, VentKind } from "../ventilation";

/** [xFt, yFt], y downward (see the file comment). */
export type DrawPointFt = readonly [xFt: number, yFt: number];

/** Airflow styles. Meaning never rests on colour alone: each has its own line and arrowhead. */
export type FlowStyle = "intended" | "short-circuit" | "blocked";

/** Styles of the drawn building parts and vents. */
export type StructureStyle =
  | "roof-deck"
  | "ceiling"
  | "wall"
  | "gable-wall"
  | "insulation"
  | "house"
  | "intake-vent"
  | "exhaust-vent"
  | "fan";

export type PictureStyle = FlowStyle | StructureStyle;

/** A drawing primitive every SVG renderer has (SVG, react-pdf). */
export type Primitive =
  | { type: "polyline"; pointsFt: DrawPointFt[] }
  | { type: "polygon"; pointsFt: DrawPointFt[]; isFilled: boolean }
  | { type: "circle"; centerFt: DrawPointFt; radiusFt: number; isFilled: boolean };

export type ShapeKind =
  | "roof-deck"
  | "ceiling"
  | "wall"
  | "gable-wall"
  | "insulation"
  | "house"
  | "eave-intake"
  | "vent"
  | "blocked-mark";

export interface PictureShape {
  id: string;
  kind: ShapeKind;
  /** The vent kind drawn, for kind "vent" and "eave-intake". */
  ventKind?: VentKind;
  /** Survey vent ids this shape stands for (empty for structure). */
  ventIds: string[];
  style: PictureStyle;
  /** Full words for this shape, e.g. "Continuous soffit vent at the left eave: 360 sq in". */
  label: string;
  parts: Primitive[];
  strokeWidthFt: number;
}

export type TextAnchor = "start" | "middle" | "end";

/** Text drawn in the picture (short; the full words are in the shape's label and the captions). */
export interface PictureText {
  id: string;
  /** The shape or arrow this text names. */
  forId: string;
  text: string;
  /** Baseline anchor point. */
  atFt: DrawPointFt;
  anchor: TextAnchor;
  fontSizeFt: number;
  style: PictureStyle;
  isBold: boolean;
}

export type ArrowHeadKind = "filled-triangle" | "open-chevron" | "stop-bar";

export interface ArrowHead {
  kind: ArrowHeadKind;
  /** Closed outline for a triangle; polyline for a chevron; the bar's two ends for a stop bar. */
  pointsFt: DrawPointFt[];
}

interface ArrowBase {
  id: string;
  label: string;
  /** Centre line, first point = where the air comes from. */
  pointsFt: DrawPointFt[];
  head: ArrowHead;
  strokeWidthFt: number;
  /** Dash and gap lengths along the line, ft; empty = solid. */
  dashFt: number[];
  /** The air this arrow stands for in the airflow estimate, cfm, when one was given. */
  cfm?: number;
  /** Plain place names for the description, e.g. "the left soffit", "the ridge vent". */
  fromPlace: string;
  toPlace: string;
  ventIds: string[];
}

export interface IntendedArrow extends ArrowBase {
  kind: "intended-path";
  style: "intended";
}

export interface BlockedArrow extends ArrowBase {
  kind: "blocked-path";
  style: "blocked";
  /** The finding this shows, when it comes from one. */
  findingCode?: FindingCode;
  /** Why the air can't get through, in words. */
  caption: string;
}

export interface ShortCircuitArrow extends ArrowBase {
  kind: "short-circuit-path";
  style: "short-circuit";
  findingCode: FindingCode;
  /** The finding's title, as the analysis words it. */
  findingTitle: string;
  /** Letter shown on the arrow and in front of its caption: "A", "B", … */
  tag: string;
  /** Where the tag sits on the line. */
  tagAtFt: DrawPointFt;
  /** Names the finding and says what the air does: "Short-circuit A — <finding title>: <sentence>". */
  caption: string;
  /** What the air does, in one plain sentence (for the description). */
  sentence: string;
}

/**
 * A whole-house fan's air while it runs (windows open): up from the rooms through the fan in the
 * ceiling, into the attic and out through its vents. Drawn like intended airflow; its own kind so
 * the soffit-to-ridge wording and the estimate's cfm stay apart from it.
 */
export interface HouseFanArrow extends ArrowBase {
  kind: "house-fan-path";
  style: "intended";
}

export type AirflowArrow = IntendedArrow | BlockedArrow | ShortCircuitArrow | HouseFanArrow;

export interface PictureCaption {
  id: string;
  style: FlowStyle | "note";
  /** The arrow's tag for short-circuits. */
  tag?: string;
  findingCode?: FindingCode;
  /** The finding's title when the caption comes from a finding. */
  findingTitle?: string;
  /** The whole caption, as one line of text. */
  text: string;
  /** For a short-circuit: what the air does, without the tag and the finding title. */
  sentence?: string;
}

export type LegendLine = "solid" | "dashed" | "dotted";

export interface LegendEntry {
  style: FlowStyle;
  line: LegendLine;
  head: ArrowHeadKind;
  /** The words, which carry the meaning on their own. */
  words: string;
}

export interface ViewBoxFt {
  minXFt: number;
  minYFt: number;
  widthFt: number;
  heightFt: number;
}

export interface AirflowPicture {
  /** Data format version, bumped when a renderer would need to change. */
  version: 1;
  roofForm: "gable" | "hip" | "shed";
  /** Index of the section drawn in the survey's section list. */
  sectionIndex: number;
  /** Eave to eave (shed: low to high wall), ft, as used for the drawing. */
  spanFt: number;
  /** Pitch the picture is drawn at, in 12ths (may differ from the survey; see notes). */
  drawnPitchIn12: number;
  /** Pitch recorded in the survey, or null when none was recorded. */
  recordedPitchIn12: number | null;
  /** Drawn rise from the top of the wall to the ridge, ft. */
  riseFt: number;
  /** Drawing unit (span ÷ 32), ft: every stroke, gap and text size is a multiple of it. */
  unitFt: number;
  viewBox: ViewBoxFt;
  shapes: PictureShape[];
  arrows: AirflowArrow[];
  texts: PictureText[];
  captions: PictureCaption[];
  legend: LegendEntry[];
  /** Drawing assumptions in words (hip drawn as a section, pitch not recorded, vents not drawn…). */
  notes: string[];
}
