import { and, asc, desc, eq, inArray, isNotNull, isNull, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { changeOrders, customers, jobs, jobTicks, payments, photos, projects, proposalEvents, proposalMails, proposals, users, type JobRow } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { NewProposalEvent, OutboxMail, Tenant } from "../proposals/proposals.repository.ts";

const jobPhotoColumns = { id: photos.id, jobItemId: photos.jobItemId, caption: photos.caption, storageKey: photos.storageKey, thumbKey: photos.thumbKey, contentType: photos.contentType, createdAt: photos.createdAt };
export type JobPhotoRow = { id: string; jobItemId: string | null; caption: string | null; storageKey: string; thumbKey: string; contentType: string; createdAt: Date };

/** The jobs of a company; a crew member's reads are narrowed to its own rows here, not in the router. */
export function createJobsRepository(db: Database) {
  const ownJob = (tenant: Tenant, id: string, crewUserId: string | null) =>
    scoped(jobs, tenant, eq(jobs.id, id), crewUserId ? eq(jobs.crewUserId, crewUserId) : undefined);

  return {
    /** The project's accepted revision, newest first (a revise after acceptance is refused, so there is one). */
    async acceptedProposal(tenant: Tenant, projectId: string) {
      const [row] = await db.select().from(proposals)
        .where(scoped(proposals, tenant, eq(proposals.projectId, projectId), eq(proposals.status, "accepted"))).orderBy(desc(proposals.decidedAt)).limit(1);
      return row ?? null;
    },

    async project(tenant: Tenant, projectId: string) {
      const [row] = await db.select({ id: projects.id, title: projects.title, siteAddress: projects.siteAddress, status: projects.status, customerId: projects.customerId })
        .from(projects).where(scoped(projects, tenant, eq(projects.id, projectId))).limit(1);
      return row ?? null;
    },

    async customer(tenant: Tenant, id: string) {
      const [row] = await db.select({ name: customers.name, email: customers.email, phone: customers.phone }).from(customers).where(scoped(customers, tenant, eq(customers.id, id))).limit(1);
      return row ?? null;
    },

    async activeCrew(tenant: Tenant, userId: string) {
      const [row] = await db.select({ id: users.id, name: users.name }).from(users)
        .where(scoped(users, tenant, eq(users.id, userId), eq(users.role, "crew"), eq(users.isActive, true))).limit(1);
      return row ?? null;
    },

    crewMembers: (tenant: Tenant) =>
      db.select({ id: users.id, name: users.name }).from(users).where(scoped(users, tenant, eq(users.role, "crew"), eq(users.isActive, true))).orderBy(asc(users.name)),

    /** Assigns (or re-assigns) the project's job; a completed job is left alone (null). */
    async assign(tenant: Tenant, values: { projectId: string; proposalId: string; crewUserId: string; scheduledFor: string; assignedBy: string }, now: Date): Promise<JobRow | null> {
      const [row] = await db.insert(jobs).values({ ...values, companyId: tenant.companyId })
        .onConflictDoUpdate({
          target: jobs.projectId,
          set: { crewUserId: values.crewUserId, scheduledFor: values.scheduledFor, assignedBy: values.assignedBy, proposalId: values.proposalId, version: sql`${jobs.version} + 1`, updatedAt: now },
          setWhere: and(eq(jobs.companyId, tenant.companyId), eq(jobs.status, "assigned")),
        }).returning();
      return row ?? null;
    },

    async forProject(tenant: Tenant, projectId: string) {
      const [row] = await db.select().from(jobs).where(scoped(jobs, tenant, eq(jobs.projectId, projectId))).limit(1);
      return row ?? null;
    },

    async find(tenant: Tenant, id: string, crewUserId: string | null) {
      const [row] = await db.select().from(jobs).where(ownJob(tenant, id, crewUserId)).limit(1);
      return row ?? null;
    },

    async findByReportTokenHash(tokenHash: string) {
      const [row] = await db.select().from(jobs).where(eq(jobs.reportTokenHash, tokenHash)).limit(1);
      return row ?? null;
    },

    /** The list a person sees: a crew member its own jobs, the office all of them; soonest first. */
    list: (tenant: Tenant, crewUserId: string | null) =>
      db.select({
        id: jobs.id, projectId: jobs.projectId, status: jobs.status, scheduledFor: jobs.scheduledFor, completedAt: jobs.completedAt,
        title: projects.title, siteAddress: projects.siteAddress, crewUserId: jobs.crewUserId, crewName: users.name,
      })
        .from(jobs)
        .innerJoin(projects, and(eq(projects.id, jobs.projectId), eq(projects.companyId, jobs.companyId)))
        .innerJoin(users, eq(users.id, jobs.crewUserId))
        .where(scoped(jobs, tenant, crewUserId ? eq(jobs.crewUserId, crewUserId) : undefined))
        .orderBy(asc(jobs.status), asc(jobs.scheduledFor), asc(projects.title)),

    /** Sold projects no crew has yet, oldest sale first: the office's queue to schedule. */
    awaitingCrew: (tenant: Tenant) =>
      db.select({ projectId: projects.id, title: projects.title, siteAddress: projects.siteAddress })
        .from(projects)
        .leftJoin(jobs, eq(jobs.projectId, projects.id))
        .where(scoped(projects, tenant, eq(projects.status, "sold"), isNull(jobs.id)))
        .orderBy(asc(projects.updatedAt)).limit(100),

    crewName: async (tenant: Tenant, userId: string) =>
      (await db.select({ name: users.name }).from(users).where(scoped(users, tenant, eq(users.id, userId))).limit(1))[0]?.name ?? null,

    ticks: (tenant: Tenant, jobId: string) =>
      db.select({ itemId: jobTicks.itemId, tickedAt: jobTicks.tickedAt, tickedBy: jobTicks.tickedBy }).from(jobTicks).where(scoped(jobTicks, tenant, eq(jobTicks.jobId, jobId))),

    async tick(tenant: Tenant, jobId: string, itemId: string, userId: string, now: Date) {
      await db.insert(jobTicks).values({ jobId, companyId: tenant.companyId, itemId, tickedBy: userId, tickedAt: now }).onConflictDoNothing();
    },

    async untick(tenant: Tenant, jobId: string, itemId: string) {
      await db.delete(jobTicks).where(scoped(jobTicks, tenant, eq(jobTicks.jobId, jobId), eq(jobTicks.itemId, itemId)));
    },

    /** The survey's photos (not the crew's). */
    surveyPhotos: (tenant: Tenant, projectId: string) =>
      db.select(jobPhotoColumns).from(photos).where(scoped(photos, tenant, eq(photos.projectId, projectId), isNull(photos.jobItemId))).orderBy(asc(photos.createdAt)),

    /** The crew's checklist photos of the job's project. */
    crewPhotos: (tenant: Tenant, projectId: string): Promise<JobPhotoRow[]> =>
      db.select(jobPhotoColumns).from(photos).where(scoped(photos, tenant, eq(photos.projectId, projectId), isNotNull(photos.jobItemId))).orderBy(asc(photos.createdAt)),

    async photo(tenant: Tenant, projectId: string, id: string): Promise<JobPhotoRow | null> {
      const [row] = await db.select(jobPhotoColumns).from(photos).where(scoped(photos, tenant, eq(photos.projectId, projectId), eq(photos.id, id))).limit(1);
      return row ?? null;
    },

    async insertPhoto(tenant: Tenant, row: Omit<typeof photos.$inferInsert, "companyId">) {
      const [created] = await db.insert(photos).values({ ...row, companyId: tenant.companyId }).returning(jobPhotoColumns);
      return created!;
    },

    /** Signed change orders only: drafts, sent-but-unsigned and declined ones never reach the crew. */
    signedChanges: (tenant: Tenant, proposalId: string) =>
      db.select({ number: changeOrders.number, reason: changeOrders.reason, lines: changeOrders.lines, snapshot: changeOrders.snapshot, decidedAt: changeOrders.decidedAt })
        .from(changeOrders).where(scoped(changeOrders, tenant, eq(changeOrders.proposalId, proposalId), eq(changeOrders.status, "signed")))
        .orderBy(asc(changeOrders.decidedAt), asc(changeOrders.number)),

    /** What the homeowner has paid against the proposal so far (deposits), less refunds. */
    async paidCents(tenant: Tenant, proposalId: string) {
      const [row] = await db.select({ cents: sql<number>`coalesce(sum(coalesce(${payments.paidCents}, ${payments.amountCents}) - ${payments.refundedCents}), 0)::int` })
        .from(payments).where(scoped(payments, tenant, eq(payments.proposalId, proposalId), inArray(payments.status, ["paid", "refunded"])));
      return row?.cents ?? 0;
    },

    /**
     * Completes the job in one transaction: the job (only from "assigned" at the version read),
     * the project's status, an event on the signed proposal's trail and the homeowner's e-mail in
     * the outbox. Null when the job changed or was completed meanwhile.
     */
    complete: (tenant: Tenant, job: JobRow, patch: { completedAt: Date; completedBy: string; reportTokenHash: string; reportPdfKey: string; reportPdfSha256: string }, event: NewProposalEvent, mail: OutboxMail | null) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(jobs).set({ ...patch, status: "completed", version: sql`${jobs.version} + 1`, updatedAt: patch.completedAt })
          .where(scoped(jobs, tenant, eq(jobs.id, job.id), eq(jobs.version, job.version), eq(jobs.status, "assigned"))).returning();
        if (!row) return null;
        await tx.update(projects).set({ status: "completed", updatedAt: patch.completedAt }).where(scoped(projects, tenant, eq(projects.id, job.projectId)));
        await tx.insert(proposalEvents).values({ ...event, companyId: tenant.companyId, proposalId: job.proposalId });
        if (mail) {
          await tx.insert(proposalMails).values({ dedupeKey: mail.dedupeKey, companyId: tenant.companyId, proposalId: job.proposalId, kind: mail.kind, toAddress: mail.message.to, payload: mail.message }).onConflictDoNothing();
        }
        return row;
      }),
  };
}
export type JobsRepository = ReturnType<typeof createJobsRepository>;
