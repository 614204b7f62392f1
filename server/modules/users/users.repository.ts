import { asc, eq } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { users } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { Role } from "../../../shared/schemas/roles.ts";

export function createUsersRepository(db: Database) {
  return {
    /** Active members of the caller's company, for pickers (estimator filter and assignment). */
    listActive: (actor: Actor, role?: Role) =>
      db.select({ id: users.id, name: users.name, role: users.role }).from(users)
        .where(scoped(users, actor, eq(users.isActive, true), role ? eq(users.role, role) : undefined))
        .orderBy(asc(users.name), asc(users.id)),
  };
}
export type UsersRepository = ReturnType<typeof createUsersRepository>;
