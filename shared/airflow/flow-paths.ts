/**
 * Airflow arrows: the intended path (in at the eaves, up under the deck, out at the top), blocked
 * paths, and the short-circuit paths the analysis found [SOURCES.md §5.4: a fan or a second
 * kind of exhaust draws from the nearest, easiest opening instead of the soffits].
 */
import type { AtticAnalysis, Finding, FindingCode } from "../ventilation";
import { add, arrowHead, lerp, midpoint, scale, smoothPolyline, sub, trimEnd, unit } from "./geometry";
import type { PlacedVent } from "./place-vents";
import { formatNumber } from "../units/format";
import { joinPlaces } from "./describe-airflow-picture";
import { deckYAt, type RoofFrame, type SlopeSide, sideX, underDeckPoint } from "./roof-frame";
import type { AirflowArrow, ArrowHead, BlockedArrow, DrawPointFt, FlowStyle, HouseFanArrow, IntendedArrow, ShortCircuitArrow } from "./types";

/** Id of the arrow drawn when a whole-house fan's air has no vent to leave by. */
export const HOUSE_FAN_BLOCKED_ID = "blocked-house-fan";

/** At most this many short-circuit arrows; more would hide the roof. The rest go in the notes. */
export const MAX_SHORT_CIRCUITS = 6;

const HEAD_BY_STYLE: Record<FlowStyle, ArrowHead["kind"]> = {
  intended: "filled-triangle",
  "short-circuit": "open-chevron",
  blocked: "stop-bar",
};

/** Dash and gap per style in drawing units (solid, long dashes, dots). */
export const DASH_UNITS: Record<FlowStyle, number[]> = {
  intended: [],
  "short-circuit": [1.1, 0.7],
  blocked: [0.05, 0.6],
};

const STROKE_UNITS: Record<FlowStyle, number> = { intended: 0.34, "short-circuit": 0.3, blocked: 0.3 };

interface Line {
  pointsFt: DrawPointFt[];
  head: ArrowHead;
  strokeWidthFt: number;
  dashFt: number[];
}

function line(raw: DrawPointFt[], style: FlowStyle, u: number): Line {
  const smooth = smoothPolyline(raw, 3);
  const headLengthFt = 1.3 * u;
  const head = arrowHead(smooth, HEAD_BY_STYLE[style], headLengthFt);
  // A filled head covers the line's end; an open chevron or a bar shows the line up to its tip.
  const pointsFt = style === "intended" ? trimEnd(smooth, headLengthFt * 0.7) : smooth;
  return { pointsFt, head, strokeWidthFt: STROKE_UNITS[style] * u, dashFt: DASH_UNITS[style].map((d) => d * u) };
}

/** "the gable louvers", "the box vents": several vents under one name take a plural verb. */
const isPluralPlace = (place: string) => place.endsWith("s");

const cap = (text: string) => `${text[0]?.toUpperCase() ?? ""}${text.slice(1)}`;

/** The edge of a round vent (a gable-wall item) facing `from`. */
function edgeOf(target: PlacedVent, from: DrawPointFt, u: number): DrawPointFt {
  return add(target.innerFt, scale(unit(sub(from, target.innerFt)), target.radiusFt + 0.35 * u));
}

/** Points from the air's entry to just inside the attic at an eave. */
function eaveEntry(frame: RoofFrame, eave: PlacedVent): DrawPointFt[] {
  const u = frame.unitFt;
  const side = eave.side ?? "left";
  const channelX = sideX(frame, side, 0.9 * u);
  const insulationTopY = frame.ceilingYFt - frame.insulationFt;
  return [eave.outerFt, eave.innerFt, [channelX, (deckYAt(frame, channelX) + insulationTopY) / 2]];
}

/** Under the deck from an eave side toward the apex, stopping `stopFromApexFt` short of it. */
function underDeckRun(frame: RoofFrame, side: SlopeSide, stopFromApexFt: number): DrawPointFt[] {
  const u = frame.unitFt;
  const inset = 1.15 * u;
  const runFt = frame.roofForm === "shed" ? frame.spanFt : frame.spanFt / 2;
  const endFromEave = Math.max(4 * u, runFt - stopFromApexFt);
  const points: DrawPointFt[] = [];
  for (const t of [4 * u, (4 * u + endFromEave) / 2, endFromEave]) {
    if (t <= endFromEave) points.push(underDeckPoint(frame, sideX(frame, side, t), inset));
  }
  return points;
}

