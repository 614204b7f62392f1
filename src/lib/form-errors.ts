import type { FieldValues, Path, UseFormSetError } from "react-hook-form";
import { isApiError } from "./api-client";

/**
 * Puts the server's per-field messages beside the matching fields (typed input is kept) and
 * returns what is left to show above the form: the message, or null when every problem was a field.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!isApiError(error)) return "Something went wrong. Please try again.";
  let placedAny = false;
  let firstPlaced = true;
  for (const name of fieldNames) {
    const message = error.fields[name];
    if (message) {
      setError(name, { type: "server", message }, { shouldFocus: firstPlaced });
      placedAny = true;
      firstPlaced = false;
    }
  }
  const unplaced = Object.keys(error.fields).some((key) => !(fieldNames as readonly string[]).includes(key));
  return placedAny && !unplaced ? null : error.message;
}
