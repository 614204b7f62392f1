import type { SignedChange } from "../change-orders/crew-list";
import type { MaterialLine, MaterialsList } from "../design/materials-list";
import type { CatalogKind } from "../schemas/catalog";
import { formatNumber } from "../units/format";
import { ATTIC_SAFETY_CAUTION, FAN_SAFETY_CAUTION, ROOF_SAFETY_CAUTION } from "../diagnostics/cautions";
import type { ChecklistItem } from "./types";

const fmt = (n: number) => formatNumber(n, { maxFractionDigits: 3 });
const amount = (m: Pick<MaterialLine, "quantity" | "unit">) => (m.unit === "linear-ft" ? `${fmt(m.quantity)} ft` : `${fmt(m.quantity)}`);

/** Kinds whose install changes where air enters or leaves the attic (so the finished work is photographed). */
const AIRFLOW_KINDS: ReadonlySet<CatalogKind> = new Set<CatalogKind>([
  "ridge", "soffit-continuous", "soffit-individual", "drip-edge", "fascia", "box", "turbine", "off-ridge", "cupola", "gable-louver",
  "powered-roof", "powered-gable", "solar-powered", "baffle", "deck-cut", "patch-vent-opening", "seal-gable-opening", "insulation-clearing", "bath-fan-duct",
]);

/**
 * The step for one material, in the crew's words. Sources: ventilators go in per the manufacturer's
 * instructions (IRC 2018 R806.1, TRADE-REFERENCES); baffles keep 1 in of air space to the sheathing
 * (IRC R806.3); exhaust fans discharge outdoors, never into the attic or a soffit (IRC 2018 M1501.1,
 * from memory); the rest is common practice.
 */
function materialStep(m: MaterialLine): Pick<ChecklistItem, "text" | "caution"> {
  const what = `${m.name} (${amount(m)})`;
  switch (m.kind) {
    case "ridge":
      return { text: `Cut the ridge slot to the manufacturer's width and end distances, then fit ${what}, nailed and sealed as its instructions say.`, caution: ROOF_SAFETY_CAUTION };
    case "deck-cut":
      return { text: `Cut the roof deck openings (${amount(m)}) to the vent maker's size, clear of rafters and trusses.`, caution: ROOF_SAFETY_CAUTION };
    case "soffit-continuous": case "soffit-individual": case "drip-edge": case "fascia":
      return { text: `Install ${what} and check from the attic that every opening reaches open air (no blocking, no insulation behind it).`, caution: ATTIC_SAFETY_CAUTION };
    case "box": case "turbine": case "off-ridge": case "cupola":
      return { text: `Cut for and install ${what}, flashed into the shingles as its instructions say.`, caution: ROOF_SAFETY_CAUTION };
    case "gable-louver":
      return { text: `Install ${what} with its screen in place.`, caution: ATTIC_SAFETY_CAUTION };
    case "powered-roof": case "powered-gable": case "solar-powered":
      return { text: `Install ${what}; a licensed electrician makes any mains connection.`, caution: FAN_SAFETY_CAUTION };
    case "baffle":
      return { text: `Fit baffles at every bay where soffits were opened (${amount(m)}), keeping at least 1 in of air space to the roof sheathing (IRC R806.3).`, caution: ATTIC_SAFETY_CAUTION };
    case "bath-fan-duct":
      return { text: `Bath fan ducted to its own cap outdoors (${what}), never into the attic or a soffit vent.`, caution: FAN_SAFETY_CAUTION };
    case "patch-vent-opening":
      return { text: `Patch the old vent openings (${amount(m)}) with decking and shingles to match.`, caution: ROOF_SAFETY_CAUTION };
    case "seal-gable-opening":
      return { text: `Seal the old fan opening from inside (${amount(m)}).`, caution: ATTIC_SAFETY_CAUTION };
    case "insulation-clearing":
      return { text: `Pull insulation back from the eaves (${amount(m)}) so air reaches the baffles.`, caution: ATTIC_SAFETY_CAUTION };
    case "electrical-disconnect":
      return { text: `Licensed electrician disconnects and makes safe the fan circuit (${amount(m)}).`, caution: FAN_SAFETY_CAUTION };
    default:
      return { text: `Install ${what}.`, caution: null };
  }
}

/** A work line of the signed plan changes airflow when it removes, replaces or opens something (labour lines do not). */
const isAirflowWork = (description: string) => /^(Remove|Replace|Pull insulation|Seal)\b/.test(description);

/**
 * The install checklist of a job, generated from the signed scope only: the crew plan frozen when
 * the accepted proposal was sent (its work lines and materials, with the quantities the signed
 * change orders leave) and one step per line of each signed change order. Drafts, sent-but-unsigned
 * and declined change orders are never passed in. Ids stay put when a later change order is signed.
 *
 * @example
 * // signed plan: remove the roof fan, 40 ft of ridge vent
 * installChecklist(plan, []).map((i) => [i.id, i.isAirflowChange])
 * // [["w1", true], ["m-<ridge id>", true]]
 */
export function installChecklist(plan: MaterialsList, changes: readonly SignedChange[], itemsAfterChanges: readonly MaterialLine[]): ChecklistItem[] {
  const items: ChecklistItem[] = plan.work.map((w, i) => ({
    id: `w${i + 1}`, text: w.description, isAirflowChange: isAirflowWork(w.description), caution: w.caution,
  }));
  for (const m of itemsAfterChanges) {
    items.push({ id: `m-${m.catalogItemId}`, ...materialStep(m), isAirflowChange: AIRFLOW_KINDS.has(m.kind) });
  }
  for (const change of changes) {
    for (const line of change.lines) {
      const verb = line.action === "add" ? "Add" : "Leave out";
      items.push({
        id: `co${change.number}-${line.id}`,
        text: `Change order ${change.number}: ${verb} ${line.description} (${fmt(line.quantity)} ${line.unit}).`,
        isAirflowChange: line.item !== null && AIRFLOW_KINDS.has(line.item.kind),
        caution: null,
      });
    }
  }
  return items;
}
