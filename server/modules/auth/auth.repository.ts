import { and, eq, gt, sql, isNull, count, min } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { authAttempts, companies, invites, passwordResets, sessions, users } from "../../db/schema/index.ts";

export type AttemptKind = (typeof authAttempts.$inferInsert)["kind"];

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
    /** The units a company works in (its profile's setting), for people who join it. */
    async companyUnitSystem(companyId: string): Promise<"imperial" | "metric"> {
      const [row] = await db.select({ settings: companies.settings }).from(companies).where(eq(companies.id, companyId)).limit(1);
      return (row?.settings as { unitSystem?: unknown } | undefined)?.unitSystem === "metric" ? "metric" : "imperial";
    },
    async insertUser(row: typeof users.$inferInsert) {
      const [created] = await db.insert(users).values(row).returning();
      return created!;
    },
    deleteSessionsOfUser: (userId: string) => db.delete(sessions).where(eq(sessions.userId, userId)),

    /**
     * Counts the guarded attempts in the window for this account and this address and, when both
     * are under their limits, records this one: all under advisory locks on the account and the
     * address (always taken in that order, so two bursts cannot deadlock). Parallel requests
     * therefore queue for the count, and a burst of any size gets at most the limit through,
     * whichever server process serves it. Answers the new attempt's id, or when the oldest
     * counted attempt was, to say how long to wait.
     */
    async reserveAttempt(opts: { kind: AttemptKind; account: string; ip: string | null; since: Date; now: Date; maxPerAccount: number; maxPerIp: number }) {
      return db.transaction(async (tx) => {
        const lock = (what: string) => tx.execute(sql`select pg_advisory_xact_lock(hashtextextended(${what}, 0))`);
        await lock(`auth-attempt:${opts.kind}:account:${opts.account}`);
        if (opts.ip) await lock(`auth-attempt:${opts.kind}:ip:${opts.ip}`);
        const counted = and(eq(authAttempts.kind, opts.kind), gt(authAttempts.createdAt, opts.since), isNull(authAttempts.succeededAt));
        const [byAccount] = await tx.select({ n: count(), oldest: min(authAttempts.createdAt) }).from(authAttempts).where(and(counted, eq(authAttempts.account, opts.account)));
        if (byAccount && byAccount.n >= opts.maxPerAccount) return { blocked: true as const, oldest: byAccount.oldest! };
        if (opts.ip) {
          const [byIp] = await tx.select({ n: count(), oldest: min(authAttempts.createdAt) }).from(authAttempts).where(and(counted, eq(authAttempts.ip, opts.ip)));
          if (byIp && byIp.n >= opts.maxPerIp) return { blocked: true as const, oldest: byIp.oldest! };
        }
        const [row] = await tx.insert(authAttempts).values({ kind: opts.kind, account: opts.account, ip: opts.ip, createdAt: opts.now }).returning({ id: authAttempts.id });
        return { blocked: false as const, id: row!.id };
      });
    },
    /** A successful attempt stops counting toward the limits. */
    async markAttemptSucceeded(id: number, at: Date) {
      await db.update(authAttempts).set({ succeededAt: at }).where(eq(authAttempts.id, id));
    },

    /** Stores a new reset token and voids every older unused one of the user, together. */
    async replaceReset(row: typeof passwordResets.$inferInsert & { createdAt: Date }) {
      await db.transaction(async (tx) => {
        await tx.update(passwordResets).set({ usedAt: row.createdAt }).where(and(eq(passwordResets.userId, row.userId), isNull(passwordResets.usedAt)));
        await tx.insert(passwordResets).values(row);
      });
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
