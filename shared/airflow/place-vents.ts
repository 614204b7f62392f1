/**
 * Where each surveyed vent goes in the cross-section and what it looks like:
 * - eave intake (soffit, drip-edge, fascia) under each eave, with its net free area;
 * - ridge vents as a cap over the apex;
 * - box, turbine, off-ridge, cupola and roof-mounted fans on a slope at their drop below the ridge;
 * - gable louvers and gable-mounted fans on the gable end wall (the wall behind the cut), as a
 *   vertical slot or a round fan near the top;
 * - a whole-house fan in the ceiling, its housing in the attic and its shutter in the room below.
 */
import type { AtticAnalysis, AtticInput, Vent, VentKind } from "../ventilation";
import { EAVE_KINDS, formatNumber, isMechanicalKind, isPoweredKind, isWholeHouseFanKind, VENT_KIND_LABELS } from "../ventilation";
import { add, clamp, placeLocal, scale } from "./geometry";
import { deckYAt, type RoofFrame, type SlopeSide, slopeLengthFt, slopePoint } from "./roof-frame";
import type { DrawPointFt, PictureShape, PictureText, Primitive } from "./types";

export type Placement = "eave" | "apex" | "slope" | "gable-wall" | "ceiling";

export interface PlacedVent {
  shapeId: string;
  ventIds: string[];
  kind: VentKind;
  /** "house-supply": a whole-house fan, which blows house air INTO the attic. */
  role: "intake" | "exhaust" | "house-supply";
  isFan: boolean;
  placement: Placement;
  side: SlopeSide | null;
  /** Where air passes the vent, just inside the attic. */
  innerFt: DrawPointFt;
  /** Outdoors, beyond the vent (for the wall's vents, the vent itself: the wall is behind the cut). */
  outerFt: DrawPointFt;
  /** Out of the roof at this vent; [0, 0] for gable-wall vents. */
  outwardFt: DrawPointFt;
  /** Up the slope toward the ridge, for slope vents; [0, 0] elsewhere. */
  ridgewardFt: DrawPointFt;
  /** Radius of the drawn vent, ft, so arrows can stop at its edge. */
  radiusFt: number;
  /** e.g. "the ridge vent", "the left soffit". */
  place: string;
  /** For ordering: 0 at the ridge, 1 at the eave. */
  fraction: number;
}

export interface PlacedVents {
  vents: PlacedVent[];
  shapes: PictureShape[];
  texts: PictureText[];
  notes: string[];
  /** Total eave intake NFA, sq in (passive, lower). */
  eaveIntakeSqIn: number;
  isSoffitBlocked: boolean;
}

const SHORT_NAMES: Record<VentKind, [one: string, many: string]> = {
  ridge: ["Ridge vent", "Ridge vents"],
  "soffit-continuous": ["Soffit intake", "Soffit intake"],
  "soffit-individual": ["Soffit intake", "Soffit intake"],
  "drip-edge": ["Eave intake", "Eave intake"],
  fascia: ["Eave intake", "Eave intake"],
  box: ["Box vent", "Box vents"],
  turbine: ["Turbine", "Turbines"],
  "off-ridge": ["Off-ridge vent", "Off-ridge vents"],
  cupola: ["Cupola", "Cupolas"],
  "gable-louver": ["Gable louver", "Gable louvers"],
  "powered-roof": ["Roof fan", "Roof fans"],
  "powered-gable": ["Gable fan", "Gable fans"],
  "solar-powered": ["Solar fan", "Solar fans"],
  "whole-house-fan": ["Whole-house fan", "Whole-house fans"],
};

/** Default spot on a slope when no drop was recorded: near the top, as these vents usually are. */
const DEFAULT_SLOPE_FRACTION: Partial<Record<VentKind, number>> = { "off-ridge": 0.1, cupola: 0.08 };
const DEFAULT_UPPER_FRACTION = 0.25;
const DEFAULT_LOWER_FRACTION = 0.8;
const MAX_PER_SLOPE = 4;
const MAX_ON_GABLE_WALL = 4;

const shortName = (kind: VentKind, quantity: number) => {
  const [one, many] = SHORT_NAMES[kind];
  return quantity > 1 ? `${many} ×${formatNumber(quantity)}` : one;
};

const placeName = (kind: VentKind, quantity: number) => {
  const [one, many] = SHORT_NAMES[kind];
  return `the ${(quantity > 1 ? many : one).toLowerCase()}`;
};

