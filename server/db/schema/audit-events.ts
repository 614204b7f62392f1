import { pgTable, bigserial, uuid, text, timestamp, jsonb, index } from "drizzle-orm/pg-core";

/**
 * Append-only security and business events. A trigger (migration 0001) refuses UPDATE and
 * DELETE, so a row once written stays as written.
 */
export const auditEvents = pgTable(
  "audit_events",
  {
    id: bigserial({ mode: "number" }).primaryKey(),
    companyId: uuid(),
    userId: text(),
    event: text().notNull(),
    /** The e-mail a sign-in attempt named, kept for per-account rate limits. */
    subjectEmail: text(),
    ip: text(),
    userAgent: text(),
    detail: jsonb().$type<Record<string, unknown>>().notNull().default({}),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("audit_events_company_idx").on(t.companyId, t.createdAt),
    index("audit_events_event_email_idx").on(t.event, t.subjectEmail, t.createdAt),
    index("audit_events_event_ip_idx").on(t.event, t.ip, t.createdAt),
  ],
);
