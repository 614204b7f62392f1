import { pgTable, text, timestamp, index } from "drizzle-orm/pg-core";
import { users } from "./users.ts";

export const sessions = pgTable(
  "sessions",
  {
    id: text().primaryKey(),
    userId: text().notNull().references(() => users.id, { onDelete: "cascade" }),
    // Sliding (idle) expiry, extended by lucia while the session is used.
    expiresAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
    // Absolute expiry: no session outlives this, however active.
    absoluteExpiresAt: timestamp({ withTimezone: true, mode: "date" }).notNull(),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("sessions_user_idx").on(t.userId)],
);
