/**
 * The airflow model's public face (DESIGN.md §4, issue 19): a two-zone (attic and house)
 * orifice-flow estimate with stack, wind and fans.
 */
export { simulateAirflow, leakageAreas } from "./simulate-airflow";
export type { AirflowOpening, AirflowResult, FanAirFrom } from "./simulate-airflow";
export {
  AirflowConditionsSchema,
  SeasonConditionsSchema,
  EstimateConditionsSchema,
  DEFAULT_ESTIMATE_CONDITIONS,
} from "./schema";
export type { AirflowConditions, SeasonConditions, EstimateConditions } from "./schema";
export { depressurizationCheck } from "./depressurization";
export type { DepressurizationCheck } from "./depressurization";
export { VENT_DISCHARGE_COEFFICIENT, CAZ_LIMIT_NATURAL_DRAFT_PA, FAN_SHUTOFF_PA } from "./physics";
export type { AtticInput } from "../ventilation";
export { estimateAirflow, beforeAfterRows, describeConditions, ESTIMATE_DISCLAIMER, SEASONS } from "./season-estimate";
export type { AirflowEstimate, BeforeAfterRow, RowFigures, Season, SeasonFigures } from "./season-estimate";
