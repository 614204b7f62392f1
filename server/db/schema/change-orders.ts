import { pgTable, uuid, text, timestamp, integer, jsonb, index, uniqueIndex, check } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { ChangeOrderAcceptance, ChangeOrderLine, ChangeOrderSnapshot, ChangeOrderStatus } from "../../../shared/change-orders/types.ts";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";
import { proposals } from "./proposals.ts";
import { users } from "./users.ts";

/**
 * A change to signed work (issue 14): drafted against an accepted proposal revision, frozen and
 * hashed when sent, signed or declined by the homeowner through the proposal's link. Numbered
 * per accepted revision from 1. A sent one is never edited; only a signed one changes the job.
 */
export const changeOrders = pgTable(
  "change_orders",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id),
    proposalId: uuid().notNull().references(() => proposals.id),
    number: integer().notNull(),
    status: text().$type<ChangeOrderStatus>().notNull().default("draft"),
    reason: text().notNull(),
    lines: jsonb().$type<ChangeOrderLine[]>().notNull().default([]),
    photoIds: jsonb().$type<string[]>().notNull().default([]),
    snapshot: jsonb().$type<ChangeOrderSnapshot>(),
    snapshotSha256: text(),
    pdfKey: text(),
    pdfSha256: text(),
    acceptance: jsonb().$type<ChangeOrderAcceptance>(),
    declineReason: text(),
    /** The homeowner's link to this change order: only the SHA-256 of its token is kept. */
    tokenHash: text(),
    tokenId: uuid(),
    createdBy: text().references(() => users.id, { onDelete: "set null" }),
    sentBy: text().references(() => users.id, { onDelete: "set null" }),
    sentAt: timestamp({ withTimezone: true, mode: "date" }),
    decidedAt: timestamp({ withTimezone: true, mode: "date" }),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    uniqueIndex("change_orders_number_idx").on(t.proposalId, t.number),
    index("change_orders_project_idx").on(t.projectId, t.createdAt),
    uniqueIndex("change_orders_pdf_idx").on(t.pdfSha256),
    uniqueIndex("change_orders_token_hash_idx").on(t.tokenHash),
    check("change_orders_status_check", sql`${t.status} in ('draft', 'sent', 'signed', 'declined')`),
    check("change_orders_version_check", sql`${t.version} >= 1`),
  ],
);
