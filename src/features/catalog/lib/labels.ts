import { ACCESSORY_KINDS, ACCESSORY_LABELS, type CatalogKind, type CatalogUnit } from "@shared/schemas/catalog";
import { VENT_KIND_LABELS, VENT_KINDS, isPoweredKind, type VentKind } from "@shared/ventilation/index";


const capitalize = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);

export function kindLabel(kind: CatalogKind): string {
  const words = (VENT_KIND_LABELS as Record<string, string>)[kind] ?? ACCESSORY_LABELS[kind as keyof typeof ACCESSORY_LABELS] ?? kind;
  return capitalize(words);
}

export const UNIT_LABELS: Record<CatalogUnit, string> = { each: "Each", "linear-ft": "Linear foot", hour: "Hour" };
export const UNIT_SHORT: Record<CatalogUnit, string> = { each: "each", "linear-ft": "per ft", hour: "per hour" };

export const isVentKind = (kind: CatalogKind): kind is VentKind => (VENT_KINDS as readonly string[]).includes(kind);
export const isFanKind = (kind: CatalogKind): boolean => isVentKind(kind) && isPoweredKind(kind);

export const KIND_OPTION_GROUPS = [
  { label: "Vents and fans", kinds: VENT_KINDS as readonly CatalogKind[] },
  { label: "Accessories and work", kinds: ACCESSORY_KINDS as readonly CatalogKind[] },
];
