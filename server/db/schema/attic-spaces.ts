import { pgTable, uuid, text, timestamp, integer, jsonb, index } from "drizzle-orm/pg-core";
import type { Section, Vent } from "../../../shared/ventilation/index.ts";
import type { SiteChecklist, SpaceRoof } from "../../../shared/schemas/survey.ts";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";

/**
 * One separately vented attic space of a project. The survey parts are JSON validated by the
 * core's own zod schemas on the way in, so what is stored is always something the core can read.
 */
export const atticSpaces = pgTable(
  "attic_spaces",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id, { onDelete: "cascade" }),
    name: text().notNull(),
    /** Display order within the project, from 0. */
    position: integer().notNull().default(0),
    roof: jsonb().$type<SpaceRoof>().notNull(),
    sections: jsonb().$type<Section[]>().notNull().default([]),
    vents: jsonb().$type<Vent[]>().notNull().default([]),
    site: jsonb().$type<SiteChecklist>().notNull().default({}),
    notes: text(),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("attic_spaces_project_idx").on(t.projectId, t.position)],
);
