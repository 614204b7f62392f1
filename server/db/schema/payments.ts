import { pgTable, uuid, text, timestamp, integer, index, uniqueIndex, check, pgEnum } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { companies } from "./companies.ts";
import { proposals } from "./proposals.ts";
import { users } from "./users.ts";

export const PAYMENT_STATUSES = ["pending", "paid", "refunded", "failed"] as const;
export type PaymentStatus = (typeof PAYMENT_STATUSES)[number];
export const PAYMENT_PURPOSES = ["deposit", "balance"] as const;
export type PaymentPurpose = (typeof PAYMENT_PURPOSES)[number];
export const paymentStatusEnum = pgEnum("payment_status", PAYMENT_STATUSES);

/**
 * One deposit payment attempt against an accepted proposal, through the payment provider's
 * hosted checkout. `pending` from the moment a checkout session is made; only a signed webhook
 * moves it to `paid` (never the homeowner's redirect back), and a refund webhook to `refunded`.
 * Money records are kept: the proposal cannot be deleted from under them.
 */
export const payments = pgTable(
  "payments",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    proposalId: uuid().notNull().references(() => proposals.id),
    /** What the payment is for: the deposit after signing, or the balance after the crew completed the job (issue 21). */
    purpose: text().$type<PaymentPurpose>().notNull().default("deposit"),
    /** The accepted option the deposit was computed for. */
    optionId: uuid().notNull(),
    /** What the server computed and asked the provider to charge; never a figure from the client. */
    amountCents: integer().notNull(),
    /** ISO 4217, lower case as the provider writes it ("usd"). */
    currency: text().notNull().default("usd"),
    status: paymentStatusEnum().notNull().default("pending"),
    checkoutSessionId: text(),
    paymentIntentId: text(),
    /** What the provider says it collected, from the webhook. */
    paidCents: integer(),
    paidAt: timestamp({ withTimezone: true, mode: "date" }),
    refundId: text(),
    refundRequestedAt: timestamp({ withTimezone: true, mode: "date" }),
    refundRequestedBy: text().references(() => users.id, { onDelete: "set null" }),
    refundedCents: integer().notNull().default(0),
    refundedAt: timestamp({ withTimezone: true, mode: "date" }),
    failedAt: timestamp({ withTimezone: true, mode: "date" }),
    failureReason: text(),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [
    index("payments_proposal_idx").on(t.proposalId, t.createdAt),
    uniqueIndex("payments_checkout_session_idx").on(t.checkoutSessionId),
    index("payments_payment_intent_idx").on(t.paymentIntentId),
    // One checkout in progress per proposal: a second click reuses it instead of opening another.
    uniqueIndex("payments_one_pending_idx").on(t.proposalId).where(sql`${t.status} = 'pending'`),
    check("payments_amount_check", sql`${t.amountCents} > 0`),
    check("payments_purpose_check", sql`${t.purpose} in ('deposit', 'balance')`),
    check("payments_refunded_check", sql`${t.refundedCents} >= 0`),
    check("payments_currency_check", sql`${t.currency} ~ '^[a-z]{3}$'`),
  ],
);

/**
 * Every provider event id this app has acted on, so a retried or replayed webhook changes
 * nothing the second time (the provider delivers at least once).
 */
export const paymentEvents = pgTable(
  "payment_events",
  {
    eventId: text().primaryKey(),
    companyId: uuid().notNull(),
    paymentId: uuid().notNull(),
    type: text().notNull(),
    receivedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("payment_events_payment_idx").on(t.paymentId, t.receivedAt)],
);
