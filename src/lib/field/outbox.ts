/**
 * Requests waiting for a signal (field mode, issue 18): attic spaces created and photos taken with
 * no connection. Each is stored in IndexedDB before the screen says it is kept, survives reloads
 * and closed tabs, and is sent in the order it was made once the browser is online:
 *
 * - a creation carries the id made on the device and one `Idempotency-Key` for all its tries, and
 *   a photo its own id, so the server stores each exactly once however often it is sent;
 * - one tab at a time sends (a Web Lock), re-reading the queue first, so two tabs never race;
 * - a try that fails for lack of signal or a server hiccup waits and goes again; a refusal (4xx)
 *   stays on the list with the server's words until the estimator retries or removes it: nothing is
 *   dropped without them seeing it.
 *
 * Edits of surveys already on the server are not here: they are saved by `useAutosave` from the
 * unsent drafts the survey keeps on the device, with the version they were based on.
 */
import { onlineManager, type QueryKey } from "@tanstack/react-query";
import { createStore, del, entries, set } from "idb-keyval";
import { ApiError } from "../api-client";
import { queryClient } from "../query-client";
import { ownerKey, type FieldOwner } from "./owner";
import { DRAFTS_CHANGED_EVENT } from "./waiting";

export type OutboxRequest =
  | { kind: "json"; path: string; body: Record<string, unknown>; idempotencyKey: string }
  | { kind: "upload"; path: string; fields: Record<string, string>; file: Blob; fileName: string };

export interface OutboxItem {
  id: string;
  seq: number;
  createdAt: string;
  /** "change" (a creation) or "photo", as the waiting indicator counts them. */
  group: "change" | "photo";
  /** What it is, in words: `Attic space "Garage attic"`, `Photo: Vent 2 (ridge vent)`. */
  label: string;
  request: OutboxRequest;
  /** Unsent drafts (localStorage keys) that must reach the server first, e.g. the survey with the vent a photo shows. */
  after: string[];
  /** Queries to refresh once it has arrived. */
  refresh: QueryKey[];
  /** What screens filter on: `{ projectId, spaceId, kind }`. */
  tags: Record<string, string>;
  /** Set when the server refused it; it stays until retried or removed. */
  failure: { status: number; message: string } | null;
}

export type NewOutboxItem = Omit<OutboxItem, "seq" | "createdAt" | "failure" | "after" | "refresh"> & Partial<Pick<OutboxItem, "after" | "refresh">>;

export interface OutboxState {
  items: readonly OutboxItem[];
  /** The item being sent now and, for a photo, how much of it has gone (0–1). */
  sending: { id: string; progress: number | null } | null;
}

const idbStore = () => createStore("eavesight-field-outbox", "items");
const storeKey = (owner: FieldOwner, seq: number) => `${ownerKey(owner)}|${String(seq).padStart(16, "0")}`;

let owner: FieldOwner | null = null;
let state: OutboxState = { items: [], sending: null };
const listeners = new Set<() => void>();
const waiters = new Map<string, { resolve: () => void; reject: (error: unknown) => void }[]>();
let lastSeq = 0;
let draining = false;
let drainAgain = false;
let timer: ReturnType<typeof setTimeout> | null = null;
let backoffMs = 2_000;

function publish(next: Partial<OutboxState>) {
  state = { ...state, ...next };
  for (const listener of listeners) listener();
}

async function readAll(who: FieldOwner): Promise<OutboxItem[]> {
  try {
    const prefix = `${ownerKey(who)}|`;
    const all = await entries<string, OutboxItem>(idbStore());
    return all.filter(([key]) => key.startsWith(prefix)).map(([, item]) => item).sort((a, b) => a.seq - b.seq);
  } catch {
    return [];
  }
}

function settle(id: string, error?: unknown) {
  for (const waiter of waiters.get(id) ?? []) {
    if (error) waiter.reject(error);
    else waiter.resolve();
  }
  waiters.delete(id);
}