/** From inside the attic out through a sink vent (or to its edge on the gable wall). */
function exitThrough(frame: RoofFrame, sink: PlacedVent, from: DrawPointFt, approachSide: SlopeSide | null): DrawPointFt[] {
  const u = frame.unitFt;
  if (sink.placement === "gable-wall") return [edgeOf(sink, from, u)];
  if (sink.placement === "apex" && frame.roofForm !== "shed") {
    const s = approachSide === "right" ? 1 : approachSide === "left" ? -1 : 0;
    const [ax] = frame.apexFt;
    if (s === 0) return [sink.innerFt, [ax, -0.3 * u], sink.outerFt];
    return [[ax + s * 0.4 * u, 0.7 * u], [ax + s * 0.5 * u, -1.0 * u], [ax + s * 2.2 * u, -2.9 * u]];
  }
  // Out through the eave-side half of a slope vent, so air coming in can use the other half.
  const shift = scale(sink.ridgewardFt, -0.55 * u);
  return [add(sink.innerFt, shift), add(add(sink.innerFt, scale(sink.outwardFt, 1.2 * u)), shift), add(sink.outerFt, shift)];
}

/** Where air from outdoors comes in through a vent that should be an exhaust. */
function entryThrough(frame: RoofFrame, source: PlacedVent, toward: DrawPointFt): DrawPointFt[] {
  const u = frame.unitFt;
  if (source.placement === "gable-wall") return [edgeOf(source, toward, u)];
  if (source.placement === "apex") return [source.outerFt, [source.innerFt[0], -0.3 * u], source.innerFt];
  const shift = scale(source.ridgewardFt, 0.55 * u);
  return [add(source.outerFt, shift), add(add(source.innerFt, scale(source.outwardFt, 1.2 * u)), shift), add(source.innerFt, shift)];
}

function intendedPoints(frame: RoofFrame, eave: PlacedVent, sink: PlacedVent): DrawPointFt[] {
  const u = frame.unitFt;
  const side = eave.side ?? "left";
  const entry = eaveEntry(frame, eave);
  if (sink.placement === "apex") {
    return [...entry, ...underDeckRun(frame, side, 2.2 * u), ...exitThrough(frame, sink, sink.innerFt, frame.roofForm === "shed" ? null : side)];
  }
  if (sink.placement === "slope") {
    const sameSide = frame.roofForm === "shed" || sink.side === side;
    if (sameSide) {
      const distanceFromEaveFt = Math.abs(sink.innerFt[0] - sideX(frame, side, 0));
      const run = distanceFromEaveFt > 6 * u ? underDeckRun(frame, side, Number.POSITIVE_INFINITY).slice(0, 1) : [];
      return [...entry, ...run, ...exitThrough(frame, sink, sink.innerFt, side)];
    }
    const top = underDeckPoint(frame, frame.apexFt[0], 1.3 * u);
    return [...entry, ...underDeckRun(frame, side, 2.5 * u), top, ...exitThrough(frame, sink, top, side)];
  }
  // Gable wall: up under the deck part way, then across to the vent on the wall behind.
  const run = underDeckRun(frame, side, (frame.roofForm === "shed" ? frame.spanFt : frame.spanFt / 2) * 0.45);
  const last = run[run.length - 1] ?? entry[entry.length - 1]!;
  return [...entry, ...run, ...exitThrough(frame, sink, last, side)];
}

export interface FlowResult {
  arrows: AirflowArrow[];
  notes: string[];
  /** Where insulation blocks an eave: X marks go here. */
  blockedAtFt: DrawPointFt[];
  /** What a whole-house fan does and needs, in words, when the section has one. */
  houseFanCaption: string | null;
}

interface ShortCircuitPlan {
  code: FindingCode;
  title: string;
  sentence: string;
  raw: DrawPointFt[];
  fromPlace: string;
  toPlace: string;
  ventIds: string[];
}

function primaryExhausts(vents: PlacedVent[]): PlacedVent[] {
  const exhausts = vents.filter((v) => v.role === "exhaust");
  const fans = exhausts.filter((v) => v.isFan);
  if (fans.length > 0) return fans;
  const apex = exhausts.filter((v) => v.placement === "apex");
  if (apex.length > 0) return apex;
  const highest = [...exhausts].sort((a, b) => a.fraction - b.fraction)[0];
  return highest ? exhausts.filter((v) => v.kind === highest.kind) : [];
}

