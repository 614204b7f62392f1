import { pgTable, uuid, text, timestamp, index } from "drizzle-orm/pg-core";

/**
 * Messages received by the local fake SMTP server. The app tags each message it sends with
 * an X-Eavesight-Company header so the owner's Outbox page shows only their company's mail.
 */
export const outboxMessages = pgTable(
  "outbox_messages",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid(),
    messageId: text(),
    fromAddress: text().notNull(),
    toAddress: text().notNull(),
    subject: text().notNull(),
    text: text(),
    html: text(),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("outbox_company_idx").on(t.companyId, t.createdAt)],
);
