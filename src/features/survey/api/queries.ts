import { queryOptions } from "@tanstack/react-query";
import { getEstimateConditions } from "./get-estimate-conditions";
import { getProject } from "./get-project";

export const surveyKeys = {
  all: ["projects"] as const,
  detail: (projectId: string) => [...surveyKeys.all, "detail", projectId] as const,
  estimateConditions: ["company", "estimate-conditions"] as const,
};

export const surveyQueries = {
  /**
   * The workspace reads this once to start its drafts; later refetches refresh photos and the
   * versions shown in a conflict, never the text being typed.
   */
  project: (projectId: string) =>
    queryOptions({
      queryKey: surveyKeys.detail(projectId),
      queryFn: ({ signal }) => getProject(projectId, signal),
      refetchOnWindowFocus: false,
    }),
  /** Changes rarely (the owner sets it in the company profile); offline the defaults stand in. */
  estimateConditions: () =>
    queryOptions({
      queryKey: surveyKeys.estimateConditions,
      queryFn: ({ signal }) => getEstimateConditions(signal),
      staleTime: 10 * 60_000,
    }),
};
