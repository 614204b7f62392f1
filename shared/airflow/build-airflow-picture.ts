/**
 * buildAirflowPicture: one attic survey and its analysis in, the airflow cross-section out as
 * plain data (see types.ts for the coordinate system). Pure and deterministic: no React, no DOM,
 * no I/O, no clock; the same input always gives the same picture.
 */
import type { AirflowResult } from "../airflow-model/simulate-airflow";
import type { AtticAnalysis, AtticInput } from "../ventilation";
import { applyFlowWidths } from "./flow-widths";
import { joinPlaces } from "./describe-airflow-picture";
import { flowPaths, HOUSE_FAN_BLOCKED_ID } from "./flow-paths";
import { boxesOverlap, emptyBounds, lineCrossesBox, includePoint, includePrimitive, textBoxFt, textWidthFt, tidy } from "./geometry";
import { placeVents } from "./place-vents";
import { deckYAt, roofFrame, type RoofFrame } from "./roof-frame";
import type { AirflowArrow, AirflowPicture, DrawPointFt, LegendEntry, PictureCaption, PictureShape, PictureText, Primitive, ViewBoxFt } from "./types";

export interface BuildAirflowPictureOptions {
  /** Which section to draw; defaults to the largest. An index out of range falls back to it. */
  sectionIndex?: number;
  /** The airflow estimate (shared/airflow-model): arrows are drawn as wide as their cfm and the big ones labelled. */
  airflow?: AirflowResult;
}

function structureShapes(frame: RoofFrame, hasRidgeVent: boolean, isSoffitBlocked: boolean): PictureShape[] {
  const u = frame.unitFt;
  const { spanFt: span, riseFt: rise, ceilingYFt: ceilingY, soffitYFt: soffitY, overhangFt: o, houseBottomYFt: houseBottom } = frame;
  const isShed = frame.roofForm === "shed";
  const deck = (x: number): DrawPointFt => [x, deckYAt(frame, x)];
  const [ax] = frame.apexFt;
  const gapFt = 0.45 * u;

  const deckParts: Primitive[] = [];
  if (isShed) {
    const end: DrawPointFt = [span + o * 0.5, deckYAt(frame, span + o * 0.5)];
    if (hasRidgeVent) {
      deckParts.push({ type: "polyline", pointsFt: [deck(-o), deck(span - 1.1 * u)] });
      deckParts.push({ type: "polyline", pointsFt: [deck(span - 0.2 * u), end] });
    } else deckParts.push({ type: "polyline", pointsFt: [deck(-o), end] });
  } else if (hasRidgeVent) {
    deckParts.push({ type: "polyline", pointsFt: [deck(-o), deck(ax - gapFt)] });
    deckParts.push({ type: "polyline", pointsFt: [deck(ax + gapFt), deck(span + o)] });
  } else deckParts.push({ type: "polyline", pointsFt: [deck(-o), frame.apexFt, deck(span + o)] });
  // Fascia and soffit under each overhang (a shed's high side has no soffit drawn).
  deckParts.push({ type: "polyline", pointsFt: [deck(-o), [-o, soffitY], [0, soffitY]] });
  if (!isShed) deckParts.push({ type: "polyline", pointsFt: [deck(span + o), [span + o, soffitY], [span, soffitY]] });

  const atticOutline: DrawPointFt[] = isShed
    ? [[0, ceilingY], [0, rise], [span, 0], [span, ceilingY]]
    : [[0, ceilingY], [0, rise], frame.apexFt, [span, rise], [span, ceilingY]];

  const t = frame.insulationFt;
  const topY = ceilingY - t;
  const bump = (side: "left" | "right"): DrawPointFt[] => {
    const x = (d: number) => (side === "left" ? d : span - d);
    const pts: DrawPointFt[] = [[x(0), rise + 0.12 * u], [x(1.8 * u), deckYAt(frame, x(1.8 * u)) + 0.12 * u], [x(3.8 * u), topY]];
    return side === "left" ? pts : pts.reverse();
  };
  const insulationTop: DrawPointFt[] = isSoffitBlocked
    ? [...bump("left"), ...(isShed ? [[span, topY] as DrawPointFt] : bump("right"))]
    : [[0, topY], [span, topY]];
  const zigzag: DrawPointFt[] = [];
  const startX = isSoffitBlocked ? 4 * u : 0.4 * u;
  const endX = isSoffitBlocked && !isShed ? span - 4 * u : span - 0.4 * u;
  const steps = Math.max(2, Math.min(200, Math.floor((endX - startX) / (0.6 * u))));
  for (let i = 0; i <= steps; i++) {
    zigzag.push([startX + ((endX - startX) * i) / steps, i % 2 === 0 ? ceilingY - t * 0.2 : ceilingY - t * 0.8]);
  }

  const wallTopLeft = Math.min(ceilingY, soffitY);
  return [
    {
      id: "house",
      kind: "house",
      ventIds: [],
      style: "house",
      label: "The rooms below the attic",
      parts: [{ type: "polygon", pointsFt: [[0, ceilingY], [span, ceilingY], [span, houseBottom], [0, houseBottom]], isFilled: true }],
      strokeWidthFt: 0,
    },
    {
      id: "gable-wall",
      kind: "gable-wall",
      ventIds: [],
      style: "gable-wall",
      label: frame.roofForm === "hip" ? "The attic space, with the sloping hip end beyond" : "The gable end wall, seen from inside the attic",
      parts: [{ type: "polygon", pointsFt: atticOutline, isFilled: true }],
      strokeWidthFt: 0,
    },
    {
      id: "insulation",
      kind: "insulation",
      ventIds: [],
      style: "insulation",
      label: isSoffitBlocked ? "Attic floor insulation, pushed up against the roof at the eaves" : "Attic floor insulation",
      parts: [
        { type: "polygon", pointsFt: [[0, ceilingY], ...insulationTop, [span, ceilingY]], isFilled: true },
        { type: "polyline", pointsFt: zigzag },
      ],
      strokeWidthFt: 0.1 * u,
    },
    {
      id: "ceiling",
      kind: "ceiling",
      ventIds: [],
      style: "ceiling",
      label: "Ceiling (the attic floor)",
      parts: [{ type: "polyline", pointsFt: [[0, ceilingY], [span, ceilingY]] }],
      strokeWidthFt: 0.22 * u,
    },
    {
      id: "walls",
      kind: "wall",
      ventIds: [],
      style: "wall",
      label: "Outside walls",
      parts: [
        { type: "polyline", pointsFt: [[0, wallTopLeft], [0, houseBottom]] },
        { type: "polyline", pointsFt: [[span, isShed ? 0 : wallTopLeft], [span, houseBottom]] },
      ],
      strokeWidthFt: 0.3 * u,
    },
    {
      id: "roof-deck",
      kind: "roof-deck",
      ventIds: [],
      style: "roof-deck",
      label: frame.roofForm === "shed" ? "Roof deck: one slope" : "Roof deck: two slopes meeting at the ridge",
      parts: deckParts,
      strokeWidthFt: 0.4 * u,
    },
  ];
}

