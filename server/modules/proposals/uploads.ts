import express, { type Request, type RequestHandler, type Response } from "express";
import multer from "multer";
import { AppError } from "../../lib/errors.ts";

/** Reads one multipart file (field "file"), turning multer's errors into clear answers. */
export function receiveFile(req: Request, res: Response, maxBytes: number, what: string): Promise<void> {
  const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 6 } }).single("file");
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError && err.code === "LIMIT_FILE_SIZE") {
        const message = `The ${what} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`;
        return reject(new AppError("file-too-large", message, 413, { file: message }));
      }
      reject(new AppError("invalid-input", `Send one ${what}, in the form field named file.`, 400, { file: `Send one ${what}.` }));
    });
  });
}

/**
 * JSON for the routes that carry a drawn signature (a 1 MB PNG is about 1.4 MB as base64): a
 * larger limit than the API's 1 MB, and a body beyond it is a clear 400 about the signature.
 * Mounted before the API's own parser, which then leaves the parsed body alone.
 */
export function signatureJson(): RequestHandler {
  const parser = express.json({ limit: "1500kb" });
  return (req, res, next) => {
    parser(req, res, (err?: unknown) => {
      if ((err as { type?: string } | undefined)?.type === "entity.too.large") {
        const message = "The drawn signature image is too large: at most 1 MB.";
        return next(new AppError("signature-too-large", message, 400, { "signature.drawnPngDataUrl": message, drawnPngDataUrl: message }));
      }
      next(err as Error | undefined);
    });
  };
}
