import { useQuery } from "@tanstack/react-query";
import { useMemo } from "react";
import { DEFAULT_ESTIMATE_CONDITIONS, estimateAirflow, type AirflowEstimate, type EstimateConditions } from "@shared/airflow-model/index";
import type { AtticInput } from "@shared/ventilation/index";
import { surveyQueries } from "../api/queries";

export interface AirflowEstimateState {
  estimate: AirflowEstimate | null;
  conditions: EstimateConditions;
  /** True while the company's own conditions are not known (loading, offline): the defaults are used. */
  isDefaultConditions: boolean;
}

/** The airflow estimate of the attic as surveyed, for the company's summer and winter conditions. */
export function useAirflowEstimate(input: AtticInput | null): AirflowEstimateState {
  const query = useQuery(surveyQueries.estimateConditions());
  const conditions = query.data ?? DEFAULT_ESTIMATE_CONDITIONS;
  const estimate = useMemo(() => {
    if (!input) return null;
    try {
      return estimateAirflow(input, conditions);
    } catch {
      return null; // a survey still being typed: the rest of the panel still shows
    }
  }, [input, conditions]);
  return { estimate, conditions, isDefaultConditions: !query.data };
}
