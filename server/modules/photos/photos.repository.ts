import { asc, eq, sql } from "drizzle-orm";
import type { Database } from "../../db/client.ts";
import { photos, proposals } from "../../db/schema/index.ts";
import { scoped } from "../../lib/tenant.ts";
import type { Actor } from "../../lib/request-context.ts";

export const photoColumns = {
  id: photos.id, projectId: photos.projectId, spaceId: photos.spaceId, ventId: photos.ventId, findingCode: photos.findingCode,
  caption: photos.caption, storageKey: photos.storageKey, thumbKey: photos.thumbKey, contentType: photos.contentType,
  sizeBytes: photos.sizeBytes, width: photos.width, height: photos.height, uploadedBy: photos.uploadedBy, createdAt: photos.createdAt,
};

export function createPhotosRepository(db: Database) {
  return {
    listForProject: (actor: Actor, projectId: string) =>
      db.select(photoColumns).from(photos).where(scoped(photos, actor, eq(photos.projectId, projectId))).orderBy(asc(photos.createdAt), asc(photos.id)),
    async find(actor: Actor, id: string) {
      const [row] = await db.select(photoColumns).from(photos).where(scoped(photos, actor, eq(photos.id, id))).limit(1);
      return row ?? null;
    },
    /** Null when a photo with this id exists already (a parallel copy of the same upload, or anyone else's). */
    async insert(actor: Actor, row: Omit<typeof photos.$inferInsert, "companyId">) {
      const [created] = await db.insert(photos).values({ ...row, companyId: actor.companyId }).onConflictDoNothing({ target: photos.id }).returning(photoColumns);
      return created ?? null;
    },
    async updateCaption(actor: Actor, id: string, caption: string | null) {
      const [row] = await db.update(photos).set({ caption }).where(scoped(photos, actor, eq(photos.id, id))).returning(photoColumns);
      return row ?? null;
    },
    /** Deletes a photo no accepted proposal shows (the signed PDF and the homeowner's page keep those). */
    async remove(actor: Actor, id: string) {
      const [row] = await db.delete(photos)
        .where(scoped(photos, actor, eq(photos.id, id),
          sql`not exists (select 1 from ${proposals} where ${proposals.companyId} = ${photos.companyId} and ${proposals.status} = 'accepted' and ${proposals.photoIds} @> jsonb_build_array(${photos.id}::text))`))
        .returning(photoColumns);
      return row ?? null;
    },
  };
}
export type PhotosRepository = ReturnType<typeof createPhotosRepository>;
export type PhotoRow = NonNullable<Awaited<ReturnType<PhotosRepository["find"]>>>;
