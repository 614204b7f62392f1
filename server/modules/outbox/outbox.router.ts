import { Router } from "express";
import { actorOf } from "../../lib/request-context.ts";
import { requirePermission } from "../auth/session.middleware.ts";
import type { OutboxRepository } from "./outbox.repository.ts";

export function outboxRouter(repo: OutboxRepository): Router {
  const r = Router();
  r.get("/", requirePermission("outbox:read"), async (req, res) => {
    res.json({ messages: await repo.listRecent(actorOf(req)) });
  });
  return r;
}
