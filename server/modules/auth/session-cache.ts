import postgres from "postgres";
import type { Actor } from "../../lib/request-context.ts";
import type { Logger } from "../../lib/logger.ts";

/**
 * The channel the database notifies on whenever a signed-in request could be answered differently:
 * a session deleted (sign-out, sign-out everywhere, password change or reset, deactivation) or cut
 * short, a user's role, activity, company, e-mail or name changed. The payload is the user's id.
 * Triggers in the auth-change triggers migration (drizzle/) send it, so every path that writes those rows is covered, whichever
 * module or process wrote them.
 */
export const AUTH_CHANGE_CHANNEL = "eavesight_auth_change";

/** How long an entry may answer without the database: a backstop only, notifications evict at once. */
export const SESSION_CACHE_TTL_MS = 30_000;
const MAX_ENTRIES = 10_000;
const RELISTEN_DELAY_MS = 1_000;

export interface CachedSession {
  actor: Actor;
  /** lucia's sliding expiry as last read: an entry answers only while no extension is due. */
  expiresAt: Date;
  absoluteExpiresAt: Date;
}

interface Entry extends CachedSession {
  cachedAtMs: number;
}

/**
 * Validated sessions of signed-in users, kept in this process for a short while so a read does not
 * ask the database who is calling. It is correct across server processes because each process
 * LISTENs on AUTH_CHANGE_CHANNEL on a connection of its own and evicts a user's sessions as soon
 * as the notification arrives; PostgreSQL sends it when the change commits, before the writer's
 * own answer can reach anyone. While that connection is down (and until it is listening again)
 * the cache answers nothing and is emptied, since notifications sent meanwhile are lost.
 *
 * A read that started before a notification must not store what it read: `fillToken()` is taken
 * before the read and `set` ignores a fill whose token an eviction has outdated.
 */
export function createSessionCache(opts: { databaseUrl: string; logger: Logger; ttlMs?: number }) {
  const ttlMs = opts.ttlMs ?? SESSION_CACHE_TTL_MS;
  const bySession = new Map<string, Entry>();
  const sessionsByUser = new Map<string, Set<string>>();
  let generation = 0;
  let isListening = false;
  let isClosed = false;
  let relistenTimer: NodeJS.Timeout | undefined;

  function clear() {
    generation += 1;
    bySession.clear();
    sessionsByUser.clear();
  }

  function evictUser(userId: string) {
    generation += 1;
    const ids = sessionsByUser.get(userId);
    if (!ids) return;
    for (const id of ids) bySession.delete(id);
    sessionsByUser.delete(userId);
  }

  function forget(sessionId: string, entry: Entry) {
    bySession.delete(sessionId);
    const ids = sessionsByUser.get(entry.actor.userId);
    ids?.delete(sessionId);
    if (ids?.size === 0) sessionsByUser.delete(entry.actor.userId);
  }

  // One connection of its own, never idled out. `onnotify` is the driver's hook for notifications
  // (the one its own `listen` uses) and is missing from its types; `onclose` tells us it went down.
  const onnotify = (_channel: string, userId: string) => evictUser(userId);
  const listener = postgres(opts.databaseUrl, {
    max: 1, idle_timeout: 0, max_lifetime: 0, fetch_types: false, connect_timeout: 5, onnotice: () => {},
    onclose: () => {
      isListening = false;
      clear();
      scheduleListen();
    },
    ...{ onnotify },
  } as postgres.Options<Record<string, never>>);

  async function listen() {
    relistenTimer = undefined;
    if (isClosed) return;
    try {
      await listener.unsafe(`listen ${AUTH_CHANGE_CHANNEL}`);
      // Whatever was cached before this point may have missed a notification.
      clear();
      isListening = true;
    } catch (err) {
      opts.logger.warn({ err }, "session cache: cannot listen for auth changes; sessions are read from the database until it can");
      scheduleListen();
    }
  }
  function scheduleListen() {
    if (isClosed || relistenTimer) return;
    relistenTimer = setTimeout(() => void listen(), RELISTEN_DELAY_MS);
    relistenTimer.unref();
  }
  const ready = listen();

  return {
    /** Resolves once the first LISTEN has been tried (the cache works from then on, if it succeeded). */
    ready,
    get isListening() {
      return isListening;
    },

    /** Taken before reading a session from the database; hand it to `set`. */
    fillToken: () => generation,

    get(sessionId: string, nowMs: number): CachedSession | null {
      if (!isListening) return null;
      const entry = bySession.get(sessionId);
      if (!entry) return null;
      if (nowMs - entry.cachedAtMs >= ttlMs || nowMs - entry.cachedAtMs < 0) {
        forget(sessionId, entry);
        return null;
      }
      return entry;
    },

    set(sessionId: string, value: CachedSession, fillToken: number, nowMs: number) {
      if (!isListening || fillToken !== generation) return;
      if (bySession.size >= MAX_ENTRIES) {
        const oldest = bySession.entries().next().value;
        if (oldest) forget(oldest[0], oldest[1]);
      }
      bySession.set(sessionId, { ...value, cachedAtMs: nowMs });
      const ids = sessionsByUser.get(value.actor.userId) ?? new Set<string>();
      ids.add(sessionId);
      sessionsByUser.set(value.actor.userId, ids);
    },

    /** This process's own sign-outs evict at once, without waiting for the notification. */
    evictUser,

    async close() {
      isClosed = true;
      isListening = false;
      if (relistenTimer) clearTimeout(relistenTimer);
      clear();
      await listener.end({ timeout: 2 });
    },
  };
}
export type SessionCache = ReturnType<typeof createSessionCache>;