function viewBoxOf(shapes: PictureShape[], arrows: AirflowArrow[], texts: PictureText[], u: number): ViewBoxFt {
  const b = emptyBounds();
  for (const shape of shapes) for (const part of shape.parts) includePrimitive(b, part, shape.strokeWidthFt);
  for (const arrow of arrows) {
    for (const p of arrow.pointsFt) includePoint(b, p, arrow.strokeWidthFt);
    for (const p of arrow.head.pointsFt) includePoint(b, p, arrow.strokeWidthFt);
    if (arrow.kind === "short-circuit-path") includePoint(b, arrow.tagAtFt, 1.1 * u);
  }
  for (const text of texts) {
    const w = textWidthFt(text.text, text.fontSizeFt);
    const x0 = text.anchor === "start" ? text.atFt[0] : text.anchor === "middle" ? text.atFt[0] - w / 2 : text.atFt[0] - w;
    includePoint(b, [x0, text.atFt[1] - text.fontSizeFt * 0.85]);
    includePoint(b, [x0 + w, text.atFt[1] + text.fontSizeFt * 0.3]);
  }
  const padFt = 1 * u;
  return { minXFt: b.minXFt - padFt, minYFt: b.minYFt - padFt, widthFt: b.maxXFt - b.minXFt + 2 * padFt, heightFt: b.maxYFt - b.minYFt + 2 * padFt };
}

function legendFor(arrows: AirflowArrow[]): LegendEntry[] {
  const legend: LegendEntry[] = [];
  if (arrows.some((a) => a.style === "intended")) {
    const houseFan = arrows.some((a) => a.kind === "house-fan-path") ? " While the whole-house fan runs, house air rises through it and leaves by the vents." : "";
    legend.push({ style: "intended", line: "solid", head: "filled-triangle", words: `Intended airflow (solid line, filled arrowhead): in low at the eaves, up under the roof, out at the top.${houseFan}` });
  }
  if (arrows.some((a) => a.style === "short-circuit")) {
    legend.push({ style: "short-circuit", line: "dashed", head: "open-chevron", words: "Short-circuit (dashed line, open arrowhead): air taking a shortcut that skips the eaves. Letters match the notes." });
  }
  if (arrows.some((a) => a.style === "blocked")) {
    const hasX = arrows.some((a) => a.kind === "blocked-path" && a.findingCode === "soffits-blocked");
    legend.push({ style: "blocked", line: "dotted", head: "stop-bar", words: `Blocked (dotted line ending in a bar${hasX ? ", an X at the blocked eave" : ""}): air that cannot get through.` });
  }
  return legend;
}

