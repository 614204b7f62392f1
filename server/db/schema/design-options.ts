import { pgTable, uuid, text, timestamp, integer, boolean, jsonb, index, check } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { Adjustment, LaborLine, OptionSpace } from "../../../shared/schemas/options.ts";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";
import { proposals } from "./proposals.ts";

/**
 * One design option of a project: per attic space what to do with each surveyed vent and
 * which catalog items to add, plus labour lines and a discount. Its analysis and price are
 * always recomputed by shared/ from this row and the catalog, never stored.
 */
export const designOptions = pgTable(
  "design_options",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id, { onDelete: "cascade" }),
    name: text().notNull(),
    notes: text(),
    /** Display order within the project, from 0. */
    position: integer().notNull().default(0),
    spaces: jsonb().$type<OptionSpace[]>().notNull().default([]),
    laborLines: jsonb().$type<LaborLine[]>().notNull().default([]),
    discount: jsonb().$type<Adjustment>().notNull().default({ kind: "none" }),
    /** Kept options are the ones offered; others stay as drafts to compare. */
    isKept: boolean().notNull().default(true),
    origin: text().$type<"manual" | "generated">().notNull().default("manual"),
    /** The generator's explanation of its quantities, sentence by sentence. */
    rationale: jsonb().$type<string[]>().notNull().default([]),
    /** When an accepted proposal released this option's materials list to the crew (null: not released). */
    releasedAt: timestamp({ withTimezone: true, mode: "date" }),
    /** The accepted proposal revision that released it. */
    releasedByProposalId: uuid().references(() => proposals.id, { onDelete: "set null" }),
    /** Optimistic concurrency, as for projects: a save names the version it was based on. */
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("design_options_project_idx").on(t.projectId, t.position),
    index("design_options_company_idx").on(t.companyId),
    check("design_options_version_check", sql`${t.version} >= 1`),
  ],
);