const hasDraft = (key: string) => {
  try {
    return window.localStorage.getItem(key) !== null;
  } catch {
    return false;
  }
};

type Outcome = { kind: "done" } | { kind: "wait" } | { kind: "refused"; status: number; message: string };

function classify(status: number, message: string): Outcome {
  if (status >= 200 && status < 300) return { kind: "done" };
  // No signal, a server hiccup, a rate limit or an ended session (they sign in again): try later.
  if (status === 0 || status >= 500 || status === 401 || status === 408 || status === 429) return { kind: "wait" };
  return { kind: "refused", status, message };
}

const errorMessage = (text: string, status: number) => {
  try {
    const message = (JSON.parse(text) as { error?: { message?: unknown } }).error?.message;
    if (typeof message === "string" && message) return message;
  } catch {
    // not JSON
  }
  return `The server refused it (${status}).`;
};

async function sendJson(request: Extract<OutboxRequest, { kind: "json" }>): Promise<Outcome> {
  try {
    const response = await fetch(`/api${request.path}`, {
      method: "POST",
      headers: { accept: "application/json", "content-type": "application/json", "idempotency-key": request.idempotencyKey },
      body: JSON.stringify(request.body),
      credentials: "same-origin",
    });
    return classify(response.status, response.ok ? "" : errorMessage(await response.text(), response.status));
  } catch {
    return { kind: "wait" };
  }
}

function sendUpload(request: Extract<OutboxRequest, { kind: "upload" }>, onProgress: (fraction: number) => void): Promise<Outcome> {
  return new Promise((resolve) => {
    const body = new FormData();
    for (const [key, value] of Object.entries(request.fields)) body.append(key, value);
    body.append("file", request.file, request.fileName);
    const xhr = new XMLHttpRequest();
    xhr.open("POST", `/api${request.path}`);
    xhr.setRequestHeader("accept", "application/json");
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => resolve(classify(xhr.status, xhr.status >= 400 ? errorMessage(xhr.responseText, xhr.status) : ""));
    xhr.onerror = () => resolve({ kind: "wait" });
    xhr.onabort = () => resolve({ kind: "wait" });
    xhr.send(body);
  });
}

async function sendOne(item: OutboxItem): Promise<Outcome> {
  publish({ sending: { id: item.id, progress: item.request.kind === "upload" ? 0 : null } });
  try {
    if (item.request.kind === "json") return await sendJson(item.request);
    return await sendUpload(item.request, (progress) => publish({ sending: { id: item.id, progress } }));
  } finally {
    publish({ sending: null });
  }
}

async function removeStored(who: FieldOwner, item: OutboxItem) {
  await del(storeKey(who, item.seq), idbStore()).catch(() => undefined);
}

function schedule(ms: number) {
  if (timer) clearTimeout(timer);
  timer = setTimeout(() => {
    timer = null;
    void drain();
  }, ms);
}

/** One tab at a time, where the browser can say so. */
function exclusively(name: string, work: () => Promise<void>): Promise<void> {
  const locks = typeof navigator !== "undefined" ? (navigator as Navigator & { locks?: LockManager }).locks : undefined;
  return locks ? locks.request(name, async () => work()).then(() => undefined) : work();
}

