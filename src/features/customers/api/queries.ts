import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { getCustomers } from "./get-customers";
import type { CustomerListParams } from "./types";

export const customerKeys = {
  all: ["customers"] as const,
  lists: () => [...customerKeys.all, "list"] as const,
  list: (params: CustomerListParams) => [...customerKeys.lists(), params] as const,
};

export const customerQueries = {
  /** Keeps the previous page on screen while the next one loads, so paging and typing never flash empty. */
  list: (params: CustomerListParams) =>
    queryOptions({
      queryKey: customerKeys.list(params),
      queryFn: ({ signal }) => getCustomers(params, signal),
      placeholderData: keepPreviousData,
    }),
};