const bySide = (candidates: PlacedVent[], side: SlopeSide | null) => candidates.find((c) => c.side === side) ?? candidates[0];

export function flowPaths(frame: RoofFrame, analysis: AtticAnalysis, vents: PlacedVent[], isSoffitBlocked: boolean): FlowResult {
  const u = frame.unitFt;
  const arrows: AirflowArrow[] = [];
  const notes: string[] = [];
  const blockedAtFt: DrawPointFt[] = [];
  const sinks = primaryExhausts(vents);
  const eaves = vents.filter((v) => v.placement === "eave");
  const otherIntakes = vents.filter((v) => v.role === "intake" && v.placement !== "eave");
  const houseFan = vents.find((v) => v.role === "house-supply");
  const finding = (code: FindingCode): Finding | undefined => analysis.findings.find((f) => f.code === code);

  // Intended path from each eave with intake (or blocked at the insulation).
  for (const eave of eaves) {
    const side = eave.side ?? "left";
    if (isSoffitBlocked) {
      const stopX = sideX(frame, side, -0.25 * u);
      const stop: DrawPointFt = [stopX, deckYAt(frame, stopX) + 0.95 * u];
      const caption = "Blocked: insulation covers the soffit vents, so little outside air gets in at the eaves.";
      const blocked: BlockedArrow = {
        id: `blocked-${eave.shapeId}`,
        kind: "blocked-path",
        style: "blocked",
        findingCode: "soffits-blocked",
        label: `Air blocked by insulation at ${eave.place}`,
        ...line([eave.outerFt, eave.innerFt, stop], "blocked", u),
        fromPlace: eave.place,
        toPlace: "the insulation",
        ventIds: eave.ventIds,
        caption,
      };
      arrows.push(blocked);
      blockedAtFt.push([sideX(frame, side, 0.9 * u), frame.riseFt + frame.heelFt * 0.45]);
      continue;
    }
    const sink = bySide(sinks, side);
    if (!sink) {
      const [ax] = frame.apexFt;
      const s = frame.roofForm === "shed" ? -1 : side === "left" ? -1 : 1;
      const raw = [...eaveEntry(frame, eave), ...underDeckRun(frame, side, 2.6 * u), [ax + s * 0.9 * u, 1.6 * u] as DrawPointFt];
      arrows.push({
        id: `blocked-${eave.shapeId}`,
        kind: "blocked-path",
        style: "blocked",
        findingCode: "no-exhaust",
        label: `Air from ${eave.place} has no way out at the top`,
        ...line(raw, "blocked", u),
        fromPlace: eave.place,
        toPlace: "the top of the attic",
        ventIds: eave.ventIds,
        caption: "No exhaust: air that comes in at the eaves has no way out at the top, so heat and moisture collect under the ridge.",
      });
      continue;
    }
    const intended: IntendedArrow = {
      id: `intended-${eave.shapeId}`,
      kind: "intended-path",
      style: "intended",
      label: `Intended airflow: in at ${eave.place}, up under the roof deck, out at ${sink.place}`,
      ...line(intendedPoints(frame, eave, sink), "intended", u),
      fromPlace: eave.place,
      toPlace: sink.place,
      ventIds: [...eave.ventIds, ...sink.ventIds],
    };
    arrows.push(intended);
  }
  for (const intake of otherIntakes) {
    const sink = bySide(sinks, intake.side);
    if (!sink) continue;
    const start = entryThrough(frame, intake, sink.innerFt);
    arrows.push({
      id: `intended-${intake.shapeId}`,
      kind: "intended-path",
      style: "intended",
      label: `Airflow: in at ${intake.place}, out at ${sink.place}`,
      ...line([...start, ...exitThrough(frame, sink, start[start.length - 1]!, intake.side)], "intended", u),
      fromPlace: intake.place,
      toPlace: sink.place,
      ventIds: [...intake.ventIds, ...sink.ventIds],
    });
  }

  // Short-circuits, in a fixed order so tags are stable.
  const plans: ShortCircuitPlan[] = [];
  const placedFor = (ids: string[]) => vents.filter((v) => v.ventIds.some((id) => ids.includes(id)));
  const through = (source: PlacedVent, sink: PlacedVent): DrawPointFt[] => {
    const entry = entryThrough(frame, source, sink.innerFt);
    const from = entry[entry.length - 1]!;
    // Between two roof vents the path bows down into the attic, clear of the intended path under the deck.
    const isBowed = source.placement !== "gable-wall" && sink.placement !== "gable-wall";
    const middle = lerp(from, sink.innerFt, 0.5);
    const bow: DrawPointFt[] = isBowed ? [[middle[0], Math.min(middle[1] + 2.4 * u, frame.ceilingYFt - frame.insulationFt - 1.2 * u)]] : [];
    return [...entry, ...bow, ...exitThrough(frame, sink, bow[0] ?? from, null)];
  };
  const fromHouse = (sink: PlacedVent): DrawPointFt[] => {
    // Beside the sink, toward the middle, clear of the sink's own label.
    // A vent on the gable wall has its name hanging under it: the air rises beside the name and
    // comes in level at the vent's height.
    const isOnWall = sink.placement === "gable-wall";
    // Over the ridge, from the left, where no slope vent is drawn first; right of a whole-house fan,
    // whose name is on its left.
    const side = sink.placement === "apex" ? (houseFan ? 1 : -1) : sink.innerFt[0] <= frame.spanFt / 2 ? 1 : -1;
    const x = Math.min(frame.spanFt - 5 * u, Math.max(5 * u, sink.innerFt[0] + side * (isOnWall ? sink.radiusFt + 5.5 * u : 6 * u)));
    const start: DrawPointFt[] = [
      [x, frame.houseBottomYFt - 0.5 * u],
      [x, frame.ceilingYFt],
      [x, frame.ceilingYFt - frame.insulationFt - 1.2 * u],
      ...(isOnWall ? [[x, sink.innerFt[1] + 0.6 * u] as DrawPointFt] : []),
    ];
    return [...start, ...exitThrough(frame, sink, start[start.length - 1]!, null)];
  };

  const pwp = finding("powered-with-passive-exhaust");
  if (pwp) {
    const involved = placedFor(pwp.ventIds);
    const fan = involved.find((v) => v.isFan && v.role === "exhaust");
    if (fan) {
      for (const source of involved.filter((v) => !v.isFan && v.placement !== "eave")) {
        plans.push({
          code: pwp.code,
          title: pwp.title,
          sentence: `${cap(fan.place)} pulls outside air in through ${source.place} instead of through the soffits, so most of the attic is not swept.`,
          raw: through(source, fan),
          fromPlace: source.place,
          toPlace: fan.place,
          ventIds: [...source.ventIds, ...fan.ventIds],
        });
      }
    }
  }
  const gwr = finding("gable-with-ridge");
  if (gwr) {
    const involved = placedFor(gwr.ventIds);
    const ridge = involved.find((v) => v.kind === "ridge");
    if (ridge) {
      for (const louver of involved.filter((v) => v.kind === "gable-louver")) {
        plans.push({
          code: gwr.code,
          title: gwr.title,
          sentence: `${cap(ridge.place)} draws air in through ${louver.place}, high up and close by, instead of from the soffits.`,
          raw: through(louver, ridge),
          fromPlace: louver.place,
          toPlace: ridge.place,
          ventIds: [...louver.ventIds, ...ridge.ventIds],
        });
      }
    }
  }
  const mixed = finding("mixed-exhaust");
  if (mixed) {
    const involved = placedFor(mixed.ventIds).sort((a, b) => a.fraction - b.fraction);
    const outlet = involved[0];
    if (outlet) {
      const seenKinds = new Set([outlet.kind]);
      for (const inlet of involved.slice(1)) {
        if (seenKinds.has(inlet.kind)) continue;
        seenKinds.add(inlet.kind);
        plans.push({
          code: mixed.code,
          title: mixed.title,
          sentence: `${cap(inlet.place)} and ${outlet.place} feed each other: outside air comes in at ${inlet.place} and goes straight out at ${outlet.place}, skipping the soffits.`,
          raw: through(inlet, outlet),
          fromPlace: inlet.place,
          toPlace: outlet.place,
          ventIds: [...inlet.ventIds, ...outlet.ventIds],
        });
      }
    }
  }
  const tooLow = finding("upper-vent-too-low");
  if (tooLow && !isSoffitBlocked) {
    for (const low of placedFor(tooLow.ventIds).filter((v) => v.placement !== "eave")) {
      const eave = eaves.find((e) => e.side === low.side) ?? eaves[0];
      if (!eave) continue;
      const entry = eaveEntry(frame, eave);
      // Deeper in the attic than the intended path, which runs just under the deck.
      const midX = (entry[entry.length - 1]![0] + low.innerFt[0]) / 2;
      entry.push(underDeckPoint(frame, midX, 2.6 * u));
      plans.push({
        code: tooLow.code,
        title: tooLow.title,
        sentence: `Air from the eaves leaves through ${low.place}, low on the roof, before it reaches the top of the attic.`,
        raw: [...entry, ...exitThrough(frame, low, entry[entry.length - 1]!, eave.side)],
        fromPlace: eave.place,
        toPlace: low.place,
        ventIds: [...eave.ventIds, ...low.ventIds],
      });
    }
  }
  const houseFinding = finding("fan-intake-short") ?? finding("no-intake") ?? finding("exhaust-exceeds-intake");
  if (houseFinding) {
    const sink = houseFinding.code === "fan-intake-short" ? vents.find((v) => v.isFan && v.role === "exhaust") : sinks[0];
    if (sink) {
      const sentence =
        houseFinding.code === "fan-intake-short"
          ? `${cap(sink.place)} gets too little air from the soffits, so it pulls air up from the rooms below through gaps in the ceiling.`
          : houseFinding.code === "no-intake"
            ? `With no intake at the eaves, ${sink.place} ${isPluralPlace(sink.place) ? "draw their" : "draws its"} air up from the rooms below through gaps in the ceiling.`
            : `With more exhaust than intake, ${sink.place} also ${isPluralPlace(sink.place) ? "pull" : "pulls"} air up from the rooms below through gaps in the ceiling.`;
      plans.push({
        code: houseFinding.code,
        title: houseFinding.title,
        sentence,
        raw: fromHouse(sink),
        fromPlace: "the rooms below",
        toPlace: sink.place,
        ventIds: sink.ventIds,
      });
    }
  }
  const unsealed = finding("gable-fan-unsealed");
  if (unsealed) {
    const fan = placedFor(unsealed.ventIds).find((v) => v.isFan && v.placement === "gable-wall");
    if (fan) {
      const r = fan.radiusFt + 1.1 * u;
      const raw: DrawPointFt[] = [];
      for (let i = 0; i <= 10; i++) {
        const a = -Math.PI / 2 + (Math.PI * 1.5 * i) / 10;
        raw.push([fan.innerFt[0] + Math.cos(a) * r, fan.innerFt[1] + Math.sin(a) * r]);
      }
      plans.push({
        code: unsealed.code,
        title: unsealed.title,
        sentence: `Gaps around ${fan.place} let part of its air blow back into the attic in a loop instead of outside.`,
        raw,
        fromPlace: fan.place,
        toPlace: fan.place,
        ventIds: fan.ventIds,
      });
    }
  }

  if (plans.length > MAX_SHORT_CIRCUITS) {
    notes.push(`${plans.length - MAX_SHORT_CIRCUITS} more short-circuit path${plans.length - MAX_SHORT_CIRCUITS === 1 ? " is" : "s are"} not drawn; see the findings.`);
  }
  const tagsAt: DrawPointFt[] = [];
  plans.slice(0, MAX_SHORT_CIRCUITS).forEach((plan, i) => {
    const tag = String.fromCharCode(65 + i);
    const drawn = line(plan.raw, "short-circuit", u);
    // The first spot along the line that keeps clear of the tags already placed.
    const candidates = [0.5, 0.38, 0.62, 0.28, 0.72].map((at) => midpoint(drawn.pointsFt, at));
    const tagAtFt = candidates.find((c) => tagsAt.every((t) => Math.hypot(t[0] - c[0], t[1] - c[1]) >= 2.4 * u)) ?? candidates[0]!;
    tagsAt.push(tagAtFt);
    const caption = `Short-circuit ${tag} — ${plan.title}: ${plan.sentence}`;
    const arrow: ShortCircuitArrow = {
      id: `short-circuit-${tag.toLowerCase()}`,
      kind: "short-circuit-path",
      style: "short-circuit",
      findingCode: plan.code,
      findingTitle: plan.title,
      tag,
      tagAtFt,
      label: `Short-circuit: air from ${plan.fromPlace} to ${plan.toPlace}`,
      ...drawn,
      fromPlace: plan.fromPlace,
      toPlace: plan.toPlace,
      ventIds: plan.ventIds,
      caption,
      sentence: plan.sentence,
    };
    arrows.push(arrow);
  });

  const houseFanFlow = houseFan ? houseFanPaths(frame, analysis, houseFan, vents, isSoffitBlocked) : null;
  if (houseFanFlow) arrows.push(...houseFanFlow.arrows);
  return { arrows, notes, blockedAtFt, houseFanCaption: houseFanFlow?.caption ?? null };
}