/** Sends what is waiting, oldest first. */
export async function drain(): Promise<void> {
  if (draining) {
    drainAgain = true;
    return;
  }
  const who = owner;
  if (!who || !onlineManager.isOnline()) return;
  draining = true;
  let isBlocked = false;
  let mustWait = false;
  try {
    await exclusively(`eavesight-outbox:${ownerKey(who)}`, async () => {
      // Another tab may have sent some meanwhile.
      const stored = await readAll(who);
      publish({ items: stored });
      for (const [id] of waiters) if (!stored.some((i) => i.id === id)) settle(id);
      for (const item of stored) {
        if (owner !== who || !onlineManager.isOnline()) return;
        if (item.failure) continue;
        if (item.after.some(hasDraft)) {
          isBlocked = true;
          continue;
        }
        const outcome = await sendOne(item);
        if (outcome.kind === "wait") {
          mustWait = true;
          return;
        }
        if (outcome.kind === "done") {
          await removeStored(who, item);
          publish({ items: state.items.filter((i) => i.id !== item.id) });
          settle(item.id);
          for (const key of item.refresh) void queryClient.invalidateQueries({ queryKey: key });
        } else {
          const failed = { ...item, failure: { status: outcome.status, message: outcome.message } };
          await set(storeKey(who, item.seq), failed, idbStore()).catch(() => undefined);
          publish({ items: state.items.map((i) => (i.id === item.id ? failed : i)) });
          settle(item.id, new ApiError(outcome.status, "outbox-refused", outcome.message));
        }
        backoffMs = 2_000;
      }
    });
  } finally {
    draining = false;
  }
  if (drainAgain) {
    drainAgain = false;
    void drain();
  } else if (mustWait) {
    schedule(backoffMs);
    backoffMs = Math.min(backoffMs * 2, 60_000);
  } else if (isBlocked) schedule(1_500);
}

onlineManager.subscribe((isOnline) => {
  if (isOnline) void drain();
});
// A photo waiting for its survey goes as soon as that survey's draft has been sent.
if (typeof window !== "undefined") window.addEventListener(DRAFTS_CHANGED_EVENT, () => void drain());

export const outbox = {
  /** Loads the queue of this person (the device copy calls it when it knows who is signed in). */
  async open(who: FieldOwner): Promise<void> {
    owner = who;
    const items = await readAll(who);
    lastSeq = Math.max(lastSeq, ...items.map((i) => i.seq));
    publish({ items, sending: null });
    void drain();
  },

  /** Keeps a request on the device (resolved once stored), then sends it when it can. */
  async add(input: NewOutboxItem): Promise<OutboxItem> {
    const who = owner;
    if (!who) throw new Error("The device queue opens when someone is signed in.");
    lastSeq = Math.max(lastSeq + 1, Date.now());
    const item: OutboxItem = { after: [], refresh: [], ...input, seq: lastSeq, createdAt: new Date().toISOString(), failure: null };
    await set(storeKey(who, item.seq), item, idbStore());
    publish({ items: [...state.items, item] });
    void drain();
    return item;
  },

  /** Resolves when the item has arrived (at once when it is not waiting); rejects when refused. */
  whenSent(id: string): Promise<void> {
    const item = state.items.find((i) => i.id === id);
    if (!item) return Promise.resolve();
    if (item.failure) return Promise.reject(new ApiError(item.failure.status, "outbox-refused", item.failure.message));
    return new Promise((resolve, reject) => waiters.set(id, [...(waiters.get(id) ?? []), { resolve, reject }]));
  },

  /** Try a refused item again (after fixing what the server said). */
  async retry(id: string): Promise<void> {
    const who = owner;
    const item = state.items.find((i) => i.id === id);
    if (!who || !item) return;
    const again = { ...item, failure: null };
    await set(storeKey(who, item.seq), again, idbStore());
    publish({ items: state.items.map((i) => (i.id === id ? again : i)) });
    void drain();
  },

  /** The estimator chose to give one up. */
  async discard(id: string): Promise<void> {
    const who = owner;
    const item = state.items.find((i) => i.id === id);
    if (!who || !item) return;
    await removeStored(who, item);
    publish({ items: state.items.filter((i) => i.id !== id) });
    settle(id, new ApiError(0, "outbox-discarded", "Removed from this device before it was sent."));
  },

  /** Signing out on a shared device: every person's queue goes. */
  async clearAll(): Promise<void> {
    owner = null;
    try {
      const store = idbStore();
      const all = await entries<string, OutboxItem>(store);
      await Promise.all(all.map(([key]) => del(key, store)));
    } catch {
      // nothing stored
    }
    publish({ items: [], sending: null });
  },

  subscribe(listener: () => void): () => void {
    listeners.add(listener);
    return () => listeners.delete(listener);
  },
  getState: (): OutboxState => state,
};