function captionsFor(arrows: AirflowArrow[], notes: string[], houseFanCaption: string | null): PictureCaption[] {
  const captions: PictureCaption[] = [];
  const intended = arrows.filter((a) => a.kind === "intended-path");
  if (intended.length > 0) {
    const from = joinPlaces([...new Set(intended.map((a) => a.fromPlace))]);
    const to = joinPlaces([...new Set(intended.map((a) => a.toPlace))]);
    captions.push({ id: "caption-intended", style: "intended", text: `Intended airflow: outside air comes in at ${from}, runs up under the roof deck and leaves at ${to}.` });
  }
  const blockedSeen = new Set<string>();
  for (const arrow of arrows) {
    if (arrow.kind === "blocked-path" && arrow.id !== HOUSE_FAN_BLOCKED_ID && !blockedSeen.has(arrow.caption)) {
      blockedSeen.add(arrow.caption);
      captions.push({ id: `caption-${arrow.id}`, style: "blocked", ...(arrow.findingCode ? { findingCode: arrow.findingCode } : {}), text: arrow.caption });
    }
  }
  if (houseFanCaption) {
    const isBlocked = arrows.some((a) => a.id === HOUSE_FAN_BLOCKED_ID);
    captions.push({ id: "caption-house-fan", style: isBlocked ? "blocked" : "intended", text: houseFanCaption });
  }
  for (const arrow of arrows) {
    if (arrow.kind === "short-circuit-path") {
      captions.push({
        id: `caption-${arrow.id}`,
        style: "short-circuit",
        tag: arrow.tag,
        findingCode: arrow.findingCode,
        findingTitle: arrow.findingTitle,
        text: arrow.caption,
        sentence: arrow.sentence,
      });
    }
  }
  notes.forEach((note, i) => captions.push({ id: `caption-note-${i}`, style: "note", text: note }));
  return captions;
}

const tidyPoint = (p: DrawPointFt, u: number): DrawPointFt => [tidy(p[0], u), tidy(p[1], u)];
function tidyPrimitive(p: Primitive, u: number): Primitive {
  if (p.type === "circle") return { ...p, centerFt: tidyPoint(p.centerFt, u), radiusFt: tidy(p.radiusFt, u) };
  return { ...p, pointsFt: p.pointsFt.map((q) => tidyPoint(q, u)) };
}

/**
 * Builds the airflow cross-section of one attic section.
 *
 * @example
 * const picture = buildAirflowPicture(input, analyzeAttic(input)); // ridge + soffits, 30 ft gable
 * picture.arrows.filter((a) => a.style === "intended").map((a) => a.fromPlace) // ["the left soffit", "the right soffit"]
 * picture.arrows.filter((a) => a.style === "short-circuit") // []
 */
