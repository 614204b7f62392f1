import postgres from "postgres";
import { drizzle } from "drizzle-orm/postgres-js";
import * as schema from "./schema/index.ts";

export function createDb(url: string, opts: { max?: number } = {}) {
  const sql = postgres(url, {
    max: opts.max ?? 10,
    onnotice: () => {},
    // Fail fast while the database is down so requests answer 503 instead of hanging.
    connect_timeout: 5,
    idle_timeout: 30,
    // The driver's default waits up to 20 s between reconnects once a few have failed, so after a
    // database restart requests would hang that long; at most ~1 s (with jitter) they recover at once.
    backoff: (retries: number) => (0.5 + Math.random() / 2) * Math.min(0.05 * 2 ** retries, 1),
  });
  const db = drizzle(sql, { schema, casing: "snake_case" });
  return { sql, db };
}

export type Database = ReturnType<typeof createDb>["db"];
export type Sql = ReturnType<typeof createDb>["sql"];
export { schema };
