import type { MaterialsList } from "../design/materials-list";
import { ATTIC_SAFETY_CAUTION, COMBUSTION_SAFETY_CAUTION, FAN_SAFETY_CAUTION, ROOF_SAFETY_CAUTION } from "../diagnostics/cautions";

/** Said under every job sheet's cautions (DESIGN.md §7). */
export const JOB_DEFERRAL =
  "These cautions do not replace local codes, the authority having jurisdiction, the manufacturers' instructions or a licensed electrician's judgement; follow whichever is stricter.";

const ROOF_KINDS = new Set(["ridge", "deck-cut", "box", "turbine", "off-ridge", "cupola", "powered-roof", "solar-powered", "patch-vent-opening"]);
const FAN_KINDS = new Set(["powered-roof", "powered-gable", "solar-powered", "electrical-disconnect", "bath-fan-duct"]);

/**
 * The safety cautions a job's sheet shows, from what the signed work involves: attic heat always
 * (every install is checked from the attic); fall protection when anything is done on the roof;
 * de-energise and prove dead when a fan is removed, replaced, sealed or installed; and the
 * combustion-appliance caution whenever a powered fan remains after the work (DESIGN.md §7).
 *
 * @example
 * jobCautions({ items: [ridge], work: [] }, { hasPoweredFanAfter: false })
 * // [ATTIC_SAFETY_CAUTION, ROOF_SAFETY_CAUTION]
 */
export function jobCautions(list: MaterialsList, opts: { hasPoweredFanAfter: boolean }): string[] {
  const cautions = [ATTIC_SAFETY_CAUTION];
  const workCautions = new Set(list.work.map((w) => w.caution));
  if (workCautions.has(ROOF_SAFETY_CAUTION) || list.items.some((i) => ROOF_KINDS.has(i.kind))) cautions.push(ROOF_SAFETY_CAUTION);
  if (workCautions.has(FAN_SAFETY_CAUTION) || list.items.some((i) => FAN_KINDS.has(i.kind)) || opts.hasPoweredFanAfter) cautions.push(FAN_SAFETY_CAUTION);
  if (opts.hasPoweredFanAfter) cautions.push(COMBUSTION_SAFETY_CAUTION);
  return cautions;
}
