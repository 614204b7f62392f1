/**
 * The device copy (field mode, issue 18): the estimator's recent projects, their surveys, the
 * catalog and the session, kept in IndexedDB so the app opens and reads them with no signal.
 *
 * - One copy per user and company (`owner`), under its own key; another person signing in on the
 *   same tablet never sees it, and signing out deletes every copy (`clearDeviceCopy`).
 * - Bounded: at most `MAX_PROJECT_COPIES` project surveys and `MAX_COPY_CHARS` of JSON, the most
 *   recently fetched kept; dropped after `MAX_AGE_MS` without a visit, and when `CACHE_SHAPE` changes.
 * - Only the query roots in `KEPT_ROOTS` are kept: nothing from proposals, payments, the outbox of
 *   mails, team or settings, and nothing of the homeowner pages.
 */
import { onlineManager, type QueryClient, type QueryKey } from "@tanstack/react-query";
import { createAsyncStoragePersister } from "@tanstack/query-async-storage-persister";
import {
  persistQueryClientRestore,
  persistQueryClientSubscribe,
  type PersistedClient,
} from "@tanstack/react-query-persist-client";
import { createStore, del, get, keys, set } from "idb-keyval";
import type { Session } from "../session";
import { fieldOwner, type FieldOwner } from "./owner";
import { outbox } from "./outbox";

export const MAX_AGE_MS = 7 * 24 * 60 * 60 * 1000;
export const MAX_COPY_CHARS = 4_000_000;
export const MAX_PROJECT_COPIES = 25;
/** Raise when a kept answer changes shape, so an old copy is not read as the new one. */
export const CACHE_SHAPE = "2026-12-03";

/** The session query (features/auth `authKeys.me()`); lib/ cannot import a feature, so it is named here. */
const SESSION_KEY: QueryKey = ["auth", "me"];
/** Query roots kept on the device, with what they hold. */
export const KEPT_ROOTS: readonly QueryKey[] = [
  SESSION_KEY, // who is signed in, so the app opens offline
  ["projects", "list"], // the project list
  ["projects", "detail"], // each project's survey, spaces and photo list
  ["catalog"], // the catalog
  ["users", "estimators"], // names in the project form's estimator list
  ["company", "estimate-conditions"], // summer and winter conditions for airflow estimates
];

const startsWith = (key: QueryKey, root: QueryKey) => root.every((part, i) => key[i] === part);
/** The session itself, not queries filed under it (a drawn signature is `["auth", "me", "signature"]`). */
const isSessionKey = (key: QueryKey) => key.length === SESSION_KEY.length && startsWith(key, SESSION_KEY);
export const isKept = (key: QueryKey) => KEPT_ROOTS.some((root) => (root === SESSION_KEY ? isSessionKey(key) : startsWith(key, root)));
const isProjectCopy = (key: QueryKey) => startsWith(key, ["projects", "detail"]);

/**
 * What fits the bound: the session always, then queries newest first while the total JSON stays
 * under `maxChars`, with at most `maxProjects` project surveys.
 *
 * @example trimToBudget(client, 4_000_000, 25) // the same client with the oldest surveys left out
 */
export function trimToBudget(client: PersistedClient, maxChars = MAX_COPY_CHARS, maxProjects = MAX_PROJECT_COPIES): PersistedClient {
  const queries = client.clientState.queries;
  const byNewest = [...queries].sort((a, b) => {
    const aSession = isSessionKey(a.queryKey) ? 1 : 0;
    const bSession = isSessionKey(b.queryKey) ? 1 : 0;
    return bSession - aSession || b.state.dataUpdatedAt - a.state.dataUpdatedAt;
  });
  const kept = new Set<(typeof queries)[number]>();
  let chars = 0;
  let projects = 0;
  for (const query of byNewest) {
    const size = JSON.stringify(query).length;
    const isProject = isProjectCopy(query.queryKey);
    if (chars + size > maxChars || (isProject && projects >= maxProjects)) continue;
    kept.add(query);
    chars += size;
    if (isProject) projects += 1;
  }
  return { ...client, clientState: { ...client.clientState, mutations: [], queries: queries.filter((q) => kept.has(q)) } };
}

