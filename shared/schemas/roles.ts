/** Roles and what each may do (DESIGN.md §2). One table, read by the server's guards and the client's navigation. */
export const ROLES = ["owner", "estimator", "sales", "crew"] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = {
  "team:manage": ["owner"],
  "company:edit": ["owner"],
  "outbox:read": ["owner"],
  "audit:read": ["owner"],
  "catalog:read": ["owner", "estimator", "sales"],
  "catalog:edit": ["owner"],
  "customers:read": ["owner", "estimator", "sales"],
  "customers:edit": ["owner", "estimator"],
  /** Correct a customer's name and contact details (sales fix an e-mail address before sending). */
  "customers:contact": ["owner", "estimator", "sales"],
  "projects:read": ["owner", "estimator", "sales"],
  "projects:edit": ["owner", "estimator"],
  "options:edit": ["owner", "estimator", "sales"],
  "proposals:read": ["owner", "estimator", "sales"],
  "proposals:draft": ["owner", "estimator", "sales"],
  "proposals:send": ["owner", "sales"],
  "proposals:outcome": ["owner", "sales"],
  "pipeline:read": ["owner", "sales"],
  "payments:refund": ["owner"],
  /** The team list (names and roles), for picking an estimator or a crew; the crew has no use for it. */
  "users:read": ["owner", "estimator", "sales"],
  /** Put a crew on accepted work with a date. */
  "jobs:assign": ["owner", "sales"],
  /** Open job sheets: the crew only those assigned to it (checked per job in the service), the office all. */
  "jobs:read": ["owner", "estimator", "sales", "crew"],
  /** Tick the checklist, add photos and mark the job done: the crew on its own jobs, or the owner. */
  "jobs:work": ["owner", "crew"],
} as const satisfies Record<string, readonly Role[]>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return (PERMISSIONS[permission] as readonly Role[]).includes(role);
}
