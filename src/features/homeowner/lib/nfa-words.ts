import type { SnapshotAnalysis } from "@shared/proposals/types";

const n = (value: number) => Math.round(value).toLocaleString("en-US");

/**
 * The code's vent requirement in a homeowner's words, from the snapshot's figures.
 *
 * @example
 * nfaSentences({ floorAreaSqFt: 1500, requirement: { ratio: 150, totalSqIn: 1440, totalSqFt: 10, lowerMinSqIn: 720, upperMinSqIn: 576, upperMaxSqIn: 720, reasons: [] }, provided: { intakeSqIn: 300, exhaustSqIn: 360, totalSqIn: 660 }, … })[1]
 * // "For 1,500 sq ft of attic floor that is 1,500 ÷ 150 = 10 sq ft, or 1,440 square inches of opening."
 */
export function nfaSentences(a: SnapshotAnalysis): string[] {
  const r = a.requirement;
  const sqFt = Math.round(r.totalSqFt * 100) / 100;
  const sentences = [
    `Vents are rated by their "net free area": the open space air can actually pass through, after screens and louvers. The building code asks for 1 square foot of it for every ${r.ratio} square feet of attic floor.`,
    `For ${n(a.floorAreaSqFt)} sq ft of attic floor that is ${n(a.floorAreaSqFt)} ÷ ${r.ratio} = ${sqFt.toLocaleString("en-US")} sq ft, or ${n(r.totalSqIn)} square inches of opening.`,
    `About half belongs low, at the eaves, where fresh air comes in (at least ${n(r.lowerMinSqIn)} sq in), and the rest high, near the ridge, where warm damp air leaves (${n(r.upperMinSqIn)} to ${n(r.upperMaxSqIn)} sq in).`,
  ];
  return sentences;
}

/** "Today: 300 sq in of intake at the eaves and 360 sq in of exhaust up high, 660 sq in in all, where the code asks for at least 1,440 sq in — …" */
export function providedSentence(a: SnapshotAnalysis, when: "today" | "after"): string {
  const p = a.provided;
  const lead = when === "today" ? "Today" : "After the work";
  const verdict = a.compliant ? "this meets the code minimum." : "this is short of the code minimum.";
  return `${lead}: ${n(p.intakeSqIn)} sq in of intake at the eaves and ${n(p.exhaustSqIn)} sq in of exhaust up high, ${n(p.totalSqIn)} sq in in all, where the code asks for at least ${n(a.requirement.totalSqIn)} sq in — ${verdict}`;
}
