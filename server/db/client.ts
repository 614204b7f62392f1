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
  });
  const db = drizzle(sql, { schema, casing: "snake_case" });
  return { sql, db };
}

export type Database = ReturnType<typeof createDb>["db"];
export type Sql = ReturnType<typeof createDb>["sql"];
export { schema };
