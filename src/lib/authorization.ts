/**
 * Which parts of the app a role may open. The rights themselves live once, in
 * shared/schemas/roles.ts (DESIGN.md §2), and the server's guards read the same table; the client
 * uses it only to hide what a role can't use and to guard routes.
 */
import { can, ROLES, type Permission, type Role } from "@shared/schemas/roles";

export { ROLES, type Role };

export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  estimator: "Estimator",
  sales: "Sales",
  crew: "Crew",
};

export const ROLE_DESCRIPTIONS: Record<Role, string> = {
  owner: "Everything, including team, company profile, catalog prices and the outbox.",
  estimator: "Customers, projects, attic surveys, photos and design options. Drafts proposals.",
  sales: "Views all projects, edits options and proposals, signs and sends them.",
  crew: "Only the jobs given to them: job sheet, materials, checklist with photos, completion. No prices unless the owner allows.",
};

export type Area =
  | "projects"
  | "customers"
  | "catalog"
  | "catalog-edit"
  | "pipeline"
  | "jobs"
  | "team"
  | "outbox"
  | "company"
  | "profile";

/** The permission that opens each area; `null` means every signed-in user. */
const AREA_PERMISSION: Record<Area, Permission | null> = {
  projects: "projects:read",
  customers: "customers:read",
  catalog: "catalog:read",
  "catalog-edit": "catalog:edit",
  pipeline: "pipeline:read",
  jobs: "jobs:read",
  team: "team:manage",
  outbox: "outbox:read",
  company: "company:edit",
  profile: null,
};

export function canAccess(role: Role, area: Area): boolean {
  const permission = AREA_PERMISSION[area];
  return permission === null || can(role, permission);
}
