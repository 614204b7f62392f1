/**
 * The attic as it would be after an option's work: what the core analyses for that option.
 *
 * - An existing vent marked "remove" or "replace" is gone (a vent not listed is kept).
 * - An added catalog vent becomes a core vent with the catalog's rating: a linear item as
 *   `lengthFt` (the quantity) × `nfaSqInPerFt`, an "each" item as `quantity` × `nfaSqInPerUnit`,
 *   a powered fan as `quantity` × `cfm`. Its location is the one given, else the one that replaced
 *   vent had, else low for eave kinds and high for all others; it takes the replaced vent's
 *   section and drop below the ridge unless it has its own.
 * - Accessories and labour (baffles, patches, seals, deck cuts…) change no vent; the site fixes do:
 *   `clearsBlockedSoffits` leaves the soffits unblocked with baffles in (IRC R806.3), and
 *   `sealsGableFan` seals every gable fan to its opening, and `ductsBathFan` takes a bath fan's
 *   air out of the attic to a roof or wall cap.
 */
import type { CatalogItem } from "../schemas/catalog";
import type { AddedItem, OptionSpace } from "../schemas/options";
import type { SpaceSurvey } from "../schemas/survey";
import type { Vent } from "../ventilation/schema";
import { EAVE_KINDS, isPoweredKind, VENT_KINDS, type VentKind } from "../ventilation/vent-kinds";

export class DesignError extends Error {
  constructor(
    message: string,
    readonly addedItemId: string | null,
  ) {
    super(message);
    this.name = "DesignError";
  }
}

const VENT_KIND_SET: ReadonlySet<string> = new Set(VENT_KINDS);
export const isVentCatalogKind = (kind: CatalogItem["kind"]): kind is VentKind => VENT_KIND_SET.has(kind);

/** The id an added vent gets in the applied attic, so findings can point at it. */
export const addedVentId = (added: Pick<AddedItem, "id">): string => `added-${added.id}`;

/** Where a vent of this kind goes when nothing else says: eave kinds low, every other kind high. */
export const defaultLocation = (kind: VentKind): Vent["location"] => (EAVE_KINDS.has(kind) ? "lower" : "upper");

function toVent(added: AddedItem, item: CatalogItem & { kind: VentKind }, replaced: Vent | undefined): Vent {
  const base: Vent = {
    id: addedVentId(added),
    kind: item.kind,
    location: added.location ?? replaced?.location ?? defaultLocation(item.kind),
    label: item.name,
  };
  if (replaced?.sectionId !== undefined) base.sectionId = replaced.sectionId;
  const dropBelowRidgeFt = added.dropBelowRidgeFt ?? replaced?.dropBelowRidgeFt;
  if (dropBelowRidgeFt !== undefined) base.dropBelowRidgeFt = dropBelowRidgeFt;

  const wholeCount = () => {
    if (!Number.isInteger(added.quantity)) {
      throw new DesignError(`"${item.name}" is counted in whole units; ${added.quantity} is not a whole number.`, added.id);
    }
    return added.quantity;
  };
  if (isPoweredKind(item.kind)) {
    if (item.cfm === null) throw new DesignError(`"${item.name}" is a powered fan with no cfm rating in the catalog.`, added.id);
    return { ...base, quantity: wholeCount(), cfm: item.cfm };
  }
  if (item.unit === "linear-ft") {
    if (item.nfaSqInPerFt === null) throw new DesignError(`"${item.name}" is sold by the foot but has no NFA per foot in the catalog.`, added.id);
    return { ...base, lengthFt: added.quantity, nfaSqInPerFt: item.nfaSqInPerFt };
  }
  if (item.unit === "each") {
    if (item.nfaSqInPerUnit === null) throw new DesignError(`"${item.name}" is sold each but has no NFA per unit in the catalog.`, added.id);
    return { ...base, quantity: wholeCount(), nfaSqInPerUnit: item.nfaSqInPerUnit };
  }
  throw new DesignError(`"${item.name}" is a vent sold by the hour; give it a unit of each or linear-ft.`, added.id);
}

/**
 * @example
 * // A 1,000 sq ft ranch: remove its two box vents, add 36 ft of ridge vent at 18 sq in/ft
 * applyOption(space, { spaceId, ventActions: { b1: "remove" }, siteFixes: {},
 *   added: [{ id: "a1", catalogItemId: ridgeId, quantity: 36 }] }, catalog).vents
 * // → [...kept vents, { id: "added-a1", kind: "ridge", location: "upper", lengthFt: 36, nfaSqInPerFt: 18, label: "Shingle-over ridge vent, 4 ft" }]
 */
export function applyOption(space: SpaceSurvey, optionSpace: OptionSpace, catalog: readonly CatalogItem[]): SpaceSurvey {
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const existingById = new Map(space.vents.map((vent) => [vent.id, vent]));
  const actionOf = (ventId: string) => optionSpace.ventActions[ventId] ?? "keep";
  const vents: Vent[] = space.vents.filter((vent) => actionOf(vent.id) === "keep");

  for (const added of optionSpace.added) {
    const item = byId.get(added.catalogItemId);
    if (!item) throw new DesignError(`No catalog item has the id "${added.catalogItemId}".`, added.id);
    if (!isVentCatalogKind(item.kind)) continue; // accessories and labour change no vent
    const replaced = added.replacesVentId !== undefined ? existingById.get(added.replacesVentId) : undefined;
    vents.push(toVent(added, item as CatalogItem & { kind: VentKind }, replaced));
  }

  const site = { ...space.site };
  if (optionSpace.siteFixes.clearsBlockedSoffits === true) {
    site.soffitsBlocked = false;
    site.bafflesPresent = true;
  }
  const sealsGableFan = optionSpace.siteFixes.sealsGableFan === true;
  if (sealsGableFan) site.gableFanSealed = true;
  if (optionSpace.siteFixes.ductsBathFan === true) site.bathFanIntoAttic = false;
  const sealedVents = sealsGableFan
    ? vents.map((vent) => (vent.kind === "powered-gable" || vent.mounting === "gable" ? { ...vent, sealedToOpening: true } : vent))
    : vents;

  return { ...space, vents: sealedVents, site };
}
