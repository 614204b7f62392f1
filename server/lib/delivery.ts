/**
 * How the client and the API's answers travel (issue 17, delivery).
 *
 * - The built client is served from files compressed at build time (`vite-plugin-compression2`
 *   writes `.br` and `.gz` beside each asset over 1 kB): brotli when the browser takes it, else gzip.
 * - Files under `assets/` carry a content hash in their name, so they are cached for a year and
 *   never revalidated; `index.html` names those hashes, so it is revalidated on every visit
 *   (`no-cache`), and a new release is picked up at once. Other public files (favicon) keep an hour.
 * - JSON answers over 1 kB are compressed on the fly; brotli at quality 4, which costs about what gzip
 *   does, because quality 11 is built for files compressed once, not for each answer.
 */
import path from "node:path";
import { constants as zlibConstants } from "node:zlib";
import compression from "compression";
import express, { type RequestHandler, type Router } from "express";
import expressStaticGzip from "express-static-gzip";

export const HASHED_ASSET_CACHE = "public, max-age=31536000, immutable";
export const PAGE_CACHE = "no-cache";
/**
 * Files with fixed names that announce a release: the page, the service worker (a stale copy would
 * keep the old release installed for an hour) and the app manifest.
 */
const REVALIDATED_FILES = new Set(["index.html", "sw.js", "manifest.webmanifest"]);

/** Compresses answers the browser accepts compressed (JSON, HTML, CSV), skipping those under 1 kB. */
export function compressAnswers(): RequestHandler {
  return compression({ threshold: 1024, brotli: { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 4 } } });
}

/** The built client: pre-compressed static files, then `index.html` for every other path. */
export function clientRoutes(dir: string): Router {
  const router = express.Router();
  router.use(
    expressStaticGzip(dir, {
      enableBrotli: true,
      orderPreference: ["br", "gz"],
      index: false,
      serveStatic: {
        index: false,
        maxAge: "1h",
        setHeaders: (res, file) => {
          if (file.includes(`${path.sep}assets${path.sep}`)) res.setHeader("Cache-Control", HASHED_ASSET_CACHE);
          else if (REVALIDATED_FILES.has(path.basename(file).replace(/\.(br|gz)$/, ""))) res.setHeader("Cache-Control", PAGE_CACHE);
        },
      },
    }),
  );
  router.get("/{*splat}", (_req, res) => {
    res.sendFile(path.join(dir, "index.html"), { headers: { "Cache-Control": PAGE_CACHE } });
  });
  return router;
}