function isGableMounted(vent: Vent): boolean {
  if (vent.kind === "gable-louver") return true;
  if (!isPoweredKind(vent.kind)) return false;
  return vent.mounting !== undefined ? vent.mounting === "gable" : vent.kind === "powered-gable";
}

/** Figure shown under a vent's name: net free area, or airflow for a fan. */
function figureText(vent: Vent, nfaSqIn: number, airflowCfm: number): string {
  return isMechanicalKind(vent.kind) ? `${formatNumber(airflowCfm)} cfm` : `${formatNumber(nfaSqIn)} sq in`;
}

interface Ctx {
  frame: RoofFrame;
  u: number;
  shapes: PictureShape[];
  texts: PictureText[];
}

function pushText(ctx: Ctx, forId: string, lines: string[], atFt: DrawPointFt, anchor: PictureText["anchor"], style: PictureText["style"], lineGapFt?: number) {
  const fontSizeFt = 1.55 * ctx.u;
  const gap = lineGapFt ?? fontSizeFt * 1.2;
  lines.forEach((text, i) => {
    ctx.texts.push({
      id: `${forId}-text-${i}`,
      forId,
      text,
      atFt: [atFt[0], atFt[1] + i * gap],
      anchor,
      fontSizeFt: i === 0 ? fontSizeFt : fontSizeFt * 0.9,
      style,
      isBold: i === 0,
    });
  });
}

/** Glyph of a vent on a slope, in local coordinates (along the deck, out of it), in units. */
function slopeGlyph(kind: VentKind, u: number): { parts: Array<{ local: DrawPointFt[]; closed: boolean; filled: boolean }>; circles: Array<{ at: DrawPointFt; r: number; filled: boolean }>; heightFt: number } {
  const s = (pts: Array<[number, number]>) => pts.map(([a, b]) => [a * u, b * u] as DrawPointFt);
  switch (kind) {
    case "turbine":
      return {
        parts: [{ local: s([[-0.35, -0.2], [-0.35, 0.7], [0.35, 0.7], [0.35, -0.2]]), closed: true, filled: true }],
        circles: [{ at: [0, 1.5 * u], r: 0.85 * u, filled: true }],
        heightFt: 2.4 * u,
      };
    case "off-ridge":
      return { parts: [{ local: s([[-1.5, -0.2], [-1.5, 0.5], [1.5, 0.5], [1.5, -0.2]]), closed: true, filled: true }], circles: [], heightFt: 0.5 * u };
    case "cupola":
      return { parts: [{ local: s([[-0.8, -0.2], [-0.8, 1.1], [0, 1.9], [0.8, 1.1], [0.8, -0.2]]), closed: true, filled: true }], circles: [], heightFt: 1.9 * u };
    case "powered-roof":
    case "powered-gable":
    case "solar-powered": {
      const dome: Array<[number, number]> = [];
      for (let i = 0; i <= 8; i++) {
        const a = Math.PI - (Math.PI * i) / 8;
        dome.push([1.1 * Math.cos(a), -0.1 + 1.1 * Math.sin(a)]);
      }
      const parts = [{ local: s(dome), closed: true, filled: true }];
      if (kind === "solar-powered") parts.push({ local: s([[-1.2, 1.35], [1.2, 1.35], [1.2, 1.75], [-1.2, 1.75]]), closed: true, filled: true });
      return { parts, circles: [{ at: [0, 0.45 * u], r: 0.28 * u, filled: true }], heightFt: 1.8 * u };
    }
    default:
      // box (static) vent and anything else on a slope
      return {
        parts: [
          { local: s([[-0.95, -0.2], [-0.95, 1.0], [0.95, 1.0], [0.95, -0.2]]), closed: true, filled: true },
          { local: s([[-0.6, 0.5], [0.6, 0.5]]), closed: false, filled: false },
        ],
        circles: [],
        heightFt: 1.0 * u,
      };
  }
}

