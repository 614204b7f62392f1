/**
 * The crew's materials list for one option: every catalog item to bring, summed over the
 * option's spaces and rounded to what is bought (linear items in whole pieces of their
 * `soldInLengthFt`, else whole feet; "each" items in whole units), then the work to do —
 * removals, replacements, openings to patch or seal, site fixes and labour — each with its
 * safety caution (DESIGN.md §7). Labour items (kind "labor" or sold by the hour) are work, not
 * materials. Lengths are summed before rounding: offcuts from one run serve the next (common
 * practice when ordering).
 */
import type { CatalogItem } from "../schemas/catalog";
import type { DesignOptionInput } from "../schemas/options";
import type { SpaceSurvey } from "../schemas/survey";
import { formatNumber } from "../units/format";
import { ATTIC_SAFETY_CAUTION, FAN_SAFETY_CAUTION, isPoweredKind, ROOF_SAFETY_CAUTION, VENT_KIND_LABELS, type Vent } from "../ventilation/index";
import { DesignError } from "./apply-option";
import { boughtQuantity } from "./bought-quantity";

export interface MaterialLine {
  catalogItemId: string;
  sku: string;
  name: string;
  kind: CatalogItem["kind"];
  unit: CatalogItem["unit"];
  /** The designed quantity summed over spaces: feet for linear items, a count for "each". */
  quantity: number;
  /** What to buy: pieces, whole feet or whole units. */
  buyCount: number;
  /** "pieces of 4 ft", "ft" or "each". */
  buyUnit: string;
  /** e.g. "38 ft needed ÷ 4 ft pieces = 9.5 → 10 pieces (40 ft)". */
  explanation: string;
}

export interface WorkLine {
  spaceId: string | null;
  description: string;
  caution: string | null;
}

export interface MaterialsList {
  items: MaterialLine[];
  work: WorkLine[];
}

const isLaborItem = (item: CatalogItem) => item.kind === "labor" || item.unit === "hour";
const fmt = (n: number) => formatNumber(n, { maxFractionDigits: 3 });

function ventWords(vent: Vent | undefined, ventId: string): string {
  // Without the survey only the id is known; with it, the crew reads the kind and label, not an id.
  if (!vent) return `vent ${ventId}`;
  const qty = vent.quantity !== undefined && vent.quantity > 1 ? `${vent.quantity} × ` : "";
  return `${qty}${vent.label ? `${VENT_KIND_LABELS[vent.kind]} "${vent.label}"` : VENT_KIND_LABELS[vent.kind]}`;
}

function removalCaution(vent: Vent | undefined): string {
  if (!vent) return ROOF_SAFETY_CAUTION;
  if (isPoweredKind(vent.kind)) return FAN_SAFETY_CAUTION;
  if (vent.kind === "gable-louver") return ATTIC_SAFETY_CAUTION;
  return ROOF_SAFETY_CAUTION;
}

/**
 * @example
 * // 38 ft of ridge vent sold in 4 ft pieces
 * materialsList({ spaces: [{ spaceId, ventActions: {}, siteFixes: {}, added: [{ id: "a1", catalogItemId: ridgeId, quantity: 38 }] }], laborLines: [] }, catalog).items[0]
 * // { name: "Shingle-over ridge vent, 4 ft", quantity: 38, buyCount: 10, buyUnit: "pieces of 4 ft", … }
 */
export function materialsList(
  option: Pick<DesignOptionInput, "spaces" | "laborLines">,
  catalog: readonly CatalogItem[],
  surveyedSpaces: Readonly<Record<string, SpaceSurvey>> = {},
): MaterialsList {
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const totals = new Map<string, number>();
  const order: string[] = [];
  const work: WorkLine[] = [];

  for (const space of option.spaces) {
    const surveyed = surveyedSpaces[space.spaceId];
    const ventsById = new Map((surveyed?.vents ?? []).map((v) => [v.id, v]));
    const replacements = new Map(space.added.filter((a) => a.replacesVentId !== undefined).map((a) => [a.replacesVentId!, a]));

    for (const [ventId, action] of Object.entries(space.ventActions).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) {
      if (action === "keep") continue;
      const vent = ventsById.get(ventId);
      if (action === "remove") {
        const close = vent?.kind === "gable-louver" || (vent && isPoweredKind(vent.kind) && (vent.kind === "powered-gable" || vent.mounting === "gable")) ? "seal the opening from inside" : "patch the opening";
        const power = vent && (vent.kind === "powered-roof" || vent.kind === "powered-gable") ? "have a licensed electrician disconnect and make safe the circuit, " : "";
        work.push({ spaceId: space.spaceId, description: `Remove ${ventWords(vent, ventId)}: ${power}${close}.`, caution: removalCaution(vent) });
      } else {
        const replacement = replacements.get(ventId);
        const item = replacement ? byId.get(replacement.catalogItemId) : undefined;
        const power = vent && (vent.kind === "powered-roof" || vent.kind === "powered-gable") ? " (a licensed electrician disconnects the circuit first)" : "";
        work.push({ spaceId: space.spaceId, description: `Replace ${ventWords(vent, ventId)} with ${item ? item.name : "the new vent"} in the same opening${power}.`, caution: removalCaution(vent) });
      }
    }
    if (space.siteFixes.clearsBlockedSoffits === true) {
      work.push({
        spaceId: space.spaceId,
        description: "Pull insulation back from the soffits and fit a baffle in every rafter bay, keeping at least 1 in of air space to the roof sheathing (IRC R806.3) and reaching above the insulation.",
        caution: ATTIC_SAFETY_CAUTION,
      });
    }
    if (space.siteFixes.sealsGableFan === true) {
      work.push({ spaceId: space.spaceId, description: "Seal the gable fan to its opening with a shroud or plywood baffle.", caution: FAN_SAFETY_CAUTION });
    }

    for (const added of space.added) {
      const item = byId.get(added.catalogItemId);
      if (!item) throw new DesignError(`No catalog item has the id "${added.catalogItemId}".`, added.id);
      if (isLaborItem(item)) {
        work.push({ spaceId: space.spaceId, description: `${item.name}: ${fmt(added.quantity)} h.`, caution: null });
        continue;
      }
      if (!totals.has(item.id)) order.push(item.id);
      totals.set(item.id, (totals.get(item.id) ?? 0) + added.quantity);
    }
  }
  for (const labor of option.laborLines) work.push({ spaceId: null, description: `${labor.description}: ${fmt(labor.hours)} h.`, caution: null });

  const items: MaterialLine[] = order.map((itemId) => {
    const item = byId.get(itemId)!;
    const quantity = totals.get(itemId)!;
    const bought = boughtQuantity(item, quantity);
    return {
      catalogItemId: item.id,
      sku: item.sku,
      name: item.name,
      kind: item.kind,
      unit: item.unit,
      quantity,
      buyCount: bought.count,
      buyUnit: bought.unitWords,
      explanation: `${item.name}: ${bought.explanation}`,
    };
  });
  return { items, work };
}
