import { pgTable, uuid, text, timestamp, integer, pgEnum, index, check } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { PROJECT_STATUSES } from "../../../shared/schemas/projects.ts";
import type { CodeBasis, RoofColor, VaporRetarder } from "../../../shared/ventilation/index.ts";
import { companies } from "./companies.ts";
import { customers } from "./customers.ts";
import { users } from "./users.ts";

export const projectStatusEnum = pgEnum("project_status", PROJECT_STATUSES);

/** One job at one address: the survey, its analysis and (later) its proposals hang off it. */
export const projects = pgTable(
  "projects",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    // Restrict: a customer with projects cannot be deleted out from under them.
    customerId: uuid().notNull().references(() => customers.id, { onDelete: "restrict" }),
    title: text().notNull(),
    siteAddress: text().notNull(),
    status: projectStatusEnum().notNull().default("lead"),
    estimatorId: text().references(() => users.id, { onDelete: "set null" }),
    climateZone: integer().notNull(),
    /** IECC moisture regime A, B or C; none in zones 7 and 8. */
    moistureRegime: text().$type<"A" | "B" | "C">(),
    codeBasis: text().$type<CodeBasis>().notNull(),
    ceilingVaporRetarder: text().$type<VaporRetarder>().notNull().default("none"),
    roofColor: text().$type<RoofColor>().notNull().default("medium"),
    notes: text(),
    /** Optimistic concurrency: every save names the version it was based on; a stale one is refused. */
    version: integer().notNull().default(1),
    /** Lower-cased title and site address, kept by PostgreSQL, for the trigram search of the list. */
    searchText: text().notNull().generatedAlwaysAs(sql`lower(title || ' ' || site_address)`),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("projects_company_updated_idx").on(t.companyId, t.updatedAt),
    index("projects_company_created_idx").on(t.companyId, t.createdAt),
    index("projects_company_status_updated_idx").on(t.companyId, t.status, t.updatedAt),
    index("projects_company_estimator_idx").on(t.companyId, t.estimatorId),
    index("projects_customer_idx").on(t.customerId),
    index("projects_search_trgm_idx").using("gin", t.searchText.op("gin_trgm_ops")),
    check("projects_climate_zone_check", sql`${t.climateZone} between 1 and 8`),
    check("projects_version_check", sql`${t.version} >= 1`),
  ],
);