function fanGlyph(center: DrawPointFt, u: number): Primitive[] {
  const r = 1.25 * u;
  const parts: Primitive[] = [{ type: "circle", centerFt: center, radiusFt: r, isFilled: true }];
  for (let i = 0; i < 3; i++) {
    const a = (Math.PI * 2 * i) / 3 - Math.PI / 2;
    const tip: DrawPointFt = [center[0] + Math.cos(a) * r * 0.8, center[1] + Math.sin(a) * r * 0.8];
    const side: DrawPointFt = [center[0] + Math.cos(a + 0.7) * r * 0.55, center[1] + Math.sin(a + 0.7) * r * 0.55];
    parts.push({ type: "polygon", pointsFt: [center, tip, side], isFilled: false });
  }
  parts.push({ type: "circle", centerFt: center, radiusFt: 0.22 * u, isFilled: true });
  return parts;
}

function louverGlyph(center: DrawPointFt, u: number): Primitive[] {
  const w = 0.7 * u;
  const h = 1.5 * u;
  const [cx, cy] = center;
  const parts: Primitive[] = [
    { type: "polygon", pointsFt: [[cx - w, cy - h], [cx + w, cy - h], [cx + w, cy + h], [cx - w, cy + h]], isFilled: true },
  ];
  for (let i = 1; i <= 4; i++) {
    const y = cy - h + (2 * h * i) / 5;
    parts.push({ type: "polyline", pointsFt: [[cx - w * 0.7, y - 0.15 * u], [cx + w * 0.7, y + 0.15 * u]] });
  }
  return parts;
}

function ventFigures(analysis: AtticAnalysis, vents: Vent[]): { nfaSqIn: number; airflowCfm: number; quantity: number } {
  let nfaSqIn = 0;
  let airflowCfm = 0;
  let quantity = 0;
  for (const vent of vents) {
    const figures = analysis.provided.perVent.find((v) => v.ventId === vent.id);
    nfaSqIn += figures?.nfaSqIn ?? 0;
    airflowCfm += figures?.airflowCfm ?? (vent.cfm ?? 0) * (vent.quantity ?? 1);
    quantity += vent.quantity ?? 1;
  }
  return { nfaSqIn, airflowCfm, quantity };
}

/** How far down the slope (0 ridge … 1 eave) a vent sits, and whether that was recorded. */
function slopeFraction(frame: RoofFrame, vent: Vent, defaultFraction: number): { fraction: number; isRecorded: boolean } {
  const riseFt = frame.recordedRiseFt ?? frame.riseFt;
  if (riseFt > 0) {
    if (vent.dropBelowRidgeFt !== undefined) return { fraction: clamp(vent.dropBelowRidgeFt / riseFt, 0, 1), isRecorded: true };
    if (vent.heightAboveEaveFt !== undefined) return { fraction: clamp(1 - vent.heightAboveEaveFt / riseFt, 0, 1), isRecorded: true };
  }
  return { fraction: defaultFraction, isRecorded: vent.dropBelowRidgeFt !== undefined || vent.heightAboveEaveFt !== undefined };
}