export function buildAirflowPicture(input: AtticInput, analysis: AtticAnalysis, opts: BuildAirflowPictureOptions = {}): AirflowPicture {
  const frame = roofFrame(input, analysis, opts.sectionIndex);
  const u = frame.unitFt;
  const placed = placeVents(input, analysis, frame);
  const flows = flowPaths(frame, analysis, placed.vents, placed.isSoffitBlocked);
  const hasRidgeVent = placed.vents.some((v) => v.placement === "apex");

  const shapes: PictureShape[] = [...structureShapes(frame, hasRidgeVent, placed.isSoffitBlocked), ...placed.shapes];
  flows.blockedAtFt.forEach((at, i) => {
    const s = 0.95 * u;
    shapes.push({
      id: `blocked-mark-${i}`,
      kind: "blocked-mark",
      ventIds: [],
      style: "blocked",
      label: "Blocked: insulation fills the space over the wall, so soffit air can't get in",
      parts: [
        { type: "polyline", pointsFt: [[at[0] - s, at[1] - s], [at[0] + s, at[1] + s]] },
        { type: "polyline", pointsFt: [[at[0] - s, at[1] + s], [at[0] + s, at[1] - s]] },
      ],
      strokeWidthFt: 0.42 * u,
    });
  });

  const texts: PictureText[] = [
    ...placed.texts,
    roomsText(frame, u, flows.arrows, placed.texts),
    insulationText(frame, u, placed.texts, flows.arrows),
  ];
  const notes = [...frame.notes, ...placed.notes, ...flows.notes];
  let arrows = flows.arrows;
  if (opts.airflow) {
    const glyphsFt = shapes.filter((s) => s.kind === "vent" || s.kind === "eave-intake").map((s) => {
      const b = emptyBounds();
      for (const part of s.parts) includePrimitive(b, part, s.strokeWidthFt / 2);
      return b;
    });
    const structureLinesFt = shapes
      .filter((s) => s.kind === "roof-deck" || s.kind === "wall")
      .flatMap((s) => s.parts.flatMap((part) => (part.type === "polyline" ? [{ pointsFt: part.pointsFt, padFt: s.strokeWidthFt / 2 }] : [])));
    const widths = applyFlowWidths(arrows, texts, opts.airflow, u, { boxesFt: glyphsFt, linesFt: structureLinesFt });
    arrows = widths.arrows;
    texts.push(...widths.texts);
    notes.push(widths.note);
  }
  const viewBox = viewBoxOf(shapes, arrows, texts, u);

  return {
    version: 1,
    roofForm: frame.roofForm,
    sectionIndex: frame.sectionIndex,
    spanFt: frame.spanFt,
    drawnPitchIn12: frame.drawnPitchIn12,
    recordedPitchIn12: frame.recordedPitchIn12,
    riseFt: frame.riseFt,
    unitFt: u,
    viewBox: { minXFt: tidy(viewBox.minXFt, u), minYFt: tidy(viewBox.minYFt, u), widthFt: tidy(viewBox.widthFt, u), heightFt: tidy(viewBox.heightFt, u) },
    shapes: shapes.map((s) => ({ ...s, parts: s.parts.map((p) => tidyPrimitive(p, u)), strokeWidthFt: tidy(s.strokeWidthFt, u) })),
    arrows: arrows.map((a) => ({
      ...a,
      pointsFt: a.pointsFt.map((p) => tidyPoint(p, u)),
      head: { ...a.head, pointsFt: a.head.pointsFt.map((p) => tidyPoint(p, u)) },
      strokeWidthFt: tidy(a.strokeWidthFt, u),
      dashFt: a.dashFt.map((d) => tidy(d, u)),
      ...(a.kind === "short-circuit-path" ? { tagAtFt: tidyPoint(a.tagAtFt, u) } : {}),
    })),
    texts: texts.map((t) => ({ ...t, atFt: tidyPoint(t.atFt, u), fontSizeFt: tidy(t.fontSizeFt, u) })),
    captions: captionsFor(arrows, notes, flows.houseFanCaption),
    legend: legendFor(arrows),
    notes,
  };
}

/**
 * "Rooms below" in the house, at the first spot no airflow line crosses (air drawn up from the
 * rooms, or a whole-house fan's, rises through the ceiling).
 */
function roomsText(frame: RoofFrame, u: number, arrows: readonly AirflowArrow[], others: readonly PictureText[]): PictureText {
  const spots = frame.roofForm === "shed" ? [0.3, 0.7, 0.5, 0.15] : [0.5, 0.75, 0.25, 0.84, 0.16];
  const all = spots.map((share): PictureText => ({
    id: "house-text", forId: "house", text: "Rooms below", atFt: [frame.spanFt * share, frame.ceilingYFt + 2 * u], anchor: "middle", fontSizeFt: 1.3 * u, style: "house", isBold: false,
  }));
  const isClear = (t: PictureText) =>
    others.every((o) => !boxesOverlap(textBoxFt(t), textBoxFt(o))) && arrows.every((a) => !lineCrossesBox(a.pointsFt, textBoxFt(t), a.strokeWidthFt / 2 + 0.2 * u, u));
  return all.find(isClear) ?? all[0]!;
}

/**
 * The "Insulation" word on the attic floor, at the first spot along it where it covers no vent's
 * label (a gable fan's name hangs down to the floor on small attics) and no airflow line.
 */
function insulationText(frame: RoofFrame, u: number, others: readonly PictureText[], arrows: readonly AirflowArrow[]): PictureText {
  const spots = frame.roofForm === "shed" ? [0.62, 0.3, 0.45] : [0.75, 0.25, 0.6, 0.4];
  const at = (share: number): DrawPointFt => [frame.spanFt * share, frame.ceilingYFt - frame.insulationFt - 0.45 * u];
  const candidate = (share: number): PictureText => ({
    id: "insulation-text", forId: "insulation", text: "Insulation", atFt: at(share), anchor: "middle", fontSizeFt: 1.2 * u, style: "insulation", isBold: false,
  });
  const isClear = (t: PictureText) => others.every((o) => !boxesOverlap(textBoxFt(t), textBoxFt(o))) && arrows.every((a) => !lineCrossesBox(a.pointsFt, textBoxFt(t), a.strokeWidthFt / 2, u));
  const all = spots.map(candidate);
  return all.find(isClear) ?? all.find((t) => others.every((o) => !boxesOverlap(textBoxFt(t), textBoxFt(o)))) ?? all[0]!;
}
