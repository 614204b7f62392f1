import { pgTable, uuid, text, timestamp, integer, jsonb, date, index, uniqueIndex, check, pgEnum, bigserial } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import type { CrewPlan, DepositRule, ProposalAcceptance, ProposalSnapshot, ScopeText } from "../../../shared/proposals/types.ts";
import { PROPOSAL_STATUSES, RENDER_STATUSES } from "../../../shared/proposals/types.ts";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";
import { users } from "./users.ts";
import type { OutgoingEmail } from "../../lib/mailer.ts";

export const proposalStatusEnum = pgEnum("proposal_status", PROPOSAL_STATUSES);
export const renderStatusEnum = pgEnum("render_status", RENDER_STATUSES);

/**
 * One revision of a proposal. A draft is edited freely; sending freezes it (snapshot + hashes)
 * and any later change makes a new revision of the same series, the old one pointing at it.
 */
export const proposals = pgTable(
  "proposals",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id, { onDelete: "cascade" }),
    /** The first revision's id; every revision of one proposal shares it. */
    seriesId: uuid().notNull(),
    revision: integer().notNull().default(1),
    status: proposalStatusEnum().notNull().default("draft"),
    coverNote: text(),
    terms: text(),
    validUntil: date({ mode: "string" }).notNull(),
    depositRule: jsonb().$type<DepositRule | null>(),
    optionIds: jsonb().$type<string[]>().notNull().default([]),
    photoIds: jsonb().$type<string[]>().notNull().default([]),
    /** Finding codes to show; null means "all of them". */
    findingCodes: jsonb().$type<string[] | null>(),
    /** Scope of work per option id, generated then edited. */
    scopes: jsonb().$type<Record<string, ScopeText>>().notNull().default({}),
    createdBy: text().references(() => users.id, { onDelete: "set null" }),
    /** Who signed and sent it; the signature itself is copied into the snapshot. */
    sellerUserId: text().references(() => users.id, { onDelete: "set null" }),
    snapshot: jsonb().$type<ProposalSnapshot>(),
    snapshotSha256: text(),
    /** Per offered option id, the crew's list as it stood when sent (null for a draft, or for an option that could not be listed). */
    crewPlans: jsonb().$type<Record<string, CrewPlan | null>>(),
    pdfKey: text(),
    pdfSha256: text(),
    /** The snapshot hash the current PDF was drawn from. */
    pdfSnapshotSha256: text(),
    renderStatus: renderStatusEnum().notNull().default("none"),
    renderAttempts: integer().notNull().default(0),
    renderError: text(),
    renderUpdatedAt: timestamp({ withTimezone: true, mode: "date" }),
    signedPdfKey: text(),
    signedPdfSha256: text(),
    signedRenderStatus: renderStatusEnum().notNull().default("none"),
    signedRenderUpdatedAt: timestamp({ withTimezone: true, mode: "date" }),
    signedRenderError: text(),
    acceptance: jsonb().$type<ProposalAcceptance>(),
    declineReason: text(),
    tokenHash: text(),
    /** A public id of the current link (never the token), recorded in events. */
    tokenId: uuid(),
    tokenExpiresAt: timestamp({ withTimezone: true, mode: "date" }),
    tokenRevokedAt: timestamp({ withTimezone: true, mode: "date" }),
    supersededBy: uuid(),
    sentAt: timestamp({ withTimezone: true, mode: "date" }),
    viewedAt: timestamp({ withTimezone: true, mode: "date" }),
    decidedAt: timestamp({ withTimezone: true, mode: "date" }),
    reminderSentAt: timestamp({ withTimezone: true, mode: "date" }),
    version: integer().notNull().default(1),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("proposals_project_idx").on(t.projectId, t.createdAt),
    index("proposals_company_status_idx").on(t.companyId, t.status, t.updatedAt),
    uniqueIndex("proposals_series_revision_idx").on(t.seriesId, t.revision),
    uniqueIndex("proposals_token_hash_idx").on(t.tokenHash),
    check("proposals_version_check", sql`${t.version} >= 1`),
  ],
);

/**
 * Links that no longer open their proposal: the SHA-256 of each token that was replaced by a new
 * link, with why it stopped (the company withdrew it, or sent a new one). Kept so a homeowner on
 * an old link is told what happened instead of "not found"; a token itself is never stored.
 */
export const proposalRetiredLinks = pgTable(
  "proposal_retired_links",
  {
    tokenHash: text().primaryKey(),
    companyId: uuid().notNull().references(() => companies.id),
    proposalId: uuid().notNull().references(() => proposals.id, { onDelete: "cascade" }),
    tokenId: uuid(),
    /** "revoked": withdrawn by the company before it was replaced; "replaced": a new link was sent. */
    reason: text().$type<"revoked" | "replaced">().notNull(),
    retiredAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("proposal_retired_links_proposal_idx").on(t.proposalId),
    check("proposal_retired_links_reason_check", sql`${t.reason} in ('revoked', 'replaced')`),
  ],
);

/**
 * What happened to a proposal, in order: sent, viewed, accepted (with the signing evidence),
 * declined, expired, reminded, link revoked. A trigger refuses UPDATE and DELETE.
 */
export const proposalEvents = pgTable(
  "proposal_events",
  {
    id: bigserial({ mode: "number" }).primaryKey(),
    companyId: uuid().notNull(),
    proposalId: uuid().notNull(),
    event: text().notNull(),
    /** UTC. */
    at: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    userId: text(),
    ip: text(),
    userAgent: text(),
    tokenId: uuid(),
    snapshotSha256: text(),
    pdfSha256: text(),
    consentTextVersion: text(),
    detail: jsonb().$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [index("proposal_events_proposal_idx").on(t.proposalId, t.id)],
);

/**
 * The outbox of a proposal's e-mails: one row per e-mail it should cause (e.g. "send:<proposal id>"),
 * holding the message itself. The row is the truth, the queued job only a nudge: a worker takes a
 * lease on the row, sends, and marks it delivered, so a retried job, a second click or a server
 * killed mid-send never mails twice, and the recovery sweep re-queues rows whose job was lost.
 */
export const proposalMails = pgTable("proposal_mails", {
  dedupeKey: text().primaryKey(),
  companyId: uuid().notNull(),
  proposalId: uuid().notNull(),
  kind: text().notNull(),
  toAddress: text().notNull(),
  /** The message as queued; null only for rows written before the outbox kept messages. */
  payload: jsonb().$type<OutgoingEmail>(),
  queuedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  /** A worker is sending until then; a lease left by a process that died simply runs out. */
  leaseUntil: timestamp({ withTimezone: true, mode: "date" }),
  deliveredAt: timestamp({ withTimezone: true, mode: "date" }),
});
