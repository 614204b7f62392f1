import type { Request } from "express";
import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { ChangeRoleSchema, InviteSchema } from "../../../shared/schemas/auth.ts";
import type { TeamService } from "./team.service.ts";

const userId = (req: Request) => idParam(req, "id", "That user");
const inviteId = (req: Request) => idParam(req, "id", "That invitation");

export function teamRouter(service: TeamService) {
  return routesRouter([
    {
      method: "get", path: "/team", access: "team:manage",
      handler: async (req, res) => { res.json(await service.list(actorOf(req))); },
    },
    {
      method: "post", path: "/team/invites", access: "team:manage",
      handler: async (req, res) => {
        const invite = await service.invite(actorOf(req), parse(InviteSchema, req.body), metaOf(req));
        res.status(201).json({ invite });
      },
    },
    {
      method: "delete", path: "/team/invites/:id", access: "team:manage", idParams: ["id"],
      handler: async (req, res) => {
        await service.revokeInvite(actorOf(req), inviteId(req), metaOf(req));
        res.status(204).end();
      },
    },
    {
      method: "patch", path: "/team/users/:id", access: "team:manage", idParams: ["id"],
      handler: async (req, res) => {
        const id = userId(req);
        const { role } = parse(ChangeRoleSchema, req.body);
        res.json({ user: await service.changeRole(actorOf(req), id, role, metaOf(req)) });
      },
    },
    {
      method: "post", path: "/team/users/:id/deactivate", access: "team:manage", idParams: ["id"],
      handler: async (req, res) => { res.json({ user: await service.deactivate(actorOf(req), userId(req), metaOf(req)) }); },
    },
    {
      method: "post", path: "/team/users/:id/reactivate", access: "team:manage", idParams: ["id"],
      handler: async (req, res) => { res.json({ user: await service.reactivate(actorOf(req), userId(req), metaOf(req)) }); },
    },
  ]);
}
