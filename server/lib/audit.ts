import type { Database } from "../db/client.ts";
import { auditEvents } from "../db/schema/index.ts";
import type { RequestMeta } from "./request-context.ts";

export interface AuditEntry {
  event: string;
  companyId?: string | null;
  userId?: string | null;
  subjectEmail?: string | null;
  detail?: Record<string, unknown>;
}

/** Appends one event; the table refuses updates and deletes. */
export function createAudit(db: Database) {
  return async (entry: AuditEntry, meta: RequestMeta) => {
    await db.insert(auditEvents).values({
      event: entry.event,
      companyId: entry.companyId ?? null,
      userId: entry.userId ?? null,
      subjectEmail: entry.subjectEmail ?? null,
      detail: entry.detail ?? {},
      ip: meta.ip,
      userAgent: meta.userAgent,
    });
  };
}
export type Audit = ReturnType<typeof createAudit>;
