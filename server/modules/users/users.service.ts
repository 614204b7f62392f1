import type { Actor } from "../../lib/request-context.ts";
import type { Role } from "../../../shared/schemas/roles.ts";
import type { UsersRepository } from "./users.repository.ts";

export function createUsersService(deps: { repo: UsersRepository }) {
  return {
    list: (actor: Actor, role?: Role) => deps.repo.listActive(actor, role),
  };
}
export type UsersService = ReturnType<typeof createUsersService>;
