import { useMutation, useQueryClient } from "@tanstack/react-query";
import { ApiError } from "@/lib/api-client";
import { catalogKeys } from "./queries";
import type { ImportResult, ImportRowError } from "./types";

interface ImportPayload {
  created?: number;
  updated?: number;
  errors?: ImportRowError[];
  error?: { code?: string; message?: string; fields?: Record<string, string> };
}

/**
 * POST /api/catalog/import with the file's text as text/csv. All rows or none: a file with a bad
 * row answers 400 with the per-row report, which is a result to show, not a failure — so this
 * reads that answer itself instead of letting the api-client turn it into a bare error.
 */
export async function importCatalog(csv: string): Promise<ImportResult> {
  let response: Response;
  try {
    response = await fetch("/api/catalog/import", {
      method: "POST",
      headers: { "content-type": "text/csv", accept: "application/json" },
      body: csv,
      credentials: "same-origin",
    });
  } catch {
    throw new ApiError(0, "network", "Can't reach Eavesight. Check your connection and try again.");
  }
  let payload: ImportPayload = {};
  try {
    payload = (await response.json()) as ImportPayload;
  } catch {
    // An empty or non-JSON answer: the status decides below.
  }
  if (response.ok) return { created: payload.created ?? 0, updated: payload.updated ?? 0, errors: [], message: null };
  if (response.status === 400 && Array.isArray(payload.errors) && payload.errors.length > 0) {
    return { created: 0, updated: 0, errors: payload.errors, message: payload.error?.message ?? null };
  }
  const message = payload.error?.fields?.file ?? payload.error?.message ?? "The file could not be imported. Please try again.";
  throw new ApiError(response.status, payload.error?.code ?? `http-${response.status}`, message, payload.error?.fields ?? {});
}

export function useImportCatalog() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: importCatalog,
    onSuccess: (result) => (result.errors.length === 0 ? queryClient.invalidateQueries({ queryKey: catalogKeys.all }) : undefined),
  });
}
