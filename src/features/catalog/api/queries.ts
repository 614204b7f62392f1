import { keepPreviousData, queryOptions } from "@tanstack/react-query";
import { getCatalog } from "./get-catalog";
import type { CatalogListParams } from "./types";

export const catalogKeys = {
  all: ["catalog"] as const,
  lists: () => [...catalogKeys.all, "list"] as const,
  list: (params: CatalogListParams) => [...catalogKeys.lists(), params] as const,
};

export const catalogQueries = {
  list: (params: CatalogListParams) =>
    queryOptions({
      queryKey: catalogKeys.list(params),
      queryFn: ({ signal }) => getCatalog(params, signal),
      placeholderData: keepPreviousData,
    }),
};

/** Where the CSV export downloads from (a plain link: the browser saves the file). */
export const CATALOG_EXPORT_URL = "/api/catalog/export.csv";
