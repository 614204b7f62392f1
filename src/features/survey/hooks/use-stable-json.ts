import { useMemo } from "react";

/**
 * The same plain data, kept as the same object until its content changes, so a memoised child
 * given a list rebuilt on every render (from the drafts or the analysis) renders only when it differs.
 */
export function useStableJson<T>(value: T): T {
  const key = JSON.stringify(value);
  return useMemo(() => JSON.parse(key) as T, [key]);
}
