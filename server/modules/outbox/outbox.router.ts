import { Router } from "express";
import { desc } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { outboxMessages } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import { actorOf } from "../../lib/request-context.ts";
import { requirePermission } from "../auth/session.middleware.ts";

export function outboxRouter(db: Database): Router {
  const r = Router();
  r.get("/", requirePermission("outbox:read"), async (req, res) => {
    const messages = await db
      .select({
        id: outboxMessages.id, to: outboxMessages.toAddress, from: outboxMessages.fromAddress, subject: outboxMessages.subject,
        text: outboxMessages.text, html: outboxMessages.html, createdAt: outboxMessages.createdAt,
      })
      .from(outboxMessages)
      .where(scoped(outboxMessages, actorOf(req)))
      .orderBy(desc(outboxMessages.createdAt))
      .limit(200);
    res.json({ messages });
  });
  return r;
}
