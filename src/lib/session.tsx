import { createContext, useContext, type ReactNode } from "react";
import { canAccess, type Area, type Role } from "./authorization";

/*
 * The signed-in user, as GET /api/auth/me answers. Lives in lib/ (not features/auth) because every
 * feature needs the role and unit system, and features don't import each other.
 * TODO(shared/schemas): replace these hand-written types with z.infer of the shared auth schemas.
 */

export type UnitSystem = "imperial" | "metric";

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  unitSystem: UnitSystem;
}

export interface SessionCompany {
  id: string;
  name: string;
}

export interface Session {
  user: SessionUser;
  company: SessionCompany;
}

const SessionContext = createContext<Session | null>(null);

export function SessionProvider({ session, children }: { session: Session; children: ReactNode }) {
  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}

/** The current session. Only for components under the signed-in app layout. */
export function useSession(): Session {
  const session = useContext(SessionContext);
  if (!session) throw new Error("useSession() was called outside the signed-in app layout.");
  return session;
}

/** Whether the current user's role may use an area of the app (see lib/authorization.ts). */
export function useCanAccess(area: Area): boolean {
  return canAccess(useSession().user.role, area);
}
