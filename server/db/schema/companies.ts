import { pgTable, uuid, text, timestamp, integer, jsonb } from "drizzle-orm/pg-core";

export const companies = pgTable("companies", {
  id: uuid().primaryKey().defaultRandom(),
  name: text().notNull(),
  slug: text().notNull().unique(),
  /** Company profile shown on proposals; filled in from settings. */
  licenseNumber: text(),
  addressLine: text(),
  phone: text(),
  email: text(),
  logoFileId: uuid(),
  defaultCodeBasis: text().notNull().default("irc-2018"),
  defaultTerms: text(),
  taxRateBasisPoints: integer().notNull().default(0),
  depositRule: jsonb().$type<{ kind: "percent" | "amount"; value: number; capCents: number | null }>(),
  settings: jsonb().$type<Record<string, unknown>>().notNull().default({}),
  createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
});
