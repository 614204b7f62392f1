import { sql, type SQL } from "drizzle-orm";
import type { PgColumn, PgTable } from "drizzle-orm/pg-core";

type Columns = Record<string, PgColumn>;
export type RowOf<C extends Columns> = { [K in keyof C]: C[K]["_"]["notNull"] extends true ? C[K]["_"]["data"] : C[K]["_"]["data"] | null };

/**
 * A correlated subquery answering the rows of `from` as one JSON array, so a parent and its
 * children come back in one statement. Keys follow `columns` and each value goes through its
 * column's own decoder (timestamps become Dates again), so the rows equal those of
 * `db.select(columns)` on the same table, as Drizzle's relational queries do it.
 */
export function jsonRows<C extends Columns>(columns: C, from: PgTable, where: SQL, orderBy: SQL[]): SQL<RowOf<C>[]> {
  const entries = Object.entries(columns);
  const object = sql.join(entries.map(([key, column]) => sql`${sql.raw(`'${key}'`)}, ${column}`), sql`, `);
  return sql`(select coalesce(json_agg(json_build_object(${object}) order by ${sql.join(orderBy, sql`, `)}), '[]'::json) from ${from} where ${where})`
    .mapWith((rows: Record<string, unknown>[]) => rows.map((row) => {
      const decoded: Record<string, unknown> = {};
      for (const [key, column] of entries) decoded[key] = row[key] === null ? null : column.mapFromDriverValue(row[key] as string);
      return decoded as RowOf<C>;
    }));
}
