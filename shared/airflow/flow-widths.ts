/**
 * Arrow widths from the airflow estimate (shared/airflow-model): each arrow is drawn as wide as
 * the air it stands for, and the larger flows get a "420 cfm" label beside the line. Width is
 * proportional to cfm between a hairline and just under the arrowhead's width, so the heads still
 * read; the labels carry the numbers for anyone who can't judge widths.
 */
import type { AirflowResult } from "../airflow-model/simulate-airflow";
import { formatNumber } from "../units/format";
import { boxesOverlap, type BoxFt, lineCrossesBox, midpoint, textBoxFt } from "./geometry";
import type { AirflowArrow, DrawPointFt, PictureText } from "./types";

/** Thinnest and widest flow lines, in drawing units (the head is 1.43 units across). */
export const MIN_FLOW_WIDTH_UNITS = 0.14;
export const MAX_FLOW_WIDTH_UNITS = 0.75;
/** Arrows carrying at least this share of the largest flow are labelled with their cfm. */
export const LABEL_SHARE_OF_LARGEST = 0.2;

/** A short-circuit up through the ceiling: the estimate's ceiling flow. */
const isFromHouse = (arrow: AirflowArrow) => arrow.kind === "short-circuit-path" && arrow.fromPlace === "the rooms below";
/** Arrows the estimate says nothing about: blocked air, a loop, a whole-house fan (not modelled). */
const isUnmodelled = (arrow: AirflowArrow) => arrow.kind === "blocked-path" || arrow.kind === "house-fan-path" || arrow.fromPlace === arrow.toPlace;

/** The air each arrow stands for, cfm, or null when the estimate says nothing about it. */
export function arrowCfm(arrows: readonly AirflowArrow[], airflow: AirflowResult): Array<number | null> {
  const cfmById = new Map(airflow.openings.map((o) => [o.id, o.cfm]));
  // A vent drawn at both eaves (one survey entry) feeds two arrows: each gets its share.
  const users = new Map<string, number>();
  const sources = arrows.map((arrow) => {
    if (isUnmodelled(arrow) || isFromHouse(arrow)) return [];
    return arrow.ventIds.filter((id) => (cfmById.get(id) ?? 0) > 0);
  });
  for (const ids of sources) for (const id of ids) users.set(id, (users.get(id) ?? 0) + 1);
  return arrows.map((arrow, i) => {
    if (isFromHouse(arrow)) return Math.max(0, cfmById.get("ceiling") ?? 0);
    const ids = sources[i]!;
    if (ids.length === 0) return isUnmodelled(arrow) ? null : 0;
    return ids.reduce((sum, id) => sum + (cfmById.get(id) ?? 0) / (users.get(id) ?? 1), 0);
  });
}

export interface FlowWidths {
  arrows: AirflowArrow[];
  texts: PictureText[];
  note: string;
}

/** What the cfm figures keep clear of besides words and airflow lines. */
export interface FlowLabelObstacles {
  /** The vents' glyphs. */
  boxesFt: readonly BoxFt[];
  /** Drawn lines such as the roof deck, with half their stroke. */
  linesFt: ReadonlyArray<{ pointsFt: readonly DrawPointFt[]; padFt: number }>;
}

export function applyFlowWidths(arrows: readonly AirflowArrow[], texts: readonly PictureText[], airflow: AirflowResult, unitFt: number, avoid: FlowLabelObstacles = { boxesFt: [], linesFt: [] }): FlowWidths {
  const flows = arrowCfm(arrows, airflow);
  const largest = Math.max(0, ...flows.map((f) => f ?? 0));
  const placed = [...texts];
  const labels: PictureText[] = [];
  const widened = arrows.map((arrow, i) => {
    const cfm = flows[i];
    if (cfm === null || cfm === undefined || largest <= 0) return arrow;
    const strokeWidthFt = unitFt * (MIN_FLOW_WIDTH_UNITS + (MAX_FLOW_WIDTH_UNITS - MIN_FLOW_WIDTH_UNITS) * (cfm / largest));
    if (cfm >= LABEL_SHARE_OF_LARGEST * largest && cfm >= 5) {
      // No "≈": the PDF's embedded font subsets lack it; the note says these are estimates.
      const text = `${formatNumber(Math.round(cfm))} cfm`;
      // Beside the line at a few spots along it, above then below (a sloping line runs through a
      // label set just above its midpoint).
      const candidates = [0.3, 0.7, 0.45, 0.15, 0.85].flatMap((at) => {
        const [x, y] = midpoint(arrow.pointsFt, at);
        return [-0.9, -1.9, 2.0, -2.9].map((dy) => ({ id: `cfm-${arrow.id}`, forId: arrow.id, text, atFt: [x, y + dy * unitFt] as const, anchor: "middle" as const, fontSizeFt: 1.1 * unitFt, style: arrow.style, isBold: true }));
      });
      // Where every spot would cover another word, a vent or a line, the label is left out: the
      // arrow's own name still carries its cfm for screen readers, and a number printed over a
      // vent's name helps nobody.
      const isClear = (c: PictureText) => {
        const box = textBoxFt(c);
        return placed.every((t) => !boxesOverlap(box, textBoxFt(t))) && avoid.boxesFt.every((b) => !boxesOverlap(box, b)) && avoid.linesFt.every((l) => !lineCrossesBox(l.pointsFt, box, l.padFt, unitFt)) && arrows.every((a) => !lineCrossesBox(a.pointsFt, box, (MAX_FLOW_WIDTH_UNITS * unitFt) / 2, unitFt));
      };
      const label = candidates.find(isClear);
      if (label) {
        placed.push(label);
        labels.push(label);
      }
    }
    return { ...arrow, strokeWidthFt, cfm: Math.round(cfm * 10) / 10, label: `${arrow.label} (about ${formatNumber(Math.round(cfm))} cfm)` };
  });
  return {
    arrows: widened,
    texts: labels,
    note: "Line widths show the estimated summer airflow in cfm (a model's estimate).",
  };
}
