import type { PaymentPurpose } from "../../db/schema/payments.ts";
import { and, desc, eq, inArray, lt, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { auditEvents, companies, paymentEvents, payments, proposalEvents, proposals, users, type PaymentStatus } from "../../db/schema/index.ts";
import type { RequestMeta } from "../../lib/request-context.ts";
import { scoped } from "../../lib/tenant.ts";

export interface Tenant {
  companyId: string;
}

export type PaymentRow = typeof payments.$inferSelect;
export type PaymentWrite = Partial<Omit<typeof payments.$inferInsert, "id" | "companyId" | "proposalId" | "createdAt">>;

/** When a provider event still has something to change: the payment is in one of these states, or has less refunded than this. */
export interface EventGuard {
  statuses?: PaymentStatus[];
  refundedBelowCents?: number;
}

/** What a processed event writes beside the payment: one proposal event and one audit event. */
export interface EventRecord {
  event: string;
  detail: Record<string, unknown>;
  meta: RequestMeta;
}

const isUniqueViolation = (err: unknown) => {
  for (let e = err as { code?: unknown; cause?: unknown } | null, i = 0; e && i < 4; e = e.cause as typeof e, i++) if (e.code === "23505") return true;
  return false;
};

export function createPaymentsRepository(db: Database) {
  return {
    async find(tenant: Tenant, id: string): Promise<PaymentRow | null> {
      const [row] = await db.select().from(payments).where(scoped(payments, tenant, eq(payments.id, id))).limit(1);
      return row ?? null;
    },

    listForProposal: (tenant: Tenant, proposalId: string) =>
      db.select().from(payments).where(scoped(payments, tenant, eq(payments.proposalId, proposalId))).orderBy(desc(payments.createdAt)),

    /** A new pending payment, or null when one is already pending for the proposal (the partial unique index). */
    async insertPending(tenant: Tenant, values: { proposalId: string; optionId: string; amountCents: number; currency: string; purpose: PaymentPurpose }): Promise<PaymentRow | null> {
      try {
        const [row] = await db.insert(payments).values({ ...values, companyId: tenant.companyId, status: "pending" }).returning();
        return row!;
      } catch (err) {
        if (isUniqueViolation(err)) return null;
        throw err;
      }
    },

    async update(tenant: Tenant, id: string, patch: PaymentWrite, onlyStatuses?: PaymentStatus[]): Promise<PaymentRow | null> {
      const [row] = await db.update(payments).set({ ...patch, updatedAt: new Date() })
        .where(scoped(payments, tenant, eq(payments.id, id), onlyStatuses ? inArray(payments.status, onlyStatuses) : undefined)).returning();
      return row ?? null;
    },

    /** Webhooks carry no actor: the payment is found by the provider's own ids, then its company scopes the rest. */
    async findByCheckoutSession(sessionId: string): Promise<PaymentRow | null> {
      const [row] = await db.select().from(payments).where(eq(payments.checkoutSessionId, sessionId)).limit(1);
      return row ?? null;
    },
    async findByPaymentIntent(paymentIntentId: string): Promise<PaymentRow | null> {
      const [row] = await db.select().from(payments).where(eq(payments.paymentIntentId, paymentIntentId)).limit(1);
      return row ?? null;
    },

    /**
     * Applies one provider event exactly once: the event id is claimed, the payment changed and the
     * proposal and audit events written in one transaction. A replayed event finds its id taken and
     * changes nothing (returns null). `guard` guards the change itself: different events saying the
     * same thing (a checkout completed, then its payment succeeded) arriving at once queue on the
     * payment's row lock, and only the first finds it still to do; the others claim their id and
     * answer `isApplied: false` with no event, audit line or e-mail.
     */
    applyEventOnce: (payment: PaymentRow, eventId: string, eventType: string, patch: PaymentWrite, record: EventRecord | null, guard: EventGuard = {}) =>
      db.transaction(async (tx): Promise<{ row: PaymentRow; isApplied: boolean } | null> => {
        const claimed = await tx.insert(paymentEvents).values({ eventId, companyId: payment.companyId, paymentId: payment.id, type: eventType })
          .onConflictDoNothing().returning({ eventId: paymentEvents.eventId });
        if (claimed.length === 0) return null;
        const [row] = await tx.update(payments).set({ ...patch, updatedAt: new Date() })
          .where(and(eq(payments.id, payment.id), eq(payments.companyId, payment.companyId),
            guard.statuses ? inArray(payments.status, guard.statuses) : undefined,
            guard.refundedBelowCents !== undefined ? lt(payments.refundedCents, guard.refundedBelowCents) : undefined))
          .returning();
        if (!row) {
          const [current] = await tx.select().from(payments).where(and(eq(payments.id, payment.id), eq(payments.companyId, payment.companyId)));
          return { row: current!, isApplied: false };
        }
        if (record) {
          await tx.insert(proposalEvents).values({
            companyId: payment.companyId, proposalId: payment.proposalId, event: record.event, ip: record.meta.ip, userAgent: record.meta.userAgent, detail: record.detail,
          });
          await tx.insert(auditEvents).values({
            companyId: payment.companyId, event: record.event, detail: { proposalId: payment.proposalId, ...record.detail }, ip: record.meta.ip, userAgent: record.meta.userAgent,
          });
        }
        return { row, isApplied: true };
      }),

    /** A staff action on a payment (a refund request) with its proposal and audit events, in one transaction. */
    updateWithRecord: (tenant: Tenant, payment: PaymentRow, patch: PaymentWrite, onlyStatuses: PaymentStatus[], record: EventRecord & { userId: string }) =>
      db.transaction(async (tx) => {
        const [row] = await tx.update(payments).set({ ...patch, updatedAt: new Date() })
          .where(scoped(payments, tenant, eq(payments.id, payment.id), inArray(payments.status, onlyStatuses), sql`${payments.refundRequestedAt} is null`)).returning();
        if (!row) return null;
        await tx.insert(proposalEvents).values({
          companyId: tenant.companyId, proposalId: payment.proposalId, event: record.event, userId: record.userId, ip: record.meta.ip, userAgent: record.meta.userAgent, detail: record.detail,
        });
        await tx.insert(auditEvents).values({
          companyId: tenant.companyId, userId: record.userId, event: record.event, detail: { proposalId: payment.proposalId, ...record.detail }, ip: record.meta.ip, userAgent: record.meta.userAgent,
        });
        return row;
      }),

    /** An audit line about a payment that changed nothing (a mismatch, an unexpected state). */
    async audit(companyId: string, event: string, detail: Record<string, unknown>, meta: RequestMeta) {
      await db.insert(auditEvents).values({ companyId, event, detail, ip: meta.ip, userAgent: meta.userAgent });
    },

    async proposal(tenant: Tenant, id: string) {
      const [row] = await db.select().from(proposals).where(scoped(proposals, tenant, eq(proposals.id, id))).limit(1);
      return row ?? null;
    },

    async companyDepositRule(tenant: Tenant) {
      const [row] = await db.select({ depositRule: companies.depositRule }).from(companies).where(eq(companies.id, tenant.companyId)).limit(1);
      return row?.depositRule ?? null;
    },

    async user(tenant: Tenant, userId: string) {
      const [row] = await db.select({ id: users.id, name: users.name, email: users.email, isActive: users.isActive })
        .from(users).where(scoped(users, tenant, eq(users.id, userId))).limit(1);
      return row ?? null;
    },
  };
}
export type PaymentsRepository = ReturnType<typeof createPaymentsRepository>;
