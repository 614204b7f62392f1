import { randomUUID } from "node:crypto";
import type { EstimateConditions } from "../../../shared/airflow-model/schema.ts";
import { and, asc, desc, eq, inArray, isNotNull, isNull, lt, lte, or, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { changeOrders, companies, customers, designOptions, photos, projects, proposalEvents, proposalMails, proposalRetiredLinks, proposals, userSignatures, users } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { ProposalStatus } from "../../../shared/proposals/types.ts";
import type { OutgoingEmail } from "../../lib/mailer.ts";

/** Only the company matters for scoping; jobs and the homeowner's link have no signed-in actor. */
export interface Tenant {
  companyId: string;
}

/** An e-mail for the outbox: its once-only key (e.g. "send:<proposal id>"), kind and message. */
export interface OutboxMail {
  dedupeKey: string;
  kind: string;
  message: OutgoingEmail;
}
const outboxRow = (tenant: Tenant, proposalId: string, mail: OutboxMail) => ({
  dedupeKey: mail.dedupeKey, companyId: tenant.companyId, proposalId, kind: mail.kind, toAddress: mail.message.to, payload: mail.message,
});

export type ProposalRow = typeof proposals.$inferSelect;
export type ProposalWrite = Partial<Omit<typeof proposals.$inferInsert, "id" | "companyId" | "version" | "createdAt">>;
export type ProposalEventRow = typeof proposalEvents.$inferSelect;
export type NewProposalEvent = Omit<typeof proposalEvents.$inferInsert, "id" | "at" | "companyId" | "proposalId"> & { at?: Date };

export interface CompanySettings {
  /** Absent = on: the three-day notice is the law for sales made at the buyer's home (16 CFR 429), where these jobs are sold. */
  isCoolingOffNoticeEnabled?: boolean;
  defaultClimateZone?: number;
  unitSystem?: "imperial" | "metric";
  reminderDays?: number | null;
  /** The 1/300 upper-vent share reading; "required" (literal) when absent. */
  upperShareBase?: "required" | "provided";
  logoStorageKey?: string | null;
  logoContentType?: string | null;
  logoSha256?: string | null;
  /** Summer and winter conditions for airflow estimates; the defaults when absent. */
  estimateConditions?: EstimateConditions;
}

export function createProposalsRepository(db: Database) {
  return {
    async company(tenant: Tenant) {
      const [row] = await db.select().from(companies).where(eq(companies.id, tenant.companyId)).limit(1);
      return row ? { ...row, settings: row.settings as CompanySettings } : null;
    },

    async updateCompany(tenant: Tenant, patch: Partial<typeof companies.$inferInsert>) {
      const [row] = await db.update(companies).set(patch).where(eq(companies.id, tenant.companyId)).returning();
      return row ? { ...row, settings: row.settings as CompanySettings } : null;
    },

    /** A user of the company with the saved signature, if any. */
    async user(tenant: Tenant, userId: string) {
      const [row] = await db
        .select({ id: users.id, name: users.name, email: users.email, signatureTyped: userSignatures.typed, signatureDataUrl: userSignatures.drawnPngDataUrl })
        .from(users)
        .leftJoin(userSignatures, eq(userSignatures.userId, users.id))
        .where(scoped(users, tenant, eq(users.id, userId))).limit(1);
      return row ?? null;
    },

    async setSignature(tenant: Tenant, userId: string, signature: { signatureTyped: string | null; signatureDataUrl: string | null }) {
      const values = { typed: signature.signatureTyped, drawnPngDataUrl: signature.signatureDataUrl, updatedAt: new Date() };
      await db.insert(userSignatures).values({ userId, companyId: tenant.companyId, ...values })
        .onConflictDoUpdate({ target: userSignatures.userId, set: values, where: eq(userSignatures.companyId, tenant.companyId) });
    },

    async setCustomerEmail(tenant: Tenant, id: string, email: string) {
      const [row] = await db.update(customers).set({ email, updatedAt: new Date() }).where(scoped(customers, tenant, eq(customers.id, id)))
        .returning({ id: customers.id, name: customers.name, email: customers.email, phone: customers.phone });
      return row ?? null;
    },

    async customer(tenant: Tenant, id: string) {
      const [row] = await db.select({ id: customers.id, name: customers.name, email: customers.email, phone: customers.phone })
        .from(customers).where(scoped(customers, tenant, eq(customers.id, id))).limit(1);
      return row ?? null;
    },

    photosFor: (tenant: Tenant, projectId: string, ids: string[]) =>
      ids.length === 0
        ? Promise.resolve([])
        : db.select({ id: photos.id, caption: photos.caption, findingCode: photos.findingCode, storageKey: photos.storageKey, contentType: photos.contentType })
            .from(photos).where(scoped(photos, tenant, eq(photos.projectId, projectId), inArray(photos.id, ids))),

    /** One photo's stored files, for the company only (the homeowner's link checks the snapshot first). */
    async photoFiles(tenant: Tenant, id: string) {
      const [row] = await db.select({ id: photos.id, storageKey: photos.storageKey, thumbKey: photos.thumbKey, contentType: photos.contentType })
        .from(photos).where(scoped(photos, tenant, eq(photos.id, id))).limit(1);
      return row ?? null;
    },

    async find(tenant: Tenant, id: string): Promise<ProposalRow | null> {
      const [row] = await db.select().from(proposals).where(scoped(proposals, tenant, eq(proposals.id, id))).limit(1);
      return row ?? null;
    },

    /** The homeowner's link: found by the SHA-256 of its token only. */
    async findByTokenHash(tokenHash: string): Promise<ProposalRow | null> {
      const [row] = await db.select().from(proposals).where(eq(proposals.tokenHash, tokenHash)).limit(1);
      return row ?? null;
    },

    /** A link that was replaced by a newer one: why it stopped, and nothing else. */
    async findRetiredLink(tokenHash: string): Promise<{ reason: "revoked" | "replaced" } | null> {
      const [row] = await db.select({ reason: proposalRetiredLinks.reason }).from(proposalRetiredLinks).where(eq(proposalRetiredLinks.tokenHash, tokenHash)).limit(1);
      return row ?? null;
    },

    /**
     * A new homeowner link in place of the current one, in one transaction: the old token's hash is
     * kept as retired (so its holder is told what happened), the proposal takes the new one (only if
     * the link is still the one read: two clicks make one new link), the event is written and the
     * e-mail with the new link goes into the outbox. Null when the link changed meanwhile.
     */
    reissueLink: (tenant: Tenant, old: ProposalRow, next: { tokenHash: string; tokenId: string }, reason: "revoked" | "replaced", event: NewProposalEvent, mail: OutboxMail) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(proposals)
          .set({ tokenHash: next.tokenHash, tokenId: next.tokenId, tokenRevokedAt: null, updatedAt: new Date() })
          .where(scoped(proposals, tenant, eq(proposals.id, old.id), eq(proposals.tokenHash, old.tokenHash!), isNull(proposals.supersededBy)))
          .returning();
        if (!row) return null;
        await tx.insert(proposalRetiredLinks).values({ tokenHash: old.tokenHash!, companyId: tenant.companyId, proposalId: old.id, tokenId: old.tokenId, reason });
        await tx.insert(proposalEvents).values({ ...event, companyId: tenant.companyId, proposalId: old.id });
        await tx.insert(proposalMails).values(outboxRow(tenant, old.id, mail));
        return row;
      }),

    /** The outbox e-mail that carried this link to the homeowner: a re-issued link's own, else the first sending's. */
    async mailCarryingLink(tenant: Tenant, proposalId: string, tokenId: string | null): Promise<OutgoingEmail | null> {
      const keys = [`send:${proposalId}`, ...(tokenId ? [`link:${tokenId}`] : [])];
      const rows = await db.select({ key: proposalMails.dedupeKey, payload: proposalMails.payload }).from(proposalMails)
        .where(and(eq(proposalMails.companyId, tenant.companyId), eq(proposalMails.proposalId, proposalId), inArray(proposalMails.dedupeKey, keys)));
      const own = rows.find((r) => r.key.startsWith("link:")) ?? rows.find((r) => r.key.startsWith("send:"));
      return own?.payload ?? null;
    },

    /**
     * A resend: the e-mail and its "resent" event in one transaction, under the proposal row's lock,
     * so parallel clicks queue one after another and each sees the one before. False (nothing
     * written) when the last resend is younger than `minIntervalMs`: a double click, or a burst
     * that would flood the homeowner's inbox, sends one e-mail.
     */
    queueResend: (tenant: Tenant, proposalId: string, mail: Omit<OutboxMail, "dedupeKey">, event: NewProposalEvent, now: Date, minIntervalMs: number): Promise<string | null> =>
      db.transaction(async (tx) => {
        const [locked] = await tx.select({ id: proposals.id }).from(proposals).where(scoped(proposals, tenant, eq(proposals.id, proposalId))).for("update");
        if (!locked) return null;
        const earlier = await tx.select({ at: proposalEvents.at }).from(proposalEvents)
          .where(scoped(proposalEvents, tenant, eq(proposalEvents.proposalId, proposalId), eq(proposalEvents.event, "resent"))).orderBy(desc(proposalEvents.at));
        if (earlier[0] && now.getTime() - earlier[0].at.getTime() < minIntervalMs) return null;
        const dedupeKey = `resend:${proposalId}:${earlier.length + 1}`;
        await tx.insert(proposalMails).values(outboxRow(tenant, proposalId, { ...mail, dedupeKey }));
        await tx.insert(proposalEvents).values({ ...event, at: now, companyId: tenant.companyId, proposalId });
        return dedupeKey;
      }),

    listForProject: (tenant: Tenant, projectId: string) =>
      db.select().from(proposals).where(scoped(proposals, tenant, eq(proposals.projectId, projectId))).orderBy(desc(proposals.createdAt), desc(proposals.revision)),

    async insert(tenant: Tenant, values: ProposalWrite & Pick<typeof proposals.$inferInsert, "projectId" | "seriesId" | "validUntil">): Promise<ProposalRow> {
      const [row] = await db.insert(proposals).values({ ...values, companyId: tenant.companyId }).returning();
      return row!;
    },

    /** Optimistic update; `onlyStatuses` keeps a frozen or decided revision from being changed under a race. */
    async updateIfVersion(tenant: Tenant, id: string, version: number, patch: ProposalWrite, onlyStatuses?: ProposalStatus[]): Promise<ProposalRow | null> {
      const [row] = await db.update(proposals)
        .set({ ...patch, version: sql`${proposals.version} + 1`, updatedAt: new Date() })
        .where(scoped(proposals, tenant, eq(proposals.id, id), eq(proposals.version, version), onlyStatuses ? inArray(proposals.status, onlyStatuses) : undefined))
        .returning();
      return row ?? null;
    },

    /** An unconditional system update (render results, status changes by jobs); `when` narrows it. */
    async update(tenant: Tenant, id: string, patch: ProposalWrite, when?: ReturnType<typeof and>): Promise<ProposalRow | null> {
      const [row] = await db.update(proposals).set({ ...patch, updatedAt: new Date() })
        .where(scoped(proposals, tenant, eq(proposals.id, id), when)).returning();
      return row ?? null;
    },

    /**
     * The homeowner's acceptance, in one transaction: the proposal moves to accepted (only from sent or
     * viewed, at the version read), the "accepted" event with the signing evidence is written, the
     * accepted option's materials list is released to the crew and the project becomes sold. The
     * signed PDF and its e-mails follow from `signedRenderStatus: "queued"` in the same commit (the
     * recovery sweep queues them should the process die before its job is sent). A crash leaves all
     * of it or none.
     */
    acceptAndRelease: (tenant: Tenant, id: string, version: number, optionId: string, patch: ProposalWrite, event: NewProposalEvent, projectId: string, now: Date) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(proposals)
          .set({ ...patch, version: sql`${proposals.version} + 1`, updatedAt: now })
          .where(scoped(proposals, tenant, eq(proposals.id, id), eq(proposals.version, version), inArray(proposals.status, ["sent", "viewed"]), isNull(proposals.supersededBy)))
          .returning();
        if (!row) return null;
        await tx.insert(proposalEvents).values({ ...event, companyId: tenant.companyId, proposalId: id });
        // Released once: a second proposal offering the same option leaves the first release (and its frozen list) in place.
        await tx.update(designOptions).set({ releasedAt: now, releasedByProposalId: id })
          .where(scoped(designOptions, tenant, eq(designOptions.id, optionId), isNull(designOptions.releasedAt)));
        await tx.update(projects).set({ status: "sold", version: sql`${projects.version} + 1`, updatedAt: now })
          .where(scoped(projects, tenant, eq(projects.id, projectId)));
        return row;
      }),

    /** Only the first open of the link counts: the status moves from sent to viewed once. */
    async markViewed(tenant: Tenant, id: string, now: Date): Promise<ProposalRow | null> {
      const [row] = await db.update(proposals).set({ status: "viewed", viewedAt: now, updatedAt: now })
        .where(scoped(proposals, tenant, eq(proposals.id, id), eq(proposals.status, "sent"))).returning();
      return row ?? null;
    },

    /**
     * A new draft revision made from a sent one, and the old one pointing at it, in one transaction;
     * null (nothing written) when the old one was accepted, revised or changed since it was read.
     * The old row is claimed first, so a homeowner accepting at the same moment waits on its lock
     * and then finds it superseded, or the revise finds it accepted.
     */
    reviseFrom: (tenant: Tenant, old: ProposalRow, values: ProposalWrite): Promise<ProposalRow | null> =>
      db.transaction(async (tx) => {
        const nextId = randomUUID();
        const [marked] = await tx.update(proposals).set({ supersededBy: nextId, updatedAt: new Date(), version: sql`${proposals.version} + 1` })
          .where(scoped(proposals, tenant, eq(proposals.id, old.id), eq(proposals.version, old.version), isNull(proposals.supersededBy), inArray(proposals.status, ["sent", "viewed", "declined", "expired"])))
          .returning({ id: proposals.id });
        if (!marked) return null;
        const [next] = await tx.insert(proposals).values({
          id: nextId, companyId: tenant.companyId, projectId: old.projectId, seriesId: old.seriesId, revision: old.revision + 1,
          validUntil: old.validUntil, coverNote: old.coverNote, terms: old.terms, depositRule: old.depositRule,
          optionIds: old.optionIds, photoIds: old.photoIds, findingCodes: old.findingCodes, scopes: old.scopes,
          createdBy: old.createdBy, ...values, status: "draft",
        }).returning();
        return next!;
      }),

    async addEvent(tenant: Tenant, proposalId: string, event: NewProposalEvent) {
      await db.insert(proposalEvents).values({ ...event, companyId: tenant.companyId, proposalId });
    },

    events: (tenant: Tenant, proposalId: string) =>
      db.select().from(proposalEvents).where(scoped(proposalEvents, tenant, eq(proposalEvents.proposalId, proposalId))).orderBy(asc(proposalEvents.id)),

    /** Is this hash one of a sent change order's PDF? Its accepted revision's number and the company's name as printed come along. */
    async findChangeOrderByPdfHash(sha256: string) {
      const [row] = await db
        .select({
          number: changeOrders.number, status: changeOrders.status, sentAt: changeOrders.sentAt, decidedAt: changeOrders.decidedAt, revision: proposals.revision,
          companyName: sql<string | null>`${changeOrders.snapshot}->'company'->>'name'`,
        })
        .from(changeOrders).innerJoin(proposals, eq(proposals.id, changeOrders.proposalId))
        .where(eq(changeOrders.pdfSha256, sha256)).limit(1);
      return row ?? null;
    },

    /** Is this hash one of a recorded PDF (as sent, or signed)? With what the public check may say about it. */
    async findByPdfHash(sha256: string) {
      const [row] = await db
        .select({
          revision: proposals.revision, status: proposals.status, pdfSha256: proposals.pdfSha256, signedPdfSha256: proposals.signedPdfSha256,
          sentAt: proposals.sentAt, decidedAt: proposals.decidedAt, supersededBy: proposals.supersededBy,
          signedAt: sql<string | null>`${proposals.acceptance}->>'acceptedAt'`,
          companyName: sql<string | null>`${proposals.snapshot}->'company'->>'name'`,
        })
        .from(proposals)
        .where(sql`${proposals.status} <> 'draft' and (${proposals.pdfSha256} = ${sha256} or ${proposals.signedPdfSha256} = ${sha256})`)
        .limit(1);
      return row ?? null;
    },

    /**
     * Sending, in one transaction: the draft becomes sent (at the version read), the "sent" event is
     * written, the e-mail to the homeowner goes into the outbox and the project becomes proposed.
     * A crash leaves all of it or none, never a sent proposal whose e-mail nobody will send.
     */
    markSent: (tenant: Tenant, id: string, version: number, patch: ProposalWrite, event: NewProposalEvent, mail: OutboxMail, projectId: string) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(proposals)
          .set({ ...patch, version: sql`${proposals.version} + 1`, updatedAt: new Date() })
          .where(scoped(proposals, tenant, eq(proposals.id, id), eq(proposals.version, version), eq(proposals.status, "draft")))
          .returning();
        if (!row) return null;
        await tx.insert(proposalEvents).values({ ...event, companyId: tenant.companyId, proposalId: id });
        await tx.insert(proposalMails).values(outboxRow(tenant, id, mail)).onConflictDoNothing();
        await tx.update(projects).set({ status: "proposed", version: sql`${projects.version} + 1`, updatedAt: new Date() })
          .where(scoped(projects, tenant, eq(projects.id, projectId), inArray(projects.status, ["lead", "surveyed"])));
        return row;
      }),

    /** Puts a once-only e-mail in the outbox; false when its key was queued before. */
    async queueMail(tenant: Tenant, proposalId: string, mail: OutboxMail): Promise<boolean> {
      const rows = await db.insert(proposalMails).values(outboxRow(tenant, proposalId, mail))
        .onConflictDoNothing().returning({ key: proposalMails.dedupeKey });
      return rows.length > 0;
    },

    /**
     * Takes the lease on an undelivered outbox row and returns its message, or null when it was
     * delivered already or another worker holds a lease that has not run out.
     */
    async leaseMail(dedupeKey: string, now: Date, leaseMs: number): Promise<OutgoingEmail | null> {
      const [row] = await db.update(proposalMails).set({ leaseUntil: new Date(now.getTime() + leaseMs) })
        .where(and(eq(proposalMails.dedupeKey, dedupeKey), isNull(proposalMails.deliveredAt), isNotNull(proposalMails.payload),
          or(isNull(proposalMails.leaseUntil), lt(proposalMails.leaseUntil, now))))
        .returning({ payload: proposalMails.payload });
      return row?.payload ?? null;
    },
    async markMailDelivered(dedupeKey: string, now: Date) {
      await db.update(proposalMails).set({ deliveredAt: now, leaseUntil: null }).where(eq(proposalMails.dedupeKey, dedupeKey));
    },
    /** After a failed attempt: the next retry may take the row at once. */
    async releaseMailLease(dedupeKey: string) {
      await db.update(proposalMails).set({ leaseUntil: null }).where(and(eq(proposalMails.dedupeKey, dedupeKey), isNull(proposalMails.deliveredAt)));
    },

    /**
     * Outbox rows still undelivered, unleased and last queued before `before`: their job was lost
     * (a server killed after committing) or gave up. Marks them queued now, so the next sweep waits.
     */
    mailsToRecover: (now: Date, before: Date) =>
      db.update(proposalMails).set({ queuedAt: now })
        .where(and(isNull(proposalMails.deliveredAt), isNotNull(proposalMails.payload), lt(proposalMails.queuedAt, before),
          or(isNull(proposalMails.leaseUntil), lt(proposalMails.leaseUntil, now))))
        .returning({ dedupeKey: proposalMails.dedupeKey }),

    /** Renders queued or running since before `before` (their job was lost with its server); marked touched now. */
    rendersToRecover: (now: Date, before: Date) =>
      db.update(proposals).set({ renderUpdatedAt: now })
        .where(and(inArray(proposals.renderStatus, ["queued", "rendering"]), isNotNull(proposals.snapshotSha256), lt(proposals.renderUpdatedAt, before)))
        .returning({ id: proposals.id, companyId: proposals.companyId, snapshotSha256: proposals.snapshotSha256 }),
    signedRendersToRecover: (now: Date, before: Date) =>
      db.update(proposals).set({ signedRenderUpdatedAt: now })
        .where(and(inArray(proposals.signedRenderStatus, ["queued", "rendering"]), lt(proposals.signedRenderUpdatedAt, before)))
        .returning({ id: proposals.id, companyId: proposals.companyId }),

    /** Sent or viewed revisions whose link is past its expiry, across companies (the sweep). */
    dueToExpire: (now: Date) =>
      db.select({ id: proposals.id, companyId: proposals.companyId, tokenId: proposals.tokenId })
        .from(proposals)
        .where(and(inArray(proposals.status, ["sent", "viewed"]), isNull(proposals.supersededBy), lte(proposals.tokenExpiresAt, now))),
  };
}
export type ProposalsRepository = ReturnType<typeof createProposalsRepository>;
