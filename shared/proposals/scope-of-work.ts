/**
 * The scope of work of one design option in plain words, one sentence per piece of work:
 * "Remove the gable-mounted fan and close the opening from inside the attic.",
 * "Install 38 ft of ridge vent along the ridge…". Generated from the option and the survey,
 * then edited by the salesperson; pure, so the client can preview it.
 */
import type { CatalogItem } from "../schemas/catalog";
import type { LaborLine, OptionSpace } from "../schemas/options";
import type { Vent } from "../ventilation/schema";
import { VENT_KIND_LABELS } from "../ventilation/vent-kinds";
import { formatNumber } from "../units/format";

export interface ScopeSpace {
  id: string;
  name: string;
  vents: readonly Vent[];
}

const count = (n: number) => formatNumber(n);
const feet = (n: number) => `${formatNumber(n)} ft`;

/** "Round soffit vent 4 in" → { noun: "round soffit vent", size: "4 in" }; pack sizes (", 4 ft") are dropped. */
export function productWords(name: string): { noun: string; size: string | null } {
  let rest = name.trim().replace(/,\s*\d+(\.\d+)?\s*ft$/i, "");
  let size: string | null = null;
  const aside = /^(.*?)\s*\(([^)]*)\)$/.exec(rest);
  if (aside) {
    rest = aside[1]!;
    size = aside[2]!;
  }
  const sized = /^(.*?)\s+(\d[\d.]*(\s*[×x]\s*\d[\d.]*)?\s*(in|ft|")\.?)$/i.exec(rest);
  if (sized && !aside) {
    rest = sized[1]!;
    size = sized[2]!;
  }
  const noun = rest.charAt(0).toLowerCase() + rest.slice(1);
  return { noun, size };
}

/** Plural of the product's head noun: "round soffit vent" → "round soffit vents". */
export function pluralNoun(noun: string, quantity: number): string {
  if (quantity === 1) return noun;
  const heads = /\b(vent|fan|baffle|louver|cupola|opening|turbine|chute)\b(?!.*\b(vent|fan|baffle|louver|cupola|opening|turbine|chute)\b)/i;
  if (heads.test(noun)) return noun.replace(heads, (w) => `${w}s`);
  return `${noun} (×${count(quantity)})`;
}

const withSize = (words: string, size: string | null) => (size ? `${words} (${size})` : words);

function describeAdded(item: CatalogItem, quantity: number): string | null {
  const { noun, size } = productWords(item.name);
  const many = withSize(pluralNoun(noun, quantity), size);
  const q = count(quantity);
  switch (item.kind) {
    case "ridge":
      return `Install ${feet(quantity)} of ${withSize(noun, size)} along the ridge, opening the vent slot in the roof deck where there is none.`;
    case "soffit-continuous":
      return `Install ${feet(quantity)} of ${withSize(noun, size)} in the soffits under the eaves.`;
    case "soffit-individual":
      return `Add ${q} ${many} to the soffits, spaced evenly along the eaves.`;
    case "drip-edge":
    case "fascia":
      return item.unit === "linear-ft" ? `Install ${feet(quantity)} of ${withSize(noun, size)} at the eaves.` : `Install ${q} ${many} at the eaves.`;
    case "box":
    case "off-ridge":
    case "turbine":
    case "cupola":
      return `Install ${q} ${many} high on the roof, near the ridge, and flash each one into the shingles.`;
    case "gable-louver":
      return `Install ${q} ${many} in the gable walls.`;
    case "powered-roof":
    case "powered-gable":
    case "solar-powered":
      return `Install ${q} ${many}; any wiring is done by a licensed electrician.`;
    case "baffle":
      return `Fit ${q} ${many} in the rafter bays so insulation cannot block the air coming in at the eaves.`;
    case "insulation-clearing":
      return `Pull the insulation back from ${item.unit === "linear-ft" ? `${feet(quantity)} of eave` : "the eaves"} so air can pass.`;
    case "patch-vent-opening":
      return quantity === 1 ? "Patch the old vent opening with roof decking and matching shingles." : `Patch ${q} old vent openings with roof decking and matching shingles.`;
    case "seal-gable-opening":
      return quantity === 1 ? "Seal the gable opening from inside the attic." : `Seal ${q} gable openings from inside the attic.`;
    case "electrical-disconnect":
      return quantity === 1 ? "Have a licensed electrician disconnect the fan circuit and make it safe." : `Have a licensed electrician disconnect ${q} fan circuits and make them safe.`;
    case "bath-fan-duct":
      return quantity === 1 ? "Duct the bathroom fan to a roof or wall cap so its damp air leaves the house instead of the attic." : `Duct ${q} bathroom fans to roof or wall caps so their damp air leaves the house instead of the attic.`;
    case "deck-cut":
      return `Cut ${feet(quantity)} of vent slot in the roof deck at the ridge.`;
    case "labor":
      return null;
    default:
      return item.unit === "linear-ft" ? `Supply and install ${feet(quantity)} of ${withSize(noun, size)}.` : `Supply and install ${q} ${many}.`;
  }
}

function ventWords(vent: Vent): string {
  const label = VENT_KIND_LABELS[vent.kind];
  if (vent.lengthFt !== undefined) return `the existing ${feet(vent.lengthFt)} of ${label}`;
  if ((vent.quantity ?? 1) > 1) return `the ${count(vent.quantity!)} existing ${label}s`;
  return `the existing ${label}`;
}

/** What closes the openings is said once: by the removal sentence, or by the patch or seal item when the option adds one. */
interface Closers {
  patchesRoof: boolean;
  sealsGable: boolean;
}

function describeRemoved(vent: Vent, closers: Closers): string {
  const isGableFan = vent.kind === "powered-gable" || ((vent.kind === "powered-roof" || vent.kind === "solar-powered") && vent.mounting === "gable");
  if (isGableFan) return closers.sealsGable ? "Remove the gable-mounted fan." : "Remove the gable-mounted fan and close the opening from inside the attic.";
  if (vent.kind === "powered-roof" || vent.kind === "solar-powered") {
    return closers.patchesRoof ? "Remove the roof-mounted fan." : "Remove the roof-mounted fan and patch the opening with roof decking and matching shingles.";
  }
  switch (vent.kind) {
    case "box":
    case "turbine":
    case "off-ridge":
    case "cupola":
      if (closers.patchesRoof) return `Remove ${ventWords(vent)}.`;
      return `Remove ${ventWords(vent)} and patch ${(vent.quantity ?? 1) > 1 ? "each opening" : "the opening"} with roof decking and matching shingles.`;
    case "ridge":
      return `Remove ${ventWords(vent)} and close the ridge slot.`;
    case "gable-louver":
      return closers.sealsGable ? `Remove ${ventWords(vent)}.` : `Remove ${ventWords(vent)} and close the opening.`;
    default:
      return `Remove ${ventWords(vent)} and close the opening.`;
  }
}

/**
 * @example
 * scopeOfWork([{ id: "s1", name: "Main attic", vents: [{ id: "fan-1", kind: "powered-gable", location: "upper", cfm: 1200 }] }],
 *   [{ spaceId: "s1", ventActions: { "fan-1": "remove" }, siteFixes: {}, added: [{ id: "a1", catalogItemId: ridgeId, quantity: 38 }] }],
 *   catalog, [])
 * // ["Remove the gable-mounted fan and close the opening from inside the attic.",
 * //  "Install 38 ft of shingle-over ridge vent along the ridge, opening the vent slot in the roof deck where there is none."]
 */
export function scopeOfWork(
  spaces: readonly ScopeSpace[],
  optionSpaces: readonly OptionSpace[],
  catalog: readonly CatalogItem[],
  laborLines: readonly Pick<LaborLine, "description" | "hoursBasis">[],
): string[] {
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const isSeveral = optionSpaces.length > 1;
  const lines: string[] = [];
  for (const optionSpace of optionSpaces) {
    const space = spaces.find((s) => s.id === optionSpace.spaceId);
    const prefix = isSeveral && space ? `${space.name}: ` : "";
    const own: string[] = [];
    const addedKinds = new Set(optionSpace.added.map((a) => byId.get(a.catalogItemId)?.kind));
    const closers: Closers = { patchesRoof: addedKinds.has("patch-vent-opening"), sealsGable: addedKinds.has("seal-gable-opening") };
    for (const vent of space?.vents ?? []) {
      const action = optionSpace.ventActions[vent.id];
      if (action === "remove") own.push(describeRemoved(vent, closers));
      if (action === "replace") {
        const replacement = optionSpace.added.find((a) => a.replacesVentId === vent.id);
        const item = replacement ? byId.get(replacement.catalogItemId) : undefined;
        own.push(item ? `Take out ${ventWords(vent)} to make way for the new ${productWords(item.name).noun}.` : describeRemoved(vent, closers));
      }
    }
    if (optionSpace.siteFixes.clearsBlockedSoffits) own.push("Clear the insulation that blocks the soffit vents and fit a baffle in each rafter bay to keep it clear.");
    if (optionSpace.siteFixes.sealsGableFan) own.push("Seal the gable fan to its opening so it draws air only from the attic.");
    for (const added of optionSpace.added) {
      const item = byId.get(added.catalogItemId);
      if (!item) continue;
      const sentence = describeAdded(item, added.quantity);
      if (sentence) own.push(sentence);
    }
    for (const line of own) if (!lines.includes(prefix + line)) lines.push(prefix + line);
  }
  for (const labor of laborLines) {
    // The catalog's installation labour is the time to do the lines above, not more work.
    if (labor.hoursBasis === "catalog" || labor.hoursBasis === "overridden") continue;
    const text = labor.description.trim().replace(/[.\s]+$/, "");
    if (text) lines.push(`${text}.`);
  }
  return lines;
}
