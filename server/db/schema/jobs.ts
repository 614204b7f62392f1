import { pgTable, uuid, text, timestamp, integer, date, index, uniqueIndex, check } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { JobStatus } from "../../../shared/jobs/types.ts";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";
import { proposals } from "./proposals.ts";
import { users } from "./users.ts";

/**
 * The install of accepted work (issue 21): one per project, on the accepted revision, given to one
 * crew member with a date. The checklist itself is not stored: it is generated from the signed
 * scope (the frozen crew plan plus signed change orders); only the ticks are rows.
 */
export const jobs = pgTable(
  "jobs",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id),
    /** The accepted revision whose signed scope the crew installs. */
    proposalId: uuid().notNull().references(() => proposals.id),
    crewUserId: text().notNull().references(() => users.id),
    scheduledFor: date({ mode: "string" }).notNull(),
    status: text().$type<JobStatus>().notNull().default("assigned"),
    assignedBy: text().references(() => users.id, { onDelete: "set null" }),
    completedAt: timestamp({ withTimezone: true, mode: "date" }),
    completedBy: text().references(() => users.id, { onDelete: "set null" }),
    /** The homeowner's link to the completion page (hash only) and the report drawn at completion. */
    reportTokenHash: text(),
    reportPdfKey: text(),
    reportPdfSha256: text(),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("jobs_project_idx").on(t.projectId),
    index("jobs_company_crew_idx").on(t.companyId, t.crewUserId, t.scheduledFor),
    uniqueIndex("jobs_report_token_idx").on(t.reportTokenHash),
    check("jobs_status_check", sql`${t.status} in ('assigned', 'completed')`),
  ],
);

/** One ticked checklist item of a job: who ticked it, when, and the photos taken for it. */
export const jobTicks = pgTable(
  "job_ticks",
  {
    jobId: uuid().notNull().references(() => jobs.id, { onDelete: "cascade" }),
    companyId: uuid().notNull().references(() => companies.id),
    itemId: text().notNull(),
    tickedBy: text().references(() => users.id, { onDelete: "set null" }),
    tickedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("job_ticks_job_item_idx").on(t.jobId, t.itemId)],
);

export type JobRow = typeof jobs.$inferSelect;
export type JobTickRow = typeof jobTicks.$inferSelect;
