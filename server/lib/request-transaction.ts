import { AsyncLocalStorage } from "node:async_hooks";
import type { Database } from "../db/client.ts";

const activeTransaction = new AsyncLocalStorage<Database>();

/**
 * The database as repositories see it: inside {@link runInTransaction} every query goes through
 * that request's transaction, elsewhere through the pool. This lets a creating request write its
 * row, its audit entry and its idempotency record in one transaction without threading `tx`
 * through every service and repository.
 */
export function requestScopedDb(db: Database): Database {
  return new Proxy(db, {
    get(target, prop) {
      const active = activeTransaction.getStore() ?? target;
      const value: unknown = Reflect.get(active, prop, active);
      return typeof value === "function" ? (value as (...args: unknown[]) => unknown).bind(active) : value;
    },
  });
}

/** Runs `fn` (and everything it starts) with `tx` as the database. */
export function runInTransaction<T>(tx: Database, fn: () => T): T {
  return activeTransaction.run(tx, fn);
}
