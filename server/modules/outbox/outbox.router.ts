import { actorOf } from "../../lib/request-context.ts";
import { routesRouter } from "../../lib/routes.ts";
import type { OutboxRepository } from "./outbox.repository.ts";

export function outboxRouter(repo: OutboxRepository) {
  return routesRouter([
    {
      method: "get", path: "/outbox", access: "outbox:read",
      handler: async (req, res) => { res.json({ messages: await repo.listRecent(actorOf(req)) }); },
    },
  ]);
}
