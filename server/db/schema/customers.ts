import { pgTable, uuid, text, timestamp, index } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { companies } from "./companies.ts";

/** The homeowners (or landlords) a contractor works for. */
export const customers = pgTable(
  "customers",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    name: text().notNull(),
    phone: text(),
    email: text(),
    billingAddress: text(),
    notes: text(),
    /**
     * Lower-cased name, e-mail and phone in one column, kept by PostgreSQL itself, so one
     * trigram index serves the "type part of anything" search of the customer list.
     */
    searchText: text()
      .notNull()
      .generatedAlwaysAs(sql`lower(name || ' ' || coalesce(email, '') || ' ' || coalesce(phone, ''))`),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("customers_company_name_idx").on(t.companyId, sql`lower(${t.name})`),
    index("customers_company_updated_idx").on(t.companyId, t.updatedAt),
    // pg_trgm (migration 0002) makes `search_text LIKE '%…%'` an index scan instead of a full read.
    index("customers_search_trgm_idx").using("gin", t.searchText.op("gin_trgm_ops")),
  ],
);
