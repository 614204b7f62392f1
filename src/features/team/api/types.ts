import type { Role } from "@/lib/authorization";

/** A user of the company, as GET /api/team lists them. Dates are ISO 8601 strings. */
export interface TeamUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  isActive: boolean;
  createdAt: string;
}

export interface TeamInvite {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  createdAt: string;
}

export interface TeamResponse {
  users: TeamUser[];
  invites: TeamInvite[];
}