export function placeVents(input: AtticInput, analysis: AtticAnalysis, frame: RoofFrame): PlacedVents {
  const u = frame.unitFt;
  const ctx: Ctx = { frame, u, shapes: [], texts: [] };
  const placed: PlacedVent[] = [];
  const notes: string[] = [];
  const sectionId = frame.section.id;
  const inSection = input.vents.filter((v) => v.sectionId === undefined || input.sections.length <= 1 || v.sectionId === sectionId);
  const elsewhere = input.vents.length - inSection.length;
  if (elsewhere > 0) notes.push(`${elsewhere} vent${elsewhere === 1 ? "" : "s"} serving other sections ${elsewhere === 1 ? "is" : "are"} not drawn.`);
  const isSoffitBlocked = input.site?.soffitsBlocked === true;
  if (input.assembly === "unvented") {
    notes.push("Sealed (unvented) attic: the insulation is at the roof line and no outside air is meant to pass through it (IRC R806.5).");
  }

  // Eave intake.
  const eaveVents = inSection.filter((v) => EAVE_KINDS.has(v.kind) && v.location === "lower");
  const oddEave = inSection.filter((v) => EAVE_KINDS.has(v.kind) && v.location === "upper");
  if (oddEave.length > 0) notes.push(`Eave vents recorded as upper (exhaust) vents are not drawn: ${oddEave.map((v) => v.id).join(", ")}. Check the survey.`);
  const eaveFigures = ventFigures(analysis, eaveVents);
  const eaveIntakeSqIn = eaveFigures.nfaSqIn;
  if (eaveIntakeSqIn > 0) {
    const kinds = [...new Set(eaveVents.map((v) => v.kind))];
    const kind = kinds.length === 1 ? kinds[0]! : "soffit-continuous";
    const sides = frame.eaveSides;
    const shareSqIn = eaveIntakeSqIn / sides.length;
    const kindWords = kinds.map((k) => VENT_KIND_LABELS[k]).join(" and ");
    for (const side of sides) {
      const id = `eave-${side}`;
      const x0 = side === "left" ? -frame.overhangFt + 0.35 * u : frame.spanFt + 0.35 * u;
      const x1 = side === "left" ? -0.35 * u : frame.spanFt + frame.overhangFt - 0.35 * u;
      const y = frame.soffitYFt;
      const parts: Primitive[] = [{ type: "polygon", pointsFt: [[x0, y - 0.25 * u], [x1, y - 0.25 * u], [x1, y + 0.45 * u], [x0, y + 0.45 * u]], isFilled: true }];
      const ticks = 5;
      for (let i = 1; i <= ticks; i++) {
        const x = x0 + ((x1 - x0) * i) / (ticks + 1);
        parts.push({ type: "polyline", pointsFt: [[x, y - 0.05 * u], [x, y + 0.3 * u]] });
      }
      const sideWords = sides.length === 1 ? "the low eave" : `the ${side} eave`;
      const shareWords = sides.length === 1 ? "" : ` (half of ${formatNumber(eaveIntakeSqIn)} sq in)`;
      ctx.shapes.push({
        id,
        kind: "eave-intake",
        ventKind: kind,
        ventIds: eaveVents.map((v) => v.id),
        style: isSoffitBlocked ? "blocked" : "intake-vent",
        label: `${kindWords[0]!.toUpperCase()}${kindWords.slice(1)} at ${sideWords}: ${formatNumber(shareSqIn)} sq in${shareWords}${isSoffitBlocked ? ", blocked by insulation" : ""}`,
        parts,
        strokeWidthFt: 0.16 * u,
      });
      const xText = side === "left" ? -frame.overhangFt : frame.spanFt + frame.overhangFt;
      pushText(
        ctx,
        id,
        isSoffitBlocked ? [SHORT_NAMES[kind][0], "blocked"] : [SHORT_NAMES[kind][0], `${formatNumber(shareSqIn)} sq in`],
        [xText, frame.houseBottomYFt + 1.6 * u],
        side === "left" ? "start" : "end",
        isSoffitBlocked ? "blocked" : "intake-vent",
      );
      const xMid = (x0 + x1) / 2;
      placed.push({
        shapeId: id,
        ventIds: eaveVents.map((v) => v.id),
        kind,
        role: "intake",
        isFan: false,
        placement: "eave",
        side,
        innerFt: [xMid, y - 0.6 * u],
        outerFt: [xMid, y + 2.4 * u],
        outwardFt: [0, 1],
        ridgewardFt: [0, 0],
        radiusFt: 0.4 * u,
        place: sides.length === 1 ? "the soffit at the low eave" : `the ${side} soffit`,
        fraction: 1,
      });
    }
  }

  if (eaveIntakeSqIn <= 0) {
    for (const side of frame.eaveSides) {
      const xText = side === "left" ? -frame.overhangFt : frame.spanFt + frame.overhangFt;
      pushText(ctx, "roof-deck", ["No intake"], [xText, frame.houseBottomYFt + 1.6 * u], side === "left" ? "start" : "end", "blocked");
      ctx.texts[ctx.texts.length - 1]!.id = `no-intake-${side}-text`;
    }
  }

  // Ridge vents: one cap at the apex.
  const ridgeVents = inSection.filter((v) => v.kind === "ridge");
  if (ridgeVents.length > 0) {
    const { nfaSqIn } = ventFigures(analysis, ridgeVents);
    const id = "vent-ridge";
    const [ax] = frame.apexFt;
    const isShed = frame.roofForm === "shed";
    const leftX = ax - 1.8 * u;
    const rightX = isShed ? ax + 0.5 * u : ax + 1.8 * u;
    const cap: DrawPointFt[] = [
      [leftX, deckYAt(frame, leftX) - 0.2 * u],
      [ax - 0.8 * u, -0.75 * u],
      [isShed ? ax + 0.5 * u : ax + 0.8 * u, -0.75 * u],
      [rightX, isShed ? -0.75 * u + 0.4 * u : deckYAt(frame, rightX) - 0.2 * u],
    ];
    const totalLengthFt = ridgeVents.reduce((acc, v) => acc + (v.lengthFt ?? 0) * (v.quantity ?? 1), 0);
    ctx.shapes.push({
      id,
      kind: "vent",
      ventKind: "ridge",
      ventIds: ridgeVents.map((v) => v.id),
      style: "exhaust-vent",
      label: `Ridge vent${totalLengthFt > 0 ? `, ${formatNumber(totalLengthFt)} ft` : ""}: ${formatNumber(nfaSqIn)} sq in`,
      parts: [{ type: "polygon", pointsFt: cap, isFilled: true }],
      strokeWidthFt: 0.2 * u,
    });
    pushText(ctx, id, [`Ridge vent · ${formatNumber(nfaSqIn)} sq in`], [ax, -4.4 * u], isShed ? "end" : "middle", "exhaust-vent");
    placed.push({
      shapeId: id,
      ventIds: ridgeVents.map((v) => v.id),
      kind: "ridge",
      role: ridgeVents.every((v) => v.location === "lower") ? "intake" : "exhaust",
      isFan: false,
      placement: "apex",
      side: null,
      innerFt: [isShed ? ax - 0.6 * u : ax, isShed ? 1.2 * u : 1.0 * u],
      outerFt: [isShed ? ax - 0.6 * u : ax, -2.8 * u],
      outwardFt: [0, -1],
      ridgewardFt: [0, 0],
      radiusFt: 0.8 * u,
      place: "the ridge vent",
      fraction: 0,
    });
  }

  // Slope vents.
  const slopeVents = inSection.filter((v) => !EAVE_KINDS.has(v.kind) && v.kind !== "ridge" && !isWholeHouseFanKind(v.kind) && !isGableMounted(v));
  const bySide: Record<SlopeSide, Array<{ vent: Vent; fraction: number }>> = { left: [], right: [] };
  const unplacedSlope: string[] = [];
  slopeVents.forEach((vent, i) => {
    const side: SlopeSide = frame.roofForm === "shed" || i % 2 === 0 ? "right" : "left";
    const fallback = vent.location === "lower" ? DEFAULT_LOWER_FRACTION : (DEFAULT_SLOPE_FRACTION[vent.kind] ?? DEFAULT_UPPER_FRACTION);
    const { fraction, isRecorded } = slopeFraction(frame, vent, fallback);
    if (!isRecorded && vent.location === "upper") {
      notes.push(`The drop below the ridge of ${VENT_KIND_LABELS[vent.kind]} ${vent.id} was not recorded; it is drawn near the top of the slope.`);
    }
    bySide[side].push({ vent, fraction });
  });
  const slopeLength = slopeLengthFt(frame);
  const gapFraction = slopeLength > 0 ? (3.4 * u) / slopeLength : 1;
  const minFraction = frame.roofForm === "shed" ? 0.12 : Math.min(0.5, (2.6 * u) / Math.max(slopeLength, u));
  for (const side of ["right", "left"] as const) {
    const list = [...bySide[side]].sort((a, b) => a.fraction - b.fraction);
    let last = -Infinity;
    let count = 0;
    for (const { vent, fraction } of list) {
      let f = Math.max(clamp(fraction, minFraction, 0.88), last + gapFraction);
      if (count >= MAX_PER_SLOPE || f > 0.9) {
        unplacedSlope.push(vent.id);
        continue;
      }
      f = clamp(f, 0, 0.9);
      last = f;
      count++;
      const sp = slopePoint(frame, side, f);
      const isVertical = vent.kind === "turbine" || vent.kind === "cupola";
      const along: DrawPointFt = isVertical ? [1, 0] : sp.alongFt;
      const outward: DrawPointFt = isVertical ? [0, -1] : sp.outwardFt;
      const glyph = slopeGlyph(vent.kind, u);
      const parts: Primitive[] = glyph.parts.map((p) =>
        p.closed
          ? { type: "polygon", pointsFt: placeLocal(sp.pointFt, along, p.local), isFilled: p.filled }
          : { type: "polyline", pointsFt: placeLocal(sp.pointFt, along, p.local) },
      );
      for (const c of glyph.circles) {
        parts.push({ type: "circle", centerFt: placeLocal(sp.pointFt, along, [c.at])[0]!, radiusFt: c.r, isFilled: c.filled });
      }
      const { nfaSqIn, airflowCfm } = ventFigures(analysis, [vent]);
      const quantity = vent.quantity ?? 1;
      const isFan = isMechanicalKind(vent.kind);
      const id = `vent-${vent.id}`;
      const role = vent.location === "lower" ? "intake" : "exhaust";
      ctx.shapes.push({
        id,
        kind: "vent",
        ventKind: vent.kind,
        ventIds: [vent.id],
        style: isFan ? "fan" : role === "intake" ? "intake-vent" : "exhaust-vent",
        label: `${vent.label ?? `${VENT_KIND_LABELS[vent.kind][0]!.toUpperCase()}${VENT_KIND_LABELS[vent.kind].slice(1)}`}${quantity > 1 ? ` ×${formatNumber(quantity)}` : ""}: ${figureText(vent, nfaSqIn, airflowCfm)}`,
        parts,
        strokeWidthFt: 0.18 * u,
      });
      // Beside the vent, down-slope of the air leaving it, so arrow and words don't cross.
      const eaveward = frame.roofForm !== "shed" && side === "right" ? sp.alongFt : scale(sp.alongFt, -1);
      const labelAt = add(add(sp.pointFt, scale(sp.outwardFt, glyph.heightFt + 1.4 * u)), scale(eaveward, 2.4 * u));
      const isRightward = frame.roofForm !== "shed" && side === "right";
      pushText(ctx, id, [shortName(vent.kind, quantity), figureText(vent, nfaSqIn, airflowCfm)], [labelAt[0] + (isRightward ? 0.4 * u : -0.4 * u), labelAt[1]], isRightward ? "start" : "end", isFan ? "fan" : role === "intake" ? "intake-vent" : "exhaust-vent");
      placed.push({
        shapeId: id,
        ventIds: [vent.id],
        kind: vent.kind,
        role,
        isFan,
        placement: "slope",
        side,
        innerFt: add(sp.pointFt, scale(sp.outwardFt, -1.2 * u)),
        outerFt: add(sp.pointFt, scale(outward, glyph.heightFt + 1.4 * u)),
        outwardFt: outward,
        ridgewardFt: frame.roofForm !== "shed" && side === "right" ? scale(sp.alongFt, -1) : sp.alongFt,
        radiusFt: 1 * u,
        place: placeName(vent.kind, quantity),
        fraction: f,
      });
    }
  }
  if (unplacedSlope.length > 0) notes.push(`Not drawn, for lack of room on the slope: ${unplacedSlope.join(", ")}.`);

  // Gable wall: louvers to the left of centre, fans to the right, near the top.
  const gableVents = inSection.filter(isGableMounted);
  // Several louver records (one per gable end, say) are drawn as one pair under one name: the
  // cross-section shows a single wall, and names of look-alike vents side by side only collide.
  const louverRecords = gableVents.filter((v) => !isPoweredKind(v.kind));
  const louvers: Vent[][] = louverRecords.length > 0 ? [louverRecords] : [];
  const fans: Vent[][] = gableVents.filter((v) => isPoweredKind(v.kind)).map((v) => [v]);
  const gableGroups = [...louvers, ...fans];
  const centreX = frame.roofForm === "shed" ? frame.spanFt * 0.72 : frame.spanFt / 2;
  const isAlone = louvers.length === 0 || fans.length === 0;
  // Alone: centre, then right, left, …; both kinds: louvers step left of centre, fans right.
  // With a ridge vent above the centre, start beside it so the air between the two can be seen.
  const firstX = ridgeVents.length > 0 && frame.roofForm !== "shed" ? centreX + 5 * u : centreX;
  const aloneX = (i: number) => firstX + (i === 0 ? 0 : (i % 2 === 1 ? 1 : -1) * Math.ceil(i / 2) * 3.6 * u);
  const sideX = (i: number, direction: -1 | 1) => centreX + direction * (3 + 3.4 * i) * u;
  const half = MAX_ON_GABLE_WALL / 2;
  const gableItems = isAlone
    ? gableGroups.slice(0, MAX_ON_GABLE_WALL).map((group, i) => ({ group, x: aloneX(i) }))
    : [...louvers.slice(0, half).map((group, i) => ({ group, x: sideX(i, -1) })), ...fans.slice(0, half).map((group, i) => ({ group, x: sideX(i, 1) }))];
  const unplacedGable = gableVents.filter((v) => !gableItems.some((g) => g.group.includes(v))).map((v) => v.id);
  for (const [itemIndex, { group, x }] of gableItems.entries()) {
    const vent = group[0]!;
    const isPair = group.length > 1;
    const isFan = isMechanicalKind(vent.kind);
    const halfHeightFt = isFan ? 1.25 * u : 1.5 * u;
    // How far from the centre arrows stop: a pair is wider than it is tall.
    const radiusFt = isPair ? 2.2 * u : halfHeightFt;
    const fallback = vent.location === "lower" ? DEFAULT_LOWER_FRACTION : 0.5;
    const { fraction } = slopeFraction(frame, vent, fallback);
    // Low enough that the whole vent sits inside the wall, clear of the deck.
    const halfWidthFt = isPair ? 1.8 * u : 1.2 * u;
    const minY = Math.max(deckYAt(frame, x - halfWidthFt), deckYAt(frame, x + halfWidthFt)) + halfHeightFt + 0.6 * u;
    const maxY = frame.ceilingYFt - frame.insulationFt - halfHeightFt - 0.4 * u;
    if (minY > maxY) {
      unplacedGable.push(vent.id);
      continue;
    }
    const y = clamp(frame.riseFt * clamp(fraction, 0.3, 0.85), minY, maxY);
    const center: DrawPointFt = [x, y];
    const { nfaSqIn, airflowCfm, quantity } = ventFigures(analysis, group);
    const id = isPair ? "vent-gable-louvers" : `vent-${vent.id}`;
    const role = group.every((v) => v.location === "lower") ? "intake" : "exhaust";
    const ownName = isPair ? SHORT_NAMES[vent.kind][1] : (vent.label ?? `${VENT_KIND_LABELS[vent.kind][0]!.toUpperCase()}${VENT_KIND_LABELS[vent.kind].slice(1)}`);
    ctx.shapes.push({
      id,
      kind: "vent",
      ventKind: vent.kind,
      ventIds: group.map((v) => v.id),
      style: isFan ? "fan" : role === "intake" ? "intake-vent" : "exhaust-vent",
      label: `${ownName} on the gable wall${quantity > 1 ? ` ×${formatNumber(quantity)}` : ""}: ${figureText(vent, nfaSqIn, airflowCfm)}`,
      parts: isFan ? fanGlyph(center, u) : isPair ? [...louverGlyph([x - 0.95 * u, y], u), ...louverGlyph([x + 0.95 * u, y], u)] : louverGlyph(center, u),
      strokeWidthFt: 0.18 * u,
    });
    const name = isFan && vent.kind !== "powered-gable" ? (vent.kind === "solar-powered" ? "Solar gable fan" : "Gable fan") : shortName(vent.kind, quantity);
    // Two lines when they fit above the insulation, else the name alone (the figure is in the label).
    // Side by side on the wall, names alone and staggered so neighbours' words don't collide.
    const isCrowded = gableItems.length > 1;
    const roomFt = frame.ceilingYFt - frame.insulationFt - (y + halfHeightFt);
    const lines = !isCrowded && roomFt >= 3.6 * u ? [name, figureText(vent, nfaSqIn, airflowCfm)] : [name];
    const staggerFt = isCrowded && itemIndex % 2 === 1 ? 1.9 * u : 0;
    pushText(ctx, id, lines, [x, y + halfHeightFt + 1.6 * u + staggerFt], "middle", isFan ? "fan" : role === "intake" ? "intake-vent" : "exhaust-vent");
    placed.push({
      shapeId: id,
      ventIds: group.map((v) => v.id),
      kind: vent.kind,
      role,
      isFan,
      placement: "gable-wall",
      side: null,
      innerFt: center,
      outerFt: center,
      outwardFt: [0, 0],
      ridgewardFt: [0, 0],
      radiusFt,
      place: isFan ? "the gable fan" : placeName(vent.kind, quantity),
      fraction: clamp(fraction, 0, 1),
    });
  }
  if (unplacedGable.length > 0) notes.push(`Not drawn, for lack of room on the gable wall: ${unplacedGable.join(", ")}.`);

  const houseFans = inSection.filter((v) => isWholeHouseFanKind(v.kind));
  if (houseFans.length > 0) placed.push(placeWholeHouseFan(ctx, analysis, houseFans, placed));
  if (frame.roofForm === "hip" && gableVents.length > 0) notes.push("A hip roof has no gable walls; the gable vents are drawn on the end wall as recorded.");

  return { vents: placed, shapes: ctx.shapes, texts: ctx.texts, notes, eaveIntakeSqIn, isSoffitBlocked };
}

