import { createHash } from "node:crypto";
import express, { type Request, type RequestHandler, type Response } from "express";
import multer from "multer";
import { AppError } from "../../lib/errors.ts";

/**
 * The public "is this our PDF?" upload takes no account, so it is held to what a real proposal PDF
 * can be: the PDF draws photos and logo at print size, so its size follows the counts the limits
 * allow (Decision 17; tests/api/largest-proposal.test.ts measures the largest one against this cap).
 */
export const MAX_VERIFY_PDF_BYTES = 12 * 1024 * 1024;
/** Public uploads hashed at once in one process; more answer 503 with Retry-After. */
export const MAX_CONCURRENT_PUBLIC_UPLOADS = 4;
/** Multipart framing around the file (boundaries, part headers, a filename). */
const MULTIPART_OVERHEAD_BYTES = 16 * 1024;

const tooLarge = (maxBytes: number, what: string) => {
  const message = `The ${what} is larger than ${Math.round(maxBytes / 1024 / 1024)} MB.`;
  return new AppError("file-too-large", message, 413, { file: message });
};

/**
 * A multer storage engine that keeps nothing: it hashes the file's bytes as they stream in and
 * records their SHA-256 and count on `req.file` (`sha256`, `size`).
 */
const hashingStorage: multer.StorageEngine = {
  _handleFile(_req, file, cb) {
    const hash = createHash("sha256");
    let size = 0;
    file.stream.on("data", (chunk: Buffer) => {
      hash.update(chunk);
      size += chunk.length;
    });
    file.stream.on("error", (err) => cb(err));
    file.stream.on("end", () => cb(null, { size, sha256: hash.digest("hex") } as Partial<Express.Multer.File>));
  },
  _removeFile(_req, _file, cb) {
    cb(null);
  },
};

/** Reads one multipart file (field "file"), turning multer's errors into clear answers. */
export function receiveFile(req: Request, res: Response, maxBytes: number, what: string, opts: { isHashOnly?: boolean } = {}): Promise<void> {
  // A declared length over the limit is refused before a byte of the body is read.
  const declaredBytes = Number(req.headers["content-length"]);
  if (Number.isFinite(declaredBytes) && declaredBytes > maxBytes + MULTIPART_OVERHEAD_BYTES) {
    res.set("Connection", "close");
    return Promise.reject(tooLarge(maxBytes, what));
  }
  const storage = opts.isHashOnly ? hashingStorage : multer.memoryStorage();
  const upload = multer({ storage, limits: { fileSize: maxBytes, files: 1, fields: 5, parts: 6 } }).single("file");
  return new Promise((resolve, reject) => {
    upload(req, res, (err: unknown) => {
      if (!err) return resolve();
      if (err instanceof multer.MulterError && err.code === "LIMIT_FILE_SIZE") {
        res.set("Connection", "close");
        return reject(tooLarge(maxBytes, what));
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

/**
 * At most `max` requests at once through this gate in this process; the rest answer 503 with
 * Retry-After at once, before their body is read. A slot is freed when the answer is sent or the
 * client goes away.
 */
export function concurrencyGate(max: number, what: string): RequestHandler {
  let inFlight = 0;
  return (_req, res, next) => {
    if (inFlight >= max) {
      res.set({ "Retry-After": "5", Connection: "close" });
      return next(new AppError("busy", `Too many ${what} are being checked right now. Please try again in a few seconds.`, 503));
    }
    inFlight++;
    let isReleased = false;
    res.once("close", () => {
      if (!isReleased) inFlight--;
      isReleased = true;
    });
    next();
  };
}
