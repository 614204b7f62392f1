import type { CatalogItemInput } from "../../../shared/schemas/catalog.ts";
import { isPoweredKind, VENT_KINDS, type VentKind } from "../../../shared/ventilation/index.ts";

const isVentKind = (kind: string): kind is VentKind => (VENT_KINDS as readonly string[]).includes(kind);

/**
 * Cross-field rules the field schema cannot state: what an item needs so the core can count
 * it. A passive vent has a rated NFA per unit ("each") or per foot ("linear-ft"); a powered
 * fan has its cfm and no NFA; work and accessories carry neither. Answers field → message.
 *
 * @example
 * catalogItemProblems({ ...item, kind: "ridge", unit: "linear-ft", nfaSqInPerFt: null })
 * // → { nfaSqInPerFt: "A linear vent needs its NFA per foot (from the product label)." }
 */
export function catalogItemProblems(item: CatalogItemInput): Record<string, string> {
  const fields: Record<string, string> = {};
  if (isVentKind(item.kind) && isPoweredKind(item.kind)) {
    if (item.unit !== "each") fields.unit = "A powered fan is counted each.";
    if (item.cfm === null) fields.cfm = "A powered fan needs its rated airflow in cfm.";
    if (item.nfaSqInPerUnit !== null) fields.nfaSqInPerUnit = "A powered fan has no net free area; give its cfm instead.";
    if (item.nfaSqInPerFt !== null) fields.nfaSqInPerFt = "A powered fan has no net free area; give its cfm instead.";
  } else if (isVentKind(item.kind)) {
    if (item.cfm !== null) fields.cfm = "Only powered fans have a cfm rating.";
    if (item.unit === "hour") fields.unit = "A vent is counted each or by the linear foot.";
    if (item.unit === "each") {
      if (item.nfaSqInPerUnit === null) fields.nfaSqInPerUnit = "A vent counted each needs its NFA per unit (from the product label).";
      if (item.nfaSqInPerFt !== null) fields.nfaSqInPerFt = "A vent counted each takes NFA per unit, not per foot.";
    }
    if (item.unit === "linear-ft") {
      if (item.nfaSqInPerFt === null) fields.nfaSqInPerFt = "A linear vent needs its NFA per foot (from the product label).";
      if (item.nfaSqInPerUnit !== null) fields.nfaSqInPerUnit = "A linear vent takes NFA per foot, not per unit.";
    }
  } else {
    if (item.nfaSqInPerUnit !== null) fields.nfaSqInPerUnit = "Only vents have a net free area.";
    if (item.nfaSqInPerFt !== null) fields.nfaSqInPerFt = "Only vents have a net free area.";
    if (item.cfm !== null) fields.cfm = "Only powered fans have a cfm rating.";
  }
  if (item.soldInLengthFt !== null && item.unit !== "linear-ft") fields.soldInLengthFt = "Only items priced by the linear foot are sold in lengths.";
  return fields;
}
