import { pgTable, uuid, text, timestamp, boolean, pgEnum, uniqueIndex } from "drizzle-orm/pg-core";
import { sql } from "drizzle-orm";
import { companies } from "./companies.ts";
import { ROLES } from "../../../shared/schemas/roles.ts";

export const roleEnum = pgEnum("role", ROLES);
export const unitSystemEnum = pgEnum("unit_system", ["imperial", "metric"]);

export const users = pgTable(
  "users",
  {
    // Lucia wants string ids; a uuid rendered as text keeps them unguessable.
    id: text().primaryKey(),
    companyId: uuid().notNull().references(() => companies.id),
    email: text().notNull(),
    name: text().notNull(),
    role: roleEnum().notNull(),
    passwordHash: text().notNull(),
    isActive: boolean().notNull().default(true),
    unitSystem: unitSystemEnum().notNull().default("imperial"),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
    updatedAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex("users_email_lower_idx").on(sql`lower(${t.email})`)],
);
