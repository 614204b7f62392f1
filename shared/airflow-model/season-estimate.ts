/**
 * The airflow estimate for the company's stated summer and winter conditions, and an option's
 * before → after figures, as plain data the survey panel, the compare view and the PDF all show.
 */
import { formatNumber } from "../units/format";
import type { AtticInput } from "../ventilation";
import { depressurizationCheck, type DepressurizationCheck } from "./depressurization";
import type { EstimateConditions, SeasonConditions } from "./schema";
import { simulateAirflow, type AirflowResult, type FanAirFrom } from "./simulate-airflow";

export type Season = "summer" | "winter";
export const SEASONS: readonly Season[] = ["summer", "winter"];

export interface SeasonFigures {
  conditions: SeasonConditions;
  /** Conditioned air drawn up through the ceiling into the attic, cfm. */
  houseAirDrawnCfm: number;
  atticAirChangesPerHour: number;
  fanCfm: number;
  fanAirFrom: FanAirFrom;
  /** The fans' pull on the house, Pa (negative), or null when none runs. */
  houseDepressurizationByFansPa: number | null;
  depressurization: DepressurizationCheck;
}

export interface AirflowEstimate {
  summer: SeasonFigures;
  winter: SeasonFigures;
  /** Every assumption either season made, once. */
  assumptions: string[];
  /** The model's whole answers (every opening's flow and the reasons), for the picture and the details. */
  results: Record<Season, AirflowResult>;
}

/** Plain words for a season's conditions: "summer: 92 °F outdoors, attic 130 °F, house 75 °F, calm". */
export function describeConditions(season: Season, c: SeasonConditions): string {
  const wind = c.windMph > 0 ? `wind ${formatNumber(c.windMph, { maxFractionDigits: 0 })} mph` : "calm";
  return `${season}: ${formatNumber(c.outdoorTempF)} °F outdoors, attic ${formatNumber(c.atticTempF)} °F, house ${formatNumber(c.houseTempF)} °F, ${wind}`;
}

function figures(input: AtticInput, conditions: SeasonConditions): { figures: SeasonFigures; result: AirflowResult } {
  const result = simulateAirflow(input, conditions);
  return {
    result,
    figures: {
      conditions,
      houseAirDrawnCfm: result.houseAirDrawnCfm,
      atticAirChangesPerHour: result.atticAirChangesPerHour,
      fanCfm: result.fanCfm,
      fanAirFrom: result.fanAirFrom,
      houseDepressurizationByFansPa: result.houseDepressurizationByFansPa,
      depressurization: depressurizationCheck(result, input.site),
    },
  };
}

/**
 * @example
 * estimateAirflow(input, DEFAULT_ESTIMATE_CONDITIONS).summer.houseAirDrawnCfm // e.g. 103
 */
export function estimateAirflow(input: AtticInput, conditions: EstimateConditions): AirflowEstimate {
  const summer = figures(input, conditions.summer);
  const winter = figures(input, conditions.winter);
  return {
    summer: summer.figures,
    winter: winter.figures,
    assumptions: [...new Set([...summer.result.assumptions, ...winter.result.assumptions])],
    results: { summer: summer.result, winter: winter.result },
  };
}

export interface BeforeAfterRow {
  season: Season;
  /** What is measured, in words. */
  label: string;
  before: string;
  after: string;
  /** The whole row as one sentence, e.g. "Summer: house air drawn into the attic 380 → 0 cfm". */
  sentence: string;
}

const cfm = (n: number) => `${formatNumber(n, { maxFractionDigits: 0 })} cfm`;
const perHour = (n: number) => `${formatNumber(n, { maxFractionDigits: 1 })} per hour`;
const pull = (n: number | null) => (n === null ? "no fan" : `${formatNumber(-n, { maxFractionDigits: 1 })} Pa`);

/** What a before → after row needs of one season (an estimate, or a proposal's frozen copy of one). */
export type RowFigures = Record<Season, Pick<SeasonFigures, "houseAirDrawnCfm" | "atticAirChangesPerHour" | "houseDepressurizationByFansPa">>;

/** An option's before → after figures, season by season. */
export function beforeAfterRows(before: RowFigures, after: RowFigures): BeforeAfterRow[] {
  const rows: BeforeAfterRow[] = [];
  for (const season of SEASONS) {
    const b = before[season];
    const a = after[season];
    const cap = season === "summer" ? "Summer" : "Winter";
    const add = (label: string, from: string, to: string) => rows.push({ season, label, before: from, after: to, sentence: `${cap}: ${label} ${from} → ${to}` });
    add("house air drawn into the attic", cfm(b.houseAirDrawnCfm), cfm(a.houseAirDrawnCfm));
    add("attic air changes", perHour(b.atticAirChangesPerHour), perHour(a.atticAirChangesPerHour));
    if (b.houseDepressurizationByFansPa !== null || a.houseDepressurizationByFansPa !== null) {
      add("fans' pull on the house", pull(b.houseDepressurizationByFansPa), pull(a.houseDepressurizationByFansPa));
    }
  }
  return rows;
}

/** Said wherever the figures are shown. */
export const ESTIMATE_DISCLAIMER =
  "These airflow figures are estimates from a simplified physics model (two spaces, each vent an opening at one height), not measurements. Real houses differ; a blower-door and pressure test measure what the model estimates.";
