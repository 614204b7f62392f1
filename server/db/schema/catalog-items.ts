import { pgTable, uuid, text, timestamp, integer, doublePrecision, boolean, index, uniqueIndex, check } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { CatalogKind, CatalogUnit } from "../../../shared/schemas/catalog.ts";
import { companies } from "./companies.ts";

/**
 * One item of a company's catalog: a vent, an accessory or a kind of labour, with its rated
 * NFA (per unit or per foot), a fan's cfm, how a linear product is bought, and money in
 * integer cents. Items are retired with `isActive`, never deleted, so saved options keep their prices.
 */
export const catalogItems = pgTable(
  "catalog_items",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    sku: text().notNull(),
    name: text().notNull(),
    kind: text().$type<CatalogKind>().notNull(),
    unit: text().$type<CatalogUnit>().notNull(),
    nfaSqInPerUnit: doublePrecision(),
    nfaSqInPerFt: doublePrecision(),
    cfm: doublePrecision(),
    /** A linear product is bought in pieces of this length (e.g. ridge vent in 4 ft pieces). */
    soldInLengthFt: doublePrecision(),
    materialCostCents: integer().notNull(),
    sellPriceCents: integer().notNull(),
    laborMinutesPerUnit: integer().notNull().default(0),
    isActive: boolean().notNull().default(true),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    // "RV-4" and "rv-4" are the same code to a person, so uniqueness ignores case.
    uniqueIndex("catalog_items_company_sku_idx").on(t.companyId, sql`lower(${t.sku})`),
    index("catalog_items_company_kind_idx").on(t.companyId, t.kind),
    check("catalog_items_cents_check", sql`${t.materialCostCents} >= 0 and ${t.sellPriceCents} >= 0`),
  ],
);
