import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { getPipeline } from "./get-pipeline";
import type { PipelinePeriodDays } from "./types";

export const pipelineKeys = {
  all: ["pipeline"] as const,
  overview: (days: PipelinePeriodDays) => [...pipelineKeys.all, days] as const,
};

export const pipelineQueries = {
  overview: (days: PipelinePeriodDays) =>
    queryOptions({ queryKey: pipelineKeys.overview(days), queryFn: ({ signal }) => getPipeline(days, signal), placeholderData: keepPreviousData }),
};
