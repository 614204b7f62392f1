import { pgTable, uuid, text, timestamp } from "drizzle-orm/pg-core";
import { companies } from "./companies.ts";
import { users } from "./users.ts";

/**
 * A seller's saved signature, typed or drawn (a PNG data URL of up to about 1.3 MB). Kept out of
 * `users` because the session check reads the whole user row on every signed-in request: a large
 * drawn signature there made every request of that user several times slower.
 */
export const userSignatures = pgTable("user_signatures", {
  userId: text().primaryKey().references(() => users.id, { onDelete: "cascade" }),
  companyId: uuid().notNull().references(() => companies.id),
  typed: text(),
  drawnPngDataUrl: text(),
  updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
});
