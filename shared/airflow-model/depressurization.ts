/**
 * Whether the fans' pull on the house needs a caution: a natural-draft (atmospheric) water heater,
 * furnace or boiler can spill flue gas, carbon monoxide among it, when the room it stands in is
 * pulled below outdoors. Home-performance testing limits that pull (the combustion-appliance-zone
 * limits in physics.ts, from memory). A modelled figure is an estimate: the caution always sends
 * the homeowner to a worst-case depressurization test by a qualified technician.
 */
import { formatNumber } from "../units/format";
import type { Site } from "../ventilation";
import { CAZ_LIMIT_NATURAL_DRAFT_PA } from "./physics";
import type { AirflowResult } from "./simulate-airflow";

export interface DepressurizationCheck {
  /** How much the fans lower the house's pressure, Pa (negative), or null when no fan runs. */
  byFansPa: number | null;
  /** The limit that applies, Pa, or null when no atmospheric appliance was recorded. */
  limitPa: number | null;
  /** True when an appliance is recorded and the fans alone pull the house past its limit. */
  isOverLimit: boolean;
  /** Plain words: what the figure is and, when it matters, the caution. */
  sentence: string;
}

const f1 = (n: number) => formatNumber(n, { maxFractionDigits: 1 });

/**
 * @example
 * depressurizationCheck({ houseDepressurizationByFansPa: -2.6, ... }, { atmosphericCombustionAppliance: true }).isOverLimit // true
 */
export function depressurizationCheck(result: Pick<AirflowResult, "houseDepressurizationByFansPa">, site: Site | undefined): DepressurizationCheck {
  const byFansPa = result.houseDepressurizationByFansPa;
  const hasAppliance = site?.atmosphericCombustionAppliance === true;
  const limitPa = hasAppliance ? CAZ_LIMIT_NATURAL_DRAFT_PA : null;
  if (byFansPa === null) {
    return { byFansPa, limitPa, isOverLimit: false, sentence: "No powered fan runs in these conditions, so the fans do not pull on the house." };
  }
  const pull = `The fans lower the house's pressure by about ${f1(-byFansPa)} Pa.`;
  if (limitPa === null) {
    return { byFansPa, limitPa, isOverLimit: false, sentence: `${pull} No natural-draft gas or oil appliance was recorded; if there is one, have its draft tested with the fans running.` };
  }
  const isOverLimit = byFansPa < limitPa;
  const test = "Have a qualified technician run a worst-case depressurization and spillage test with the fans, exhaust fans and dryer running before relying on this fan; follow local codes and the appliance maker's instructions.";
  return {
    byFansPa,
    limitPa,
    isOverLimit,
    sentence: isOverLimit
      ? `Caution: ${pull} That is past the ${f1(-limitPa)} Pa that home-performance testing allows for a natural-draft appliance, which can then spill flue gas and carbon monoxide into the house. ${test}`
      : `${pull} That is within the ${f1(-limitPa)} Pa allowed for a natural-draft appliance, but other exhaust fans and the dryer add to it. ${test}`,
  };
}
