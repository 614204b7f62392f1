import { and, eq, type SQL } from "drizzle-orm";
import type { PgColumn } from "drizzle-orm/pg-core";
import type { Placeholder } from "drizzle-orm";
import type { Actor } from "./request-context.ts";

/**
 * The one place tenant scoping is written: every repository query on a business table
 * filters by the actor's company through this, so a foreign id simply finds nothing (404).
 * A prepared statement passes `companyPlaceholder` and binds the actor's company at execution.
 */
export function scoped(table: { companyId: PgColumn }, actor: { companyId: Actor["companyId"] | Placeholder }, ...conditions: (SQL | undefined)[]): SQL {
  return and(eq(table.companyId, actor.companyId), ...conditions) as SQL;
}
