import { Router } from "express";
import { parse, IdParam } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { ChangeRoleSchema, InviteSchema } from "../../../shared/schemas/auth.ts";
import { requirePermission } from "../auth/session.middleware.ts";
import { notFound } from "../../lib/errors.ts";
import type { TeamService } from "./team.service.ts";

/** A malformed id can match no row: answer exactly as for a foreign one. */
function id(raw: unknown, what: string): string {
  const r = IdParam.safeParse(raw);
  if (!r.success) throw notFound(what);
  return r.data;
}
const userId = (raw: unknown) => {
  if (typeof raw !== "string" || !/^[0-9a-f-]{36}$/.test(raw)) throw notFound("That user");
  return raw;
};

export function teamRouter(service: TeamService): Router {
  const r = Router();
  r.use(requirePermission("team:manage"));
  r.get("/", async (req, res) => res.json(await service.list(actorOf(req))));
  r.post("/invites", async (req, res) => {
    const invite = await service.invite(actorOf(req), parse(InviteSchema, req.body), metaOf(req), req.get("origin") ?? undefined);
    res.status(201).json({ invite });
  });
  r.delete("/invites/:id", async (req, res) => {
    await service.revokeInvite(actorOf(req), id(req.params.id, "That invitation"), metaOf(req));
    res.status(204).end();
  });
  r.patch("/users/:id", async (req, res) => {
    const { role } = parse(ChangeRoleSchema, req.body);
    res.json({ user: await service.changeRole(actorOf(req), userId(req.params.id), role, metaOf(req)) });
  });
  r.post("/users/:id/deactivate", async (req, res) => {
    res.json({ user: await service.deactivate(actorOf(req), userId(req.params.id), metaOf(req)) });
  });
  r.post("/users/:id/reactivate", async (req, res) => {
    res.json({ user: await service.reactivate(actorOf(req), userId(req.params.id), metaOf(req)) });
  });
  return r;
}
