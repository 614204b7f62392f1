import { pgTable, uuid, text, timestamp, index } from "drizzle-orm/pg-core";
import { companies } from "./companies.ts";
import { roleEnum, users } from "./users.ts";

/** One-time invitation links; only the SHA-256 of the token is stored. */
export const invites = pgTable(
  "invites",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    email: text().notNull(),
    role: roleEnum().notNull(),
    tokenHash: text().notNull().unique(),
    invitedBy: text().references(() => users.id),
    expiresAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
    acceptedAt: timestamp({ withTimezone: true, mode: "date" }),
    revokedAt: timestamp({ withTimezone: true, mode: "date" }),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("invites_company_idx").on(t.companyId)],
);

/** Password reset tokens: hashed, expiring, single use. */
export const passwordResets = pgTable("password_resets", {
  id: uuid().primaryKey().defaultRandom(),
  userId: text().notNull().references(() => users.id, { onDelete: "cascade" }),
  tokenHash: text().notNull().unique(),
  expiresAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
  usedAt: timestamp({ withTimezone: true, mode: "date" }),
  createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
});
