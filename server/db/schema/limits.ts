import { pgTable, bigserial, text, timestamp, integer, index, jsonb, uuid, primaryKey } from "drizzle-orm/pg-core";

/**
 * Guarded attempts (sign-in, password-reset requests, password changes), counted before the
 * password is checked: each attempt is reserved under an advisory lock per account and per
 * address (auth.repository.ts `reserveAttempt`), so a parallel burst checks at most the limit,
 * across every server process. A sign-in that succeeds is marked and stops counting.
 */
export const authAttempts = pgTable(
  "auth_attempts",
  {
    id: bigserial({ mode: "number" }).primaryKey(),
    kind: text({ enum: ["sign-in", "password-reset", "password-change"] }).notNull(),
    /** The account named: a lower-cased e-mail, or the user id for a signed-in password change. */
    account: text().notNull(),
    ip: text(),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
    succeededAt: timestamp({ withTimezone: true, mode: "date" }),
  },
  (t) => [
    index("auth_attempts_account_idx").on(t.kind, t.account, t.createdAt),
    index("auth_attempts_ip_idx").on(t.kind, t.ip, t.createdAt),
  ],
);

/**
 * Fixed-window counters for express-rate-limit, shared by every server process (the homeowner
 * link's guessing limit). One atomic upsert per hit.
 */
export const rateLimitCounters = pgTable("rate_limit_counters", {
  key: text().primaryKey(),
  hits: integer().notNull(),
  resetAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
});

/**
 * The first answer to a creating request sent with an Idempotency-Key, written in the same
 * transaction as the change itself, so a retry (after a 503, a lost answer) gets that answer
 * instead of a second row. Keys are per user; rows expire after a day.
 */
export const idempotencyKeys = pgTable(
  "idempotency_keys",
  {
    userId: text().notNull(),
    key: text().notNull(),
    companyId: uuid().notNull(),
    method: text().notNull(),
    path: text().notNull(),
    /** SHA-256 of the request body: the same key with another body is refused. */
    requestHash: text().notNull(),
    statusCode: integer().notNull(),
    responseBody: jsonb(),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
    expiresAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
  },
  (t) => [primaryKey({ columns: [t.userId, t.key] }), index("idempotency_keys_expires_idx").on(t.expiresAt)],
);
