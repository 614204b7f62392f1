import { and, asc, eq, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { changeOrders, proposalEvents, proposalMails } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { NewProposalEvent, OutboxMail, Tenant } from "../proposals/proposals.repository.ts";

export type ChangeOrderRow = typeof changeOrders.$inferSelect;
export type ChangeOrderWrite = Partial<Omit<typeof changeOrders.$inferInsert, "id" | "companyId" | "version" | "createdAt">>;

/** Every change-order event goes on the accepted proposal's append-only trail, naming the change order. */
const eventRow = (tenant: Tenant, row: Pick<ChangeOrderRow, "proposalId">, event: NewProposalEvent) => ({ ...event, companyId: tenant.companyId, proposalId: row.proposalId });

export function createChangeOrdersRepository(db: Database) {
  return {
    async find(tenant: Tenant, id: string): Promise<ChangeOrderRow | null> {
      const [row] = await db.select().from(changeOrders).where(scoped(changeOrders, tenant, eq(changeOrders.id, id))).limit(1);
      return row ?? null;
    },

    async findByTokenHash(tokenHash: string): Promise<ChangeOrderRow | null> {
      const [row] = await db.select().from(changeOrders).where(eq(changeOrders.tokenHash, tokenHash)).limit(1);
      return row ?? null;
    },

    listForProposal: (tenant: Tenant, proposalId: string) =>
      db.select().from(changeOrders).where(scoped(changeOrders, tenant, eq(changeOrders.proposalId, proposalId))).orderBy(asc(changeOrders.number)),

    /** Numbered 1, 2, … per accepted revision; the unique index settles two drafts made at once (one gets 409). */
    async insertDraft(tenant: Tenant, values: Pick<typeof changeOrders.$inferInsert, "projectId" | "proposalId" | "reason" | "lines" | "photoIds" | "createdBy">, event: NewProposalEvent): Promise<ChangeOrderRow | null> {
      try {
        return await db.transaction(async (tx) => {
          const [row] = await tx.insert(changeOrders).values({
            ...values, companyId: tenant.companyId,
            number: sql`(select coalesce(max(${changeOrders.number}), 0) + 1 from ${changeOrders} where ${changeOrders.proposalId} = ${values.proposalId})`,
          }).returning();
          await tx.insert(proposalEvents).values(eventRow(tenant, row!, { ...event, detail: { ...event.detail, changeOrderId: row!.id, number: row!.number } }));
          return row!;
        });
      } catch (err) {
        if ((err as { cause?: { code?: string } }).cause?.code === "23505") return null;
        throw err;
      }
    },

    async updateDraft(tenant: Tenant, id: string, version: number, patch: ChangeOrderWrite): Promise<ChangeOrderRow | null> {
      const [row] = await db.update(changeOrders).set({ ...patch, version: sql`${changeOrders.version} + 1`, updatedAt: new Date() })
        .where(scoped(changeOrders, tenant, eq(changeOrders.id, id), eq(changeOrders.version, version), eq(changeOrders.status, "draft"))).returning();
      return row ?? null;
    },

    /** Sending, in one transaction: frozen and hashed, the event on the proposal's trail, the e-mail in the outbox. */
    markSent: (tenant: Tenant, id: string, version: number, patch: ChangeOrderWrite, event: NewProposalEvent, mail: OutboxMail) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(changeOrders).set({ ...patch, status: "sent", version: sql`${changeOrders.version} + 1`, updatedAt: new Date() })
          .where(scoped(changeOrders, tenant, eq(changeOrders.id, id), eq(changeOrders.version, version), eq(changeOrders.status, "draft"))).returning();
        if (!row) return null;
        await tx.insert(proposalEvents).values(eventRow(tenant, row, event));
        await tx.insert(proposalMails).values({ dedupeKey: mail.dedupeKey, companyId: tenant.companyId, proposalId: row.proposalId, kind: mail.kind, toAddress: mail.message.to, payload: mail.message }).onConflictDoNothing();
        return row;
      }),

    /** The homeowner's answer, in one transaction with its event: only a sent change order is answered, once. */
    decide: (tenant: Tenant, id: string, patch: ChangeOrderWrite & { status: "signed" | "declined" }, event: NewProposalEvent) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(changeOrders).set({ ...patch, version: sql`${changeOrders.version} + 1`, updatedAt: new Date() })
          .where(and(eq(changeOrders.id, id), eq(changeOrders.companyId, tenant.companyId), eq(changeOrders.status, "sent"))).returning();
        if (!row) return null;
        await tx.insert(proposalEvents).values(eventRow(tenant, row, event));
        return row;
      }),

    async findByPdfHash(sha256: string) {
      const [row] = await db.select({ id: changeOrders.id, number: changeOrders.number, status: changeOrders.status, proposalId: changeOrders.proposalId, sentAt: changeOrders.sentAt, decidedAt: changeOrders.decidedAt })
        .from(changeOrders).where(eq(changeOrders.pdfSha256, sha256)).limit(1);
      return row ?? null;
    },
  };
}
export type ChangeOrdersRepository = ReturnType<typeof createChangeOrdersRepository>;
