/**
 * Which catalog item the generator uses for a job: active items of the kind, with the rating the
 * design needs; the lowest sell price per square inch of NFA wins (per hour or unit for work
 * items), ties broken by SKU so the choice never depends on catalog order.
 */
import type { CatalogItem, CatalogKind, CatalogUnit } from "../schemas/catalog";

const pricePerSqIn = (item: CatalogItem): number => {
  const nfa = item.unit === "linear-ft" ? item.nfaSqInPerFt : item.nfaSqInPerUnit;
  return nfa !== null && nfa > 0 ? item.sellPriceCents / nfa : Number.POSITIVE_INFINITY;
};

const bySkuThenId = (a: CatalogItem, b: CatalogItem) => (a.sku < b.sku ? -1 : a.sku > b.sku ? 1 : a.id < b.id ? -1 : a.id > b.id ? 1 : 0);

/**
 * A passive vent of this kind sold by the given unit ("linear-ft" for ridge and strip, "each" for
 * static and individual vents), rated for that unit.
 *
 * @example
 * pickVentItem(demoCatalog(), "ridge", "linear-ft")?.name // "Shingle-over ridge vent, 4 ft"
 */
export function pickVentItem(catalog: readonly CatalogItem[], kind: CatalogKind, unit?: CatalogUnit): CatalogItem | null {
  const candidates = catalog.filter(
    (item) =>
      item.isActive &&
      item.kind === kind &&
      (unit === undefined || item.unit === unit) &&
      ((item.unit === "linear-ft" && item.nfaSqInPerFt !== null) || (item.unit === "each" && item.nfaSqInPerUnit !== null)),
  );
  candidates.sort((a, b) => pricePerSqIn(a) - pricePerSqIn(b) || bySkuThenId(a, b));
  return candidates[0] ?? null;
}

/**
 * An accessory or work item of this kind (baffle, patch, seal…), cheapest first; optionally of a unit.
 *
 * @example
 * pickWorkItem(demoCatalog(), "patch-vent-opening")?.sku // "PATCH"
 */
export function pickWorkItem(catalog: readonly CatalogItem[], kind: CatalogKind, units?: readonly CatalogUnit[]): CatalogItem | null {
  const candidates = catalog.filter((item) => item.isActive && item.kind === kind && (units === undefined || units.includes(item.unit)));
  candidates.sort((a, b) => a.sellPriceCents - b.sellPriceCents || bySkuThenId(a, b));
  return candidates[0] ?? null;
}
