/**
 * What the waiting indicator says, from the counts it is given.
 *
 * @example waitingSummary(3, 2) // "3 changes and 2 photos waiting"
 * @example waitingSummary(1, 0) // "1 change waiting"
 * @example waitingSummary(0, 0) // null
 */
export function waitingSummary(changeCount: number, photoCount: number): string | null {
  const parts: string[] = [];
  if (changeCount > 0) parts.push(`${changeCount} change${changeCount === 1 ? "" : "s"}`);
  if (photoCount > 0) parts.push(`${photoCount} photo${photoCount === 1 ? "" : "s"}`);
  return parts.length === 0 ? null : `${parts.join(" and ")} waiting`;
}

/** Unsent survey and project edits are kept in localStorage under this prefix (features/survey local-drafts). */
export const UNSENT_DRAFT_PREFIX = "eavesight:unsent:";
export const DRAFTS_CHANGED_EVENT = "eavesight:drafts-changed";

/** Records (a space's survey, a project's details) with edits on this device the server has not got. */
export function countUnsentDrafts(): number {
  try {
    return Object.keys(window.localStorage).filter((key) => key.startsWith(UNSENT_DRAFT_PREFIX)).length;
  } catch {
    return 0;
  }
}
