/**
 * The airflow picture in words: the text alternative of the SVG (<desc>) and the sentence under
 * the picture in the PDF. Built from the picture's own data, so words and drawing agree.
 */
import { formatNumber } from "../ventilation";
import type { AirflowPicture } from "./types";

/**
 * "the left soffit" + "the right soffit" → "both soffits"; otherwise "a, b and c".
 *
 * @example
 * joinPlaces(["the left soffit", "the right soffit"]) // "both soffits"
 * joinPlaces(["the box vents", "the ridge vent", "the gable fan"]) // "the box vents, the ridge vent and the gable fan"
 */
export function joinPlaces(places: string[]): string {
  if (places.length === 2 && places.includes("the left soffit") && places.includes("the right soffit")) return "both soffits";
  if (places.length <= 1) return places[0] ?? "";
  return `${places.slice(0, -1).join(", ")} and ${places[places.length - 1]}`;
}

const ROOF_WORDS: Record<AirflowPicture["roofForm"], string> = {
  gable: "gable roof",
  hip: "hip roof (drawn as a cut through the middle)",
  shed: "shed roof (one slope)",
};

/**
 * @example
 * describeAirflowPicture(picture)
 * // "A cut through the gable roof, 30 ft across at a 6/12 pitch. Air enters at both soffits and
 * //  leaves at the ridge vent. Short-circuit A: The gable fan pulls outside air in through the ridge vent instead of …"
 */
export function describeAirflowPicture(picture: AirflowPicture): string {
  const sentences: string[] = [];
  const pitch = picture.recordedPitchIn12 === null ? "pitch not recorded" : `a ${formatNumber(picture.recordedPitchIn12)}/12 pitch`;
  sentences.push(`A cut through the ${ROOF_WORDS[picture.roofForm]}, ${formatNumber(picture.spanFt, { maxFractionDigits: 1 })} ft across at ${pitch}.`);

  const intended = picture.arrows.filter((a) => a.kind === "intended-path");
  if (intended.length > 0) {
    const from = joinPlaces([...new Set(intended.map((a) => a.fromPlace))]);
    const to = joinPlaces([...new Set(intended.map((a) => a.toPlace))]);
    sentences.push(`Air enters at ${from} and leaves at ${to}.`);
  }
  const hasEaveIntake = picture.shapes.some((s) => s.kind === "eave-intake");
  if (!hasEaveIntake) sentences.push("There is no intake at the eaves.");
  const hasExhaust = picture.shapes.some((s) => s.kind === "vent" && s.ventKind !== "whole-house-fan" && (s.style === "exhaust-vent" || s.style === "fan"));
  if (!hasExhaust) sentences.push("There is no exhaust vent or fan high on the roof.");

  const houseFan = picture.captions.find((c) => c.id === "caption-house-fan");
  if (houseFan) sentences.push(houseFan.text);
  const seen = new Set<string>([houseFan?.text ?? ""]);
  for (const arrow of picture.arrows) {
    if (arrow.kind === "blocked-path" && !seen.has(arrow.caption)) {
      seen.add(arrow.caption);
      sentences.push(arrow.caption);
    }
  }
  for (const arrow of picture.arrows) {
    if (arrow.kind === "short-circuit-path") sentences.push(`Short-circuit ${arrow.tag}: ${arrow.sentence}`);
  }
  return sentences.join(" ");
}
