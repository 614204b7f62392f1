import { and, eq, gt, sql, isNull, count, min } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { auditEvents, companies, invites, passwordResets, sessions, users } from "../../db/schema/index.ts";

export function createAuthRepository(db: Database) {
  return {
    async findUserByEmail(email: string) {
      const [row] = await db.select().from(users).where(sql`lower(${users.email}) = ${email.toLowerCase()}`).limit(1);
      return row ?? null;
    },
    async findUserById(id: string) {
      const [row] = await db.select().from(users).where(eq(users.id, id)).limit(1);
      return row ?? null;
    },
    async findCompany(id: string) {
      const [row] = await db.select({ id: companies.id, name: companies.name }).from(companies).where(eq(companies.id, id)).limit(1);
      return row ?? null;
    },
    async updateUser(id: string, patch: Partial<typeof users.$inferInsert>) {
      const [row] = await db.update(users).set({ ...patch, updatedAt: new Date() }).where(eq(users.id, id)).returning();
      return row ?? null;
    },
    async insertUser(row: typeof users.$inferInsert) {
      const [created] = await db.insert(users).values(row).returning();
      return created!;
    },
    deleteSessionsOfUser: (userId: string) => db.delete(sessions).where(eq(sessions.userId, userId)),

    /** Failed sign-ins in the window, for one address and for one IP, and when the oldest happened. */
    async countFailures(opts: { email: string; ip: string | null; since: Date }) {
      const base = and(eq(auditEvents.event, "sign-in-failed"), gt(auditEvents.createdAt, opts.since));
      const [byEmail] = await db
        .select({ n: count(), oldest: min(auditEvents.createdAt) })
        .from(auditEvents)
        .where(and(base, eq(auditEvents.subjectEmail, opts.email)));
      const [byIp] = opts.ip
        ? await db.select({ n: count(), oldest: min(auditEvents.createdAt) }).from(auditEvents).where(and(base, eq(auditEvents.ip, opts.ip)))
        : [{ n: 0, oldest: null }];
      return { byEmail: byEmail ?? { n: 0, oldest: null }, byIp: byIp ?? { n: 0, oldest: null } };
    },
    async lastSuccessAfter(email: string, since: Date) {
      const [row] = await db
        .select({ at: min(auditEvents.createdAt) })
        .from(auditEvents)
        .where(and(eq(auditEvents.event, "sign-in"), eq(auditEvents.subjectEmail, email), gt(auditEvents.createdAt, since)));
      return row?.at ?? null;
    },

    async insertReset(row: typeof passwordResets.$inferInsert) {
      await db.insert(passwordResets).values(row);
    },
    /** Marks a valid reset token used, atomically, and returns it; null when unknown, used or expired. */
    async consumeReset(tokenHash: string, now: Date) {
      const [row] = await db
        .update(passwordResets)
        .set({ usedAt: now })
        .where(and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)))
        .returning();
      return row ?? null;
    },

    async findInviteByHash(tokenHash: string) {
      const [row] = await db
        .select({ invite: invites, companyName: companies.name })
        .from(invites)
        .innerJoin(companies, eq(companies.id, invites.companyId))
        .where(eq(invites.tokenHash, tokenHash))
        .limit(1);
      return row ?? null;
    },
    async consumeInvite(id: string, now: Date) {
      const [row] = await db
        .update(invites)
        .set({ acceptedAt: now })
        .where(and(eq(invites.id, id), isNull(invites.acceptedAt), isNull(invites.revokedAt), gt(invites.expiresAt, now)))
        .returning();
      return row ?? null;
    },
    transaction: db.transaction.bind(db),
  };
}
export type AuthRepository = ReturnType<typeof createAuthRepository>;
