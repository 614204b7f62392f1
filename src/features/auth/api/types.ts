import type { Role } from "@/lib/authorization";

export type { Session, SessionUser, SessionCompany, UnitSystem } from "@/lib/session";

/** GET /api/auth/invites/:token */
export interface InviteDetails {
  email: string;
  companyName: string;
  role: Role;
}
