import { idTaken } from "../spaces/spaces.service.ts";
import { randomUUID } from "node:crypto";
import { AppError, notFound } from "../../lib/errors.ts";
import type { Storage } from "../../lib/storage/index.ts";
import type { Actor } from "../../lib/request-context.ts";
import type { PhotoFields } from "../../../shared/schemas/survey.ts";
import type { ProjectsRepository } from "../projects/projects.repository.ts";
import type { SpacesRepository } from "../spaces/spaces.repository.ts";
import { processPhoto } from "./photo-processing.ts";
import type { PhotoRow, PhotosRepository } from "./photos.repository.ts";

export const THUMB_CONTENT_TYPE = "image/webp";

/** What clients see of a photo: never its storage keys. */
export function photoView(row: PhotoRow) {
  const { storageKey: _s, thumbKey: _t, ...rest } = row;
  return { ...rest, url: `/api/photos/${row.id}`, thumbUrl: `/api/photos/${row.id}?thumb=1` };
}
export type PhotoView = ReturnType<typeof photoView>;

const fieldError = (field: string, message: string) => new AppError("invalid-input", message, 400, { [field]: message });

export function createPhotosService(deps: { repo: PhotosRepository; storage: Storage; projects: ProjectsRepository; spaces: SpacesRepository }) {
  const { repo, storage } = deps;

  async function requireProject(actor: Actor, projectId: string) {
    if (!(await deps.projects.find(actor, projectId))) throw notFound("That project");
  }
  async function requirePhoto(actor: Actor, id: string) {
    const photo = await repo.find(actor, id);
    if (!photo) throw notFound("That photo");
    return photo;
  }

  return {
    requireProject,

    async listForProject(actor: Actor, projectId: string): Promise<PhotoView[]> {
      return (await repo.listForProject(actor, projectId)).map(photoView);
    },

    /**
     * Stores a photo. With an id made on the device (field mode), an upload sent again answers the
     * photo already stored (`isNew: false`) and stores nothing; an id used elsewhere answers 409.
     */
    async upload(actor: Actor, projectId: string, file: { buffer: Buffer } | undefined, fields: PhotoFields): Promise<{ photo: PhotoView; isNew: boolean }> {
      await requireProject(actor, projectId);
      if (!file) throw fieldError("file", "Attach the photo in the form field named file.");
      const sameUpload = async () => {
        const existing = fields.id ? await repo.find(actor, fields.id) : null;
        if (existing && existing.projectId !== projectId) throw idTaken("photo");
        return existing ? { photo: photoView(existing), isNew: false } : null;
      };
      const earlier = await sameUpload();
      if (earlier) return earlier;
      if (fields.ventId && !fields.spaceId) throw fieldError("spaceId", "Choose the attic space the vent belongs to.");
      if (fields.spaceId) {
        const space = await deps.spaces.find(actor, projectId, fields.spaceId);
        if (!space) throw fieldError("spaceId", "Choose one of this project's attic spaces.");
        if (fields.ventId && !space.vents.some((v) => v.id === fields.ventId)) throw fieldError("ventId", "That space has no vent with this id.");
      }

      const processed = await processPhoto(file.buffer);
      // Server-made names only: the uploaded file name never reaches storage or the database.
      const id = fields.id ?? randomUUID();
      const storageKey = `photos/${actor.companyId}/${id}.${processed.main.ext}`;
      const thumbKey = `photos/${actor.companyId}/${id}-thumb.${processed.thumb.ext}`;
      await storage.put(storageKey, processed.main.bytes, processed.main.contentType);
      await storage.put(thumbKey, processed.thumb.bytes, processed.thumb.contentType);
      const dropFiles = () => Promise.allSettled([storage.delete(storageKey), storage.delete(thumbKey)]);
      let row;
      try {
        row = await repo.insert(actor, {
          id, projectId, spaceId: fields.spaceId ?? null, ventId: fields.ventId ?? null, findingCode: fields.findingCode ?? null,
          caption: fields.caption || null, storageKey, thumbKey, contentType: processed.main.contentType,
          sizeBytes: processed.main.bytes.byteLength, width: processed.main.width, height: processed.main.height, uploadedBy: actor.userId,
        });
      } catch (err) {
        await dropFiles();
        throw err;
      }
      if (row) return { photo: photoView(row), isNew: true };
      // A parallel copy of this upload won (its row names these very files: keep them), or the id
      // is another company's (nothing of ours names these files: drop them).
      const winner = await sameUpload().catch(async (err: unknown) => {
        await dropFiles();
        throw err;
      });
      if (winner) return winner;
      await dropFiles();
      throw idTaken("photo");
    },

    /** The bytes of a photo or its thumbnail, for the caller's company only. */
    async open(actor: Actor, id: string, isThumb: boolean) {
      const photo = await requirePhoto(actor, id);
      const object = await storage.get(isThumb ? photo.thumbKey : photo.storageKey);
      if (!object) throw new AppError("file-missing", "The file of this photo is missing from storage.", 404);
      return { ...object, contentType: isThumb ? THUMB_CONTENT_TYPE : photo.contentType };
    },

    async setCaption(actor: Actor, id: string, caption: string | null): Promise<PhotoView> {
      const row = await repo.updateCaption(actor, id, caption || null);
      if (!row) throw notFound("That photo");
      return photoView(row);
    },

    async remove(actor: Actor, id: string) {
      const row = await repo.remove(actor, id);
      if (!row) {
        if (await repo.find(actor, id)) throw new AppError("accepted-locked", "This photo is part of a proposal the homeowner accepted, so it is kept with the signed work. Draft a change order to add new photos.", 409);
        throw notFound("That photo");
      }
      // The row is gone, so the photo is gone for every user; a file left by a storage hiccup is only an orphan.
      await Promise.allSettled([storage.delete(row.storageKey), storage.delete(row.thumbKey)]);
    },
  };
}
export type PhotosService = ReturnType<typeof createPhotosService>;
