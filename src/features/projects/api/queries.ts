import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { findCustomers, getCustomer } from "./find-customers";
import { getEstimators } from "./get-estimators";
import { getProjectDefaults } from "./get-project-defaults";
import { getProjects } from "./get-projects";
import type { ProjectListParams } from "./types";

export const projectKeys = {
  all: ["projects"] as const,
  lists: () => [...projectKeys.all, "list"] as const,
  list: (params: ProjectListParams) => [...projectKeys.lists(), params] as const,
  estimators: () => ["users", "estimators"] as const,
  customerSearches: () => [...projectKeys.all, "customer-search"] as const,
  customerSearch: (q: string) => [...projectKeys.customerSearches(), q] as const,
  customer: (id: string) => [...projectKeys.all, "customer", id] as const,
  defaults: () => ["company", "project-defaults"] as const,
};

export const projectQueries = {
  /** Server pages; the previous page stays on screen while the next loads. */
  list: (params: ProjectListParams) =>
    queryOptions({
      queryKey: projectKeys.list(params),
      queryFn: ({ signal }) => getProjects(params, signal),
      placeholderData: keepPreviousData,
    }),
  estimators: () =>
    queryOptions({ queryKey: projectKeys.estimators(), queryFn: ({ signal }) => getEstimators(signal), staleTime: 5 * 60_000 }),
  customerSearch: (q: string) =>
    queryOptions({
      queryKey: projectKeys.customerSearch(q),
      queryFn: ({ signal }) => findCustomers(q, signal),
      placeholderData: keepPreviousData,
    }),
  customer: (id: string) =>
    queryOptions({ queryKey: projectKeys.customer(id), queryFn: ({ signal }) => getCustomer(id, signal) }),
  /** The company's defaults for a new project (climate zone, code basis). */
  defaults: () =>
    queryOptions({ queryKey: projectKeys.defaults(), queryFn: ({ signal }) => getProjectDefaults(signal), staleTime: 5 * 60_000 }),
};
