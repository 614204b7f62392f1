/**
 * Labour taken from the catalog's minutes per unit: the hours follow the option's quantities
 * (strip from 48 to 80 ft, the hours go up) until a person types their own, after which the line
 * is "overridden" and keeps what they typed. Hours round up to the quarter hour (common practice).
 */
import type { CatalogItem } from "../schemas/catalog";
import type { LaborLine, OptionSpace } from "../schemas/options";

const NOISE = 1e-9;

/**
 * The catalog's labour for what an option adds, in hours rounded up to the quarter hour, or null
 * when the items carry no minutes.
 *
 * @example
 * catalogLaborHours([{ added: [{ id: "a", catalogItemId: "strip", quantity: 48 }] }], [{ id: "strip", laborMinutesPerUnit: 5 }]) // 4
 * catalogLaborHours([{ added: [{ id: "a", catalogItemId: "strip", quantity: 80 }] }], [{ id: "strip", laborMinutesPerUnit: 5 }]) // 6.75
 */
export function catalogLaborHours(spaces: readonly Pick<OptionSpace, "added">[], catalog: readonly Pick<CatalogItem, "id" | "laborMinutesPerUnit">[]): number | null {
  const byId = new Map(catalog.map((item) => [item.id, item]));
  const minutes = spaces.reduce((sum, s) => sum + s.added.reduce((acc, a) => acc + (byId.get(a.catalogItemId)?.laborMinutesPerUnit ?? 0) * a.quantity, 0), 0);
  if (minutes <= 0) return null;
  return Math.ceil(minutes / 15 - NOISE) / 4;
}

/** The option with each catalog-based labour line's hours brought up to date; lines a person set are left alone. */
export function withCatalogLabor<T extends { spaces: readonly Pick<OptionSpace, "added">[]; laborLines: readonly LaborLine[] }>(option: T, catalog: readonly Pick<CatalogItem, "id" | "laborMinutesPerUnit">[]): T {
  if (!option.laborLines.some((l) => l.hoursBasis === "catalog")) return option;
  const hours = catalogLaborHours(option.spaces, catalog);
  if (hours === null) return option;
  return { ...option, laborLines: option.laborLines.map((l) => (l.hoursBasis === "catalog" ? { ...l, hours } : l)) };
}
