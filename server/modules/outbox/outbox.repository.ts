import { desc } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { outboxMessages } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";

export function createOutboxRepository(db: Database) {
  return {
    /** The newest 200 messages the app sent for this company (filed by the fake SMTP server). */
    listRecent: (actor: Actor) =>
      db
        .select({
          id: outboxMessages.id, to: outboxMessages.toAddress, from: outboxMessages.fromAddress, subject: outboxMessages.subject,
          text: outboxMessages.text, html: outboxMessages.html, createdAt: outboxMessages.createdAt,
        })
        .from(outboxMessages)
        .where(scoped(outboxMessages, actor))
        .orderBy(desc(outboxMessages.createdAt))
        .limit(200),
  };
}
export type OutboxRepository = ReturnType<typeof createOutboxRepository>;