/**
 * Every whole-house fan of the section as one fan in the ceiling: under the ridge, where its air
 * rises straight to the top (beside the middle when a gable-wall vent hangs there). Its housing
 * stands in the insulation and its shutter shows in the room below, with its name beside it.
 */
function placeWholeHouseFan(ctx: Ctx, analysis: AtticAnalysis, fans: Vent[], others: readonly PlacedVent[]): PlacedVent {
  const { frame, u } = ctx;
  const middleX = frame.roofForm === "shed" ? frame.spanFt * 0.45 : frame.spanFt / 2;
  const isMiddleTaken = others.some((v) => v.placement === "gable-wall" && Math.abs(v.innerFt[0] - middleX) < v.radiusFt + 2.5 * u);
  const x = isMiddleTaken ? frame.spanFt * 0.3 : middleX;
  const ceilingY = frame.ceilingYFt;
  const topY = ceilingY - frame.insulationFt - 0.8 * u;
  const halfWidthFt = 1.7 * u;
  const shutterY = ceilingY + 0.55 * u;
  const parts: Primitive[] = [
    { type: "polygon", pointsFt: [[x - halfWidthFt, topY], [x + halfWidthFt, topY], [x + halfWidthFt, ceilingY], [x - halfWidthFt, ceilingY]], isFilled: true },
    // The blades seen edge-on, on their hub.
    { type: "polyline", pointsFt: [[x - halfWidthFt * 0.75, (topY + ceilingY) / 2], [x + halfWidthFt * 0.75, (topY + ceilingY) / 2]] },
    { type: "circle", centerFt: [x, (topY + ceilingY) / 2], radiusFt: 0.25 * u, isFilled: true },
    // The louvered shutter in the room's ceiling.
    { type: "polygon", pointsFt: [[x - halfWidthFt - 0.2 * u, ceilingY], [x + halfWidthFt + 0.2 * u, ceilingY], [x + halfWidthFt + 0.2 * u, shutterY], [x - halfWidthFt - 0.2 * u, shutterY]], isFilled: true },
  ];
  for (let i = 1; i <= 4; i++) {
    const sx = x - halfWidthFt + (2 * halfWidthFt * i) / 5;
    parts.push({ type: "polyline", pointsFt: [[sx - 0.2 * u, ceilingY + 0.08 * u], [sx + 0.2 * u, shutterY - 0.08 * u]] });
  }
  const { airflowCfm, quantity } = ventFigures(analysis, fans);
  const id = `vent-${fans[0]!.id}`;
  const figure = `${formatNumber(airflowCfm)} cfm`;
  ctx.shapes.push({
    id,
    kind: "vent",
    ventKind: "whole-house-fan",
    ventIds: fans.map((v) => v.id),
    style: "fan",
    label: `${fans.length === 1 && fans[0]!.label ? fans[0]!.label : "Whole-house fan"}${quantity > 1 ? ` ×${formatNumber(quantity)}` : ""} in the ceiling: ${figure}`,
    parts,
    strokeWidthFt: 0.18 * u,
  });

  // Name and figure in the room, beside the shutter: the attic above is the air's, and under a
  // shallow roof has no room for words clear of it. The room's own words move right (build step).
  const fontSizeFt = 1.2 * u;
  const textX = x - halfWidthFt - 0.7 * u;
  [shortName("whole-house-fan", quantity), figure].forEach((text, i) => {
    ctx.texts.push({ id: `${id}-text-${i}`, forId: id, text, atFt: [textX, ceilingY + 1.3 * u + i * 1.25 * u], anchor: "end", fontSizeFt, style: "fan", isBold: i === 0 });
  });
  return {
    shapeId: id,
    ventIds: fans.map((v) => v.id),
    kind: "whole-house-fan",
    role: "house-supply",
    isFan: true,
    placement: "ceiling",
    side: x <= frame.spanFt / 2 ? "left" : "right",
    innerFt: [x, topY - 0.6 * u],
    outerFt: [x, frame.houseBottomYFt - 0.6 * u],
    outwardFt: [0, 1],
    ridgewardFt: [0, 0],
    radiusFt: halfWidthFt,
    place: quantity > 1 ? "the whole-house fans" : "the whole-house fan",
    fraction: 1,
  };
}
