import { and, desc, eq, gt, isNull, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { invites, sessions, users } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";

const userColumns = { id: users.id, email: users.email, name: users.name, role: users.role, isActive: users.isActive, createdAt: users.createdAt };

export function createTeamRepository(db: Database) {
  return {
    listUsers: (actor: Actor) => db.select(userColumns).from(users).where(scoped(users, actor)).orderBy(users.name),
    listOpenInvites: (actor: Actor, now: Date) =>
      db
        .select({ id: invites.id, email: invites.email, role: invites.role, expiresAt: invites.expiresAt, createdAt: invites.createdAt })
        .from(invites)
        .where(scoped(invites, actor, isNull(invites.acceptedAt), isNull(invites.revokedAt), gt(invites.expiresAt, now)))
        .orderBy(desc(invites.createdAt)),
    async findUser(actor: Actor, id: string) {
      const [row] = await db.select(userColumns).from(users).where(scoped(users, actor, eq(users.id, id))).limit(1);
      return row ?? null;
    },
    async updateUser(actor: Actor, id: string, patch: Partial<typeof users.$inferInsert>) {
      const [row] = await db.update(users).set({ ...patch, updatedAt: new Date() }).where(scoped(users, actor, eq(users.id, id))).returning(userColumns);
      return row ?? null;
    },
    countActiveOwners: async (actor: Actor) => {
      const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(users).where(scoped(users, actor, eq(users.role, "owner"), eq(users.isActive, true)));
      return row?.n ?? 0;
    },
    deleteSessions: (userId: string) => db.delete(sessions).where(eq(sessions.userId, userId)),
    async insertInvite(row: typeof invites.$inferInsert) {
      const [created] = await db.insert(invites).values(row).returning({ id: invites.id, email: invites.email, role: invites.role, expiresAt: invites.expiresAt, createdAt: invites.createdAt });
      return created!;
    },
    async revokeInvite(actor: Actor, id: string, now: Date) {
      const [row] = await db.update(invites).set({ revokedAt: now }).where(scoped(invites, actor, eq(invites.id, id), isNull(invites.acceptedAt))).returning({ id: invites.id });
      return row ?? null;
    },
    async emailInUse(email: string) {
      const [row] = await db.select({ id: users.id }).from(users).where(sql`lower(${users.email}) = ${email}`).limit(1);
      return Boolean(row);
    },
    async revokeOpenInvitesFor(actor: Actor, email: string, now: Date) {
      await db.update(invites).set({ revokedAt: now }).where(and(eq(invites.companyId, actor.companyId), eq(invites.email, email), isNull(invites.acceptedAt), isNull(invites.revokedAt)));
    },
  };
}
export type TeamRepository = ReturnType<typeof createTeamRepository>;
