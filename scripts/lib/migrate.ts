import path from "node:path";
import postgres from "postgres";
import { drizzle } from "drizzle-orm/postgres-js";
import { migrate } from "drizzle-orm/postgres-js/migrator";
import { projectRoot, log } from "./paths.ts";

/** Applies the reviewed SQL in drizzle/ that the database has not seen yet. Idempotent. */
export async function runMigrations(databaseUrl: string): Promise<void> {
  const sql = postgres(databaseUrl, { max: 1, onnotice: () => {} });
  try {
    await migrate(drizzle(sql), { migrationsFolder: path.join(projectRoot, "drizzle") });
    log("database migrations applied");
  } finally {
    await sql.end();
  }
}
