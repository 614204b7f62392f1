import { queryOptions } from "@tanstack/react-query";
import { getCatalog } from "./get-catalog";
import { getEstimateConditions } from "./get-estimate-conditions";
import { getMaterials } from "./get-materials";
import { getOption } from "./get-option";
import { getOptions } from "./get-options";
import { getProject } from "./get-project";

export const optionKeys = {
  all: ["options"] as const,
  lists: () => [...optionKeys.all, "list"] as const,
  list: (projectId: string) => [...optionKeys.lists(), projectId] as const,
  details: () => [...optionKeys.all, "detail"] as const,
  detail: (optionId: string) => [...optionKeys.details(), optionId] as const,
  materials: (optionId: string) => [...optionKeys.all, "materials", optionId] as const,
  project: (projectId: string) => ["projects", "detail", projectId] as const,
  catalog: () => ["catalog", "all-with-retired"] as const,
  estimateConditions: () => ["company", "estimate-conditions"] as const,
};

export const optionQueries = {
  list: (projectId: string) => queryOptions({ queryKey: optionKeys.list(projectId), queryFn: ({ signal }) => getOptions(projectId, signal) }),
  /** The editor starts its draft from this once; refetches only refresh what a conflict shows. */
  detail: (optionId: string) =>
    queryOptions({ queryKey: optionKeys.detail(optionId), queryFn: ({ signal }) => getOption(optionId, signal), refetchOnWindowFocus: false }),
  materials: (optionId: string) => queryOptions({ queryKey: optionKeys.materials(optionId), queryFn: ({ signal }) => getMaterials(optionId, signal) }),
  project: (projectId: string) =>
    queryOptions({ queryKey: optionKeys.project(projectId), queryFn: ({ signal }) => getProject(projectId, signal), refetchOnWindowFocus: false }),
  catalog: () => queryOptions({ queryKey: optionKeys.catalog(), queryFn: ({ signal }) => getCatalog(signal), staleTime: 60_000 }),
  estimateConditions: () =>
    queryOptions({ queryKey: optionKeys.estimateConditions(), queryFn: ({ signal }) => getEstimateConditions(signal), staleTime: 10 * 60_000 }),
};
