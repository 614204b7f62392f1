import { pgTable, uuid, text, timestamp, integer, index } from "drizzle-orm/pg-core";
import { companies } from "./companies.ts";
import { projects } from "./projects.ts";
import { atticSpaces } from "./attic-spaces.ts";
import { users } from "./users.ts";

/**
 * A photo taken on site. The bytes live in the storage driver under server-made keys; the
 * uploaded file name is never stored or used.
 */
export const photos = pgTable(
  "photos",
  {
    id: uuid().primaryKey().defaultRandom(),
    companyId: uuid().notNull().references(() => companies.id),
    projectId: uuid().notNull().references(() => projects.id, { onDelete: "cascade" }),
    // A photo outlives the space it showed: it stays on the project.
    spaceId: uuid().references(() => atticSpaces.id, { onDelete: "set null" }),
    /** The vent (its id within the space's vents) the photo shows, if any. */
    ventId: text(),
    /** The finding the photo documents, e.g. "soffits-blocked". */
    findingCode: text(),
    caption: text(),
    /** A photo the crew took for a checklist item of the install (issue 21); null for survey photos. */
    jobItemId: text(),
    storageKey: text().notNull(),
    thumbKey: text().notNull(),
    contentType: text().notNull(),
    sizeBytes: integer().notNull(),
    width: integer().notNull(),
    height: integer().notNull(),
    uploadedBy: text().references(() => users.id, { onDelete: "set null" }),
    createdAt: timestamp({ withTimezone: true, mode: "date" }).notNull().defaultNow(),
  },
  (t) => [index("photos_project_idx").on(t.projectId, t.createdAt)],
);
