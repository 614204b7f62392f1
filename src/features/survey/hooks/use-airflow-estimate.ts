import { useQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import {
  DEFAULT_ESTIMATE_CONDITIONS,
  depressurizationCheck,
  estimateAirflow,
  simulateAirflow,
  type AirflowEstimate,
  type AirflowResult,
  type DepressurizationCheck,
  type EstimateConditions,
} from "@shared/airflow-model/index";
import { isPoweredKind, type AtticInput } from "@shared/ventilation/index";
import { surveyQueries } from "../api/queries";

export interface AirflowEstimateState {
  estimate: AirflowEstimate | null;
  /** When the survey has a fan that does not run on the summer day (dead, or below its set point): what it would do running. */
  ifFansRan: { result: AirflowResult; check: DepressurizationCheck } | null;
  conditions: EstimateConditions;
  /** True while the company's own conditions are not known (loading, offline): the defaults are used. */
  isDefaultConditions: boolean;
}

/** The airflow estimate of the attic as surveyed, for the company's summer and winter conditions. */
export function useAirflowEstimate(input: AtticInput | null): AirflowEstimateState {
  const query = useQuery(surveyQueries.estimateConditions());
  const conditions = query.data ?? DEFAULT_ESTIMATE_CONDITIONS;
  const { estimate, ifFansRan } = useMemo(() => {
    if (!input) return { estimate: null, ifFansRan: null };
    try {
      const estimate = estimateAirflow(input, conditions);
      const hasIdleFan = estimate.summer.fanCfm === 0 && input.vents.some((v) => isPoweredKind(v.kind));
      const running = hasIdleFan ? simulateAirflow(input, { ...conditions.summer, areFansRunning: true }) : null;
      return { estimate, ifFansRan: running ? { result: running, check: depressurizationCheck(running, input.site) } : null };
    } catch {
      return { estimate: null, ifFansRan: null }; // a survey still being typed: the rest of the panel still shows
    }
  }, [input, conditions]);
  return { estimate, ifFansRan, conditions, isDefaultConditions: !query.data };
}
