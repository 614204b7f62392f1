import { Lucia, TimeSpan, type DatabaseSession, type DatabaseUser } from "lucia";
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import { eq, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { sessions, users } from "../../db/schema/index.ts";

/** Idle expiry: a session unused this long ends (lucia extends it while it is used). */
export const SESSION_IDLE = new TimeSpan(12, "h");
/** Absolute expiry: no session lives longer than this, however active. */
export const SESSION_ABSOLUTE_MS = 14 * 24 * 60 * 60 * 1000;
export const SESSION_COOKIE = "eavesight_session";

/** The user's columns a request needs to know who is calling; never the password hash. */
const sessionUserColumns = {
  email: users.email, name: users.name, role: users.role, companyId: users.companyId, isActive: users.isActive, unitSystem: users.unitSystem,
};
type SessionUser = { [K in keyof typeof sessionUserColumns]: (typeof users.$inferSelect)[K] };

/**
 * The adapter's session look-up, narrowed to the columns above and sent as a prepared statement
 * (the stock one reads the whole user row, password hash included, and rebuilds its SQL each time).
 */
class SessionAdapter extends DrizzlePostgreSQLAdapter {
  private readonly sessionAndUser;
  constructor(db: Database) {
    super(db, sessions, users);
    this.sessionAndUser = db
      .select({ id: sessions.id, userId: sessions.userId, expiresAt: sessions.expiresAt, absoluteExpiresAt: sessions.absoluteExpiresAt, ...sessionUserColumns })
      .from(sessions)
      .innerJoin(users, eq(users.id, sessions.userId))
      .where(eq(sessions.id, sql.placeholder("sessionId")))
      .prepare("session_and_user");
  }
  override async getSessionAndUser(sessionId: string): Promise<[DatabaseSession | null, DatabaseUser | null]> {
    const [row] = await this.sessionAndUser.execute({ sessionId });
    if (!row) return [null, null];
    const { id, userId, expiresAt, absoluteExpiresAt, ...user } = row;
    return [{ id, userId, expiresAt, attributes: { absoluteExpiresAt } }, { id: userId, attributes: user }];
  }
}

export function createLucia(db: Database) {
  return new Lucia(new SessionAdapter(db), {
    sessionExpiresIn: SESSION_IDLE,
    sessionCookie: { name: SESSION_COOKIE, expires: true, attributes: { sameSite: "lax", secure: false } },
    getUserAttributes: (a) => ({
      email: a.email,
      name: a.name,
      role: a.role,
      companyId: a.companyId,
      isActive: a.isActive,
      unitSystem: a.unitSystem,
    }),
    getSessionAttributes: (a) => ({ absoluteExpiresAt: a.absoluteExpiresAt }),
  });
}

export type AppLucia = ReturnType<typeof createLucia>;

declare module "lucia" {
  interface Register {
    Lucia: AppLucia;
    DatabaseUserAttributes: SessionUser;
    DatabaseSessionAttributes: { absoluteExpiresAt: Date };
  }
}
