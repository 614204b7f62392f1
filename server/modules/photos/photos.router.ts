import type { Request, Response } from "express";
import { pipeline } from "node:stream/promises";
import multer from "multer";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { AppError } from "../../lib/errors.ts";
import { actorOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { PhotoFieldsSchema, PhotoPatchSchema } from "../../../shared/schemas/survey.ts";
import { MAX_PHOTO_BYTES } from "./photo-processing.ts";
import type { PhotosService } from "./photos.service.ts";

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: MAX_PHOTO_BYTES, files: 1, fields: 10, fieldSize: 10_000, parts: 12 },
}).single("file");

/** Reads the multipart body, turning multer's errors into answers a person can act on. */
export function receiveFile(req: Request, res: Response): Promise<void> {
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError) {
        if (err.code === "LIMIT_FILE_SIZE") {
          const message = `The photo is larger than ${MAX_PHOTO_BYTES / 1024 / 1024} MB. Please upload a smaller one.`;
          return reject(new AppError("file-too-large", message, 413, { file: message }));
        }
        if (err.code === "LIMIT_UNEXPECTED_FILE" || err.code === "LIMIT_FILE_COUNT") {
          return reject(new AppError("invalid-input", "Send one photo, in the form field named file.", 400, { file: "Send one photo, in the form field named file." }));
        }
        return reject(new AppError("invalid-input", `The upload could not be read: ${err.message}.`, 400));
      }
      // busboy: a malformed or cut-off multipart body.
      reject(new AppError("invalid-input", "The upload could not be read; please try again.", 400));
    });
  });
}

const PhotoQuerySchema = z.object({ thumb: z.enum(["1", "0", "true", "false"], { error: "thumb is 1 or 0." }).optional() });
const photoId = (req: Request) => idParam(req, "id", "That photo");

export function photosRouter(service: PhotosService) {
  return routesRouter([
    {
      method: "post", path: "/projects/:id/photos", access: "projects:edit", idParams: ["id"],
      handler: async (req, res) => {
        const projectId = idParam(req, "id", "That project");
        const actor = actorOf(req);
        // Check the project before taking in up to 15 MB for it.
        await service.requireProject(actor, projectId);
        await receiveFile(req, res);
        const fields = parse(PhotoFieldsSchema, { ...(req.body as object) });
        const { photo, isNew } = await service.upload(actor, projectId, req.file, fields);
        res.status(isNew ? 201 : 200).json({ photo });
      },
    },
    {
      method: "get", path: "/photos/:id", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => {
        const id = photoId(req);
        const { thumb } = parse(PhotoQuerySchema, req.query);
        const file = await service.open(actorOf(req), id, thumb === "1" || thumb === "true");
        res.set({
          "Content-Type": file.contentType,
          "Content-Disposition": "inline",
          ...(file.sizeBytes !== null ? { "Content-Length": String(file.sizeBytes) } : {}),
        });
        await pipeline(file.body, res);
      },
    },
    {
      method: "patch", path: "/photos/:id", access: "projects:edit", idParams: ["id"],
      handler: async (req, res) => {
        const id = photoId(req);
        const { caption } = parse(PhotoPatchSchema, req.body);
        res.json({ photo: await service.setCaption(actorOf(req), id, caption) });
      },
    },
    {
      method: "delete", path: "/photos/:id", access: "projects:edit", idParams: ["id"],
      handler: async (req, res) => {
        await service.remove(actorOf(req), photoId(req));
        res.status(204).end();
      },
    },
  ]);
}
