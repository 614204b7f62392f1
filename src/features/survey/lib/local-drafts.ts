/**
 * Unsent edits kept in this browser's localStorage, keyed by project or space, so a reload, a
 * closed tab or a dead battery never loses what was typed in the attic. Each entry records the
 * server version the edits were based on, to tell "mine, not sent yet" from "someone saved since".
 */
import { DRAFTS_CHANGED_EVENT, UNSENT_DRAFT_PREFIX } from "@/lib/field/waiting";

const PREFIX = UNSENT_DRAFT_PREFIX;
/** The waiting indicator counts unsent drafts; tell it when one comes or goes. */
const announce = () => window.dispatchEvent(new Event(DRAFTS_CHANGED_EVENT));

export interface StoredDraft<T> {
  baseVersion: number;
  draft: T;
  savedAt: string;
}

export const projectDraftKey = (projectId: string) => `${PREFIX}project:${projectId}`;
export const spaceDraftKey = (spaceId: string) => `${PREFIX}space:${spaceId}`;
const typicalKey = (spaceId: string) => `eavesight:typical-vents:${spaceId}`;

export function readDraft<T>(key: string): StoredDraft<T> | null {
  try {
    const raw = window.localStorage.getItem(key);
    if (!raw) return null;
    const parsed = JSON.parse(raw) as StoredDraft<T>;
    return typeof parsed?.baseVersion === "number" && parsed.draft ? parsed : null;
  } catch {
    return null;
  }
}

export function writeDraft<T>(key: string, baseVersion: number, draft: T): void {
  try {
    const isNew = window.localStorage.getItem(key) === null;
    window.localStorage.setItem(key, JSON.stringify({ baseVersion, draft, savedAt: new Date().toISOString() }));
    if (isNew) announce();
  } catch {
    // Storage full or disabled (private mode): the edit still lives in the page until it is sent.
  }
}

export function clearDraft(key: string): void {
  try {
    if (window.localStorage.getItem(key) === null) return;
    window.localStorage.removeItem(key);
    announce();
  } catch {
    // ignore: nothing to clear
  }
}

/** Vent ids still showing quick-add typical values that nobody has checked against the label. */
export function readTypicalVents(spaceId: string): string[] {
  try {
    const parsed = JSON.parse(window.localStorage.getItem(typicalKey(spaceId)) ?? "[]") as unknown;
    return Array.isArray(parsed) ? parsed.filter((v): v is string => typeof v === "string") : [];
  } catch {
    return [];
  }
}

export function writeTypicalVents(spaceId: string, ventIds: string[]): void {
  try {
    if (ventIds.length === 0) window.localStorage.removeItem(typicalKey(spaceId));
    else window.localStorage.setItem(typicalKey(spaceId), JSON.stringify(ventIds));
  } catch {
    // ignore
  }
}