/** At most this many outlets are drawn for a whole-house fan; the caption says every vent lets air out. */
const MAX_HOUSE_FAN_OUTLETS = 3;

/**
 * A whole-house fan's air while it runs: up from the rooms through the fan, into the attic and out
 * through the upper vents (or the soffits when there are none). Every vent lets its air out, so
 * the caption says so, with the outlet area it needs (California Energy Code §150.1(c)12(B),
 * 1 sq ft per 750 cfm [SOURCES.md S33]) and the windows-open and flue-gas cautions [common practice].
 */
function houseFanPaths(frame: RoofFrame, analysis: AtticAnalysis, fan: PlacedVent, vents: PlacedVent[], isSoffitBlocked: boolean): { arrows: AirflowArrow[]; caption: string } {
  const u = frame.unitFt;
  const [x] = fan.innerFt;
  const rise: DrawPointFt[] = [fan.outerFt, [x, frame.ceilingYFt], fan.innerFt];
  const upper = vents.filter((v) => v.role === "exhaust" && !v.isFan).sort((a, b) => a.fraction - b.fraction);
  const eaves = isSoffitBlocked ? [] : vents.filter((v) => v.placement === "eave");
  const outlets = (upper.length > 0 ? upper : eaves).slice(0, MAX_HOUSE_FAN_OUTLETS);
  const cfm = analysis.provided.perVent.filter((p) => fan.ventIds.includes(p.ventId)).reduce((sum, p) => sum + p.airflowCfm, 0);
  const isShort = analysis.findings.some((f) => f.code === "whole-house-fan-outlet-short");
  const runs = `When ${fan.place} runs (${formatNumber(cfm)} cfm, windows open), it blows house air up into the attic`;
  const needs = `The attic needs at least 1 sq ft of vent net free area per 750 cfm of fan (California Energy Code §150.1(c)12(B))${isShort ? "; this attic has less (see the findings)" : ""}.`;
  const caution = "Run it only with windows open: with them shut it can pull flue gases back down from gas or oil appliances. Follow local codes and the fan maker's instructions.";

  if (outlets.length === 0) {
    const top = underDeckPoint(frame, x + (frame.apexFt[0] - x) * 0.5, 1.8 * u);
    const blocked: BlockedArrow = {
      id: HOUSE_FAN_BLOCKED_ID,
      kind: "blocked-path",
      style: "blocked",
      ...(isShort ? { findingCode: "whole-house-fan-outlet-short" as const } : {}),
      label: `Air from ${fan.place} has no vent to leave the attic by`,
      ...line([...rise, [x, fan.innerFt[1] - 2 * u], top], "blocked", u),
      fromPlace: "the rooms below",
      toPlace: "the top of the attic",
      ventIds: fan.ventIds,
      caption: "",
    };
    const caption = `${runs}, but the attic has no vent to let that air out, so the fan pushes hot attic air back into the house. ${needs} ${caution}`;
    return { arrows: [{ ...blocked, caption }], caption };
  }

  const arrows = outlets.map((outlet): HouseFanArrow => {
    const from = fan.innerFt;
    let out: DrawPointFt[];
    if (outlet.placement === "eave") {
      const side = outlet.side ?? "left";
      const channelX = sideX(frame, side, 0.9 * u);
      // Arching up through the attic, clear of the insulation, then down and out at the eave.
      const arch = underDeckPoint(frame, (x + channelX) / 2, 2.6 * u);
      out = [arch, [channelX, (deckYAt(frame, channelX) + frame.ceilingYFt - frame.insulationFt) / 2], outlet.innerFt, outlet.outerFt];
    } else {
      out = exitThrough(frame, outlet, from, null);
    }
    return {
      id: `house-fan-${outlet.shapeId}`,
      kind: "house-fan-path",
      style: "intended",
      label: `When ${fan.place} runs: house air up into the attic, out at ${outlet.place}`,
      ...line([...rise, ...out], "intended", u),
      fromPlace: "the rooms below",
      toPlace: outlet.place,
      ventIds: [...fan.ventIds, ...outlet.ventIds],
    };
  });
  const places = [...new Set(outlets.map((o) => o.place))];
  const caption = `${runs}, and the air leaves through ${joinPlaces(places)}${outlets[0]!.placement === "eave" ? "" : " and every other vent, soffits included"}. ${needs} ${caution}`;
  return { arrows, caption };
}

