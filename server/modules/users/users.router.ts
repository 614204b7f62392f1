import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf } from "../../lib/request-context.ts";
import { routesRouter } from "../../lib/routes.ts";
import { ROLES } from "../../../shared/schemas/roles.ts";
import type { UsersService } from "./users.service.ts";

const UsersQuerySchema = z.object({ role: z.enum(ROLES, { error: "Role is owner, estimator, sales or crew." }).optional() });

export function usersRouter(service: UsersService) {
  return routesRouter([
    {
      method: "get", path: "/users", access: "users:read",
      handler: async (req, res) => { res.json(await service.list(actorOf(req), parse(UsersQuerySchema, req.query).role)); },
    },
  ]);
}
