import { Lucia, TimeSpan } from "lucia";
import { DrizzlePostgreSQLAdapter } from "@lucia-auth/adapter-drizzle";
import type { Database } from "../../db/client.ts";
import { sessions, users } from "../../db/schema/index.ts";

/** Idle expiry: a session unused this long ends (lucia extends it while it is used). */
export const SESSION_IDLE = new TimeSpan(12, "h");
/** Absolute expiry: no session lives longer than this, however active. */
export const SESSION_ABSOLUTE_MS = 14 * 24 * 60 * 60 * 1000;
export const SESSION_COOKIE = "eavesight_session";

export function createLucia(db: Database) {
  const adapter = new DrizzlePostgreSQLAdapter(db, sessions, users);
  return new Lucia(adapter, {
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
    DatabaseUserAttributes: typeof users.$inferSelect;
    DatabaseSessionAttributes: { absoluteExpiresAt: Date };
  }
}