const store = () => createStore("eavesight-device-copy", "copies");
const copyKey = (owner: FieldOwner) => `copy:${owner.userId}:${owner.companyId}`;

function persisterFor(owner: FieldOwner) {
  const idb = store();
  return createAsyncStoragePersister({
    key: copyKey(owner),
    throttleTime: 1_000,
    storage: {
      getItem: (key) => get<string>(key, idb).then((value) => value ?? null),
      setItem: (key, value: string) => set(key, value, idb),
      removeItem: (key) => del(key, idb),
    },
    serialize: (client) => JSON.stringify(trimToBudget(client)),
  });
}

const dehydrateOptions = {
  shouldDehydrateQuery: (query: { queryKey: QueryKey; state: { status: string } }) => query.state.status === "success" && isKept(query.queryKey),
  shouldDehydrateMutation: () => false,
};

let started: Promise<void> | null = null;
let stopPersisting: (() => void) | null = null;
let current: FieldOwner | null = null;

function persistAs(queryClient: QueryClient, owner: FieldOwner) {
  stopPersisting?.();
  current = owner;
  stopPersisting = persistQueryClientSubscribe({ queryClient, persister: persisterFor(owner), buster: CACHE_SHAPE, dehydrateOptions });
}

/** Someone signed in (or the session was read): from now on the copy belongs to them. */
async function follow(queryClient: QueryClient, session: Session) {
  const owner: FieldOwner = { userId: session.user.id, companyId: session.company.id };
  if (current && current.userId === owner.userId && current.companyId === owner.companyId) return;
  if (current) {
    // Another person on this device: nothing of the previous one stays in memory.
    queryClient.removeQueries({ predicate: (q) => !isSessionKey(q.queryKey) });
  }
  fieldOwner.write(owner);
  persistAs(queryClient, owner);
  await outbox.open(owner);
}

/**
 * Restores the copy of the person who used this device last, then keeps it up to date. Route
 * loaders await it before they read the session, so an offline start sees the copy.
 */
export function ensureDeviceCopy(queryClient: QueryClient): Promise<void> {
  started ??= (async () => {
    // TanStack Query starts out "online"; the browser knows better on a reload in a dead zone.
    if (typeof navigator !== "undefined") onlineManager.setOnline(navigator.onLine);
    for (const root of KEPT_ROOTS) if (root !== SESSION_KEY) queryClient.setQueryDefaults(root, { gcTime: MAX_AGE_MS });
    const owner = fieldOwner.read();
    if (owner) {
      try {
        await persistQueryClientRestore({ queryClient, persister: persisterFor(owner), maxAge: MAX_AGE_MS, buster: CACHE_SHAPE });
      } catch {
        // IndexedDB unavailable (private mode): the app works online as before.
      }
      persistAs(queryClient, owner);
      await outbox.open(owner);
    }
    queryClient.getQueryCache().subscribe((event) => {
      if (event.type !== "updated" || !isSessionKey(event.query.queryKey)) return;
      const session = event.query.state.data as Session | null | undefined;
      if (session?.user?.id && session.company?.id) void follow(queryClient, session);
    });
  })();
  return started;
}

/** Signing out on a shared tablet: every copy, every queued change and every unsent draft goes. */
export async function clearDeviceCopy(): Promise<void> {
  stopPersisting?.();
  stopPersisting = null;
  current = null;
  fieldOwner.clear();
  await outbox.clearAll();
  try {
    const idb = store();
    const all = await keys<string>(idb);
    await Promise.all(all.map((key) => del(key, idb)));
  } catch {
    // nothing stored
  }
  try {
    for (const key of Object.keys(window.localStorage)) {
      if (key.startsWith("eavesight:unsent:") || key.startsWith("eavesight:typical-vents:")) window.localStorage.removeItem(key);
    }
  } catch {
    // storage disabled
  }
}
