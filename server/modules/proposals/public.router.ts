import type { Request } from "express";
import { pipeline } from "node:stream/promises";
import type { Readable } from "node:stream";
import rateLimit from "express-rate-limit";
import { z } from "zod";
import { IdParam, parse } from "../../lib/validate.ts";
import { AppError } from "../../lib/errors.ts";
import { metaOf } from "../../lib/request-context.ts";
import { routesRouter } from "../../lib/routes.ts";
import { AcceptSchema, DeclineSchema, VerifyQuerySchema } from "../../../shared/proposals/schemas.ts";
import type { ProposalsService } from "./proposals.service.ts";
import { sendPdf } from "./proposals.router.ts";
import { concurrencyGate, MAX_CONCURRENT_PUBLIC_UPLOADS, MAX_VERIFY_PDF_BYTES, receiveFile } from "./uploads.ts";
import type { Database } from "../../db/client.ts";
import { PostgresRateLimitStore } from "../../lib/postgres-rate-limit-store.ts";

const PhotoIdSchema = IdParam;
const ImageQuerySchema = z.object({ thumb: z.enum(["1", "0", "true", "false"], { error: "thumb is 1 or 0." }).optional() });

/** The homeowner's images: inline, kept by this browser only, never by shared caches. */
export async function sendImage(res: import("express").Response, file: { body: Readable; contentType: string; sizeBytes: number | null }) {
  res.set({
    "Content-Type": file.contentType,
    "Cache-Control": "private, max-age=3600",
    "Content-Disposition": "inline",
    "X-Content-Type-Options": "nosniff",
    ...(file.sizeBytes !== null ? { "Content-Length": String(file.sizeBytes) } : {}),
  });
  await pipeline(file.body, res);
}

const TokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/);
/** A malformed token can match nothing, so it answers exactly as an unknown one. */
const tokenOf = (req: Request) => {
  const parsed = TokenSchema.safeParse(req.params.token);
  return parsed.success ? parsed.data : "";
};

/**
 * The homeowner's side, no account, limited per address. Failed look-ups (a link that does not
 * exist or has expired) are the guessing limit: counted in PostgreSQL, so it holds across every
 * server process (256-bit tokens make guessing hopeless anyway; the limit keeps it visible and
 * cheap). The per-minute limit on all requests only spares each process a flood, so each process
 * counts it on its own, in memory.
 */
export function publicRateLimits(opts: { db: Database; now: () => Date; namespace: string }) {
  const body = (message: string) => ({ error: { code: "rate-limited", message, fields: {} } });
  return [
    rateLimit({ windowMs: 60_000, limit: 120, standardHeaders: "draft-8", legacyHeaders: false, message: body("Too many requests. Please wait a minute and try again.") }),
    rateLimit({
      windowMs: 15 * 60_000, limit: 20, standardHeaders: "draft-8", legacyHeaders: false,
      store: new PostgresRateLimitStore(opts.db, `${opts.namespace}public-link-failures:`, opts.now),
      // Only answers that say "no such link" count toward this one.
      requestWasSuccessful: (_req, res) => res.statusCode !== 404 && res.statusCode !== 410,
      skipSuccessfulRequests: true,
      message: body("Too many attempts with links that do not work. Please wait 15 minutes, or contact the company that sent you the proposal."),
    }),
  ];
}

export function publicProposalsRouter(service: ProposalsService) {
  // Per process; each process has its own few slots (the cap keeps each upload small).
  const uploadGate = concurrencyGate(MAX_CONCURRENT_PUBLIC_UPLOADS, "uploaded PDFs");
  return routesRouter([
    {
      method: "get", path: "/public/proposals/:token", access: "public",
      handler: async (req, res) => {
        res.set("Cache-Control", "no-store");
        res.json(await service.view(tokenOf(req), metaOf(req)));
      },
    },
    {
      method: "get", path: "/public/proposals/:token/pdf", access: "public",
      handler: async (req, res) => {
        const p = await service.byToken(tokenOf(req));
        const file = await service.pdf(p, p, "latest");
        sendPdf(req, res, file);
        res.set("Cache-Control", "private, max-age=3600");
        await pipeline(file.object.body, res);
      },
    },
    {
      method: "get", path: "/public/proposals/:token/logo", access: "public",
      handler: async (req, res) => { await sendImage(res, await service.publicLogo(tokenOf(req))); },
    },
    {
      method: "get", path: "/public/proposals/:token/photos/:photoId", access: "public",
      handler: async (req, res) => {
        const token = tokenOf(req);
        const { thumb } = parse(ImageQuerySchema, req.query);
        const id = PhotoIdSchema.safeParse(req.params.photoId);
        // A malformed id can be in no snapshot; the token is still checked first (404/410 as usual).
        const file = await service.publicPhoto(token, id.success ? id.data : "", thumb === "1" || thumb === "true");
        await sendImage(res, file);
      },
    },
    {
      method: "post", path: "/public/proposals/:token/accept", access: "public",
      handler: async (req, res) => { res.json(await service.accept(tokenOf(req), parse(AcceptSchema, req.body), metaOf(req))); },
    },
    {
      method: "post", path: "/public/proposals/:token/decline", access: "public",
      handler: async (req, res) => { res.json(await service.decline(tokenOf(req), parse(DeclineSchema, req.body ?? {}).reason, metaOf(req))); },
    },
    {
      method: "get", path: "/public/verify", access: "public",
      handler: async (req, res) => { res.json(await service.verify(parse(VerifyQuerySchema, req.query).sha256)); },
    },
    {
      method: "post", path: "/public/verify", access: "public", before: [uploadGate],
      handler: async (req, res) => {
        await receiveFile(req, res, MAX_VERIFY_PDF_BYTES, "proposal PDF", { isHashOnly: true });
        const sha256 = (req.file as { sha256?: string } | undefined)?.sha256;
        if (!sha256) throw new AppError("invalid-input", "Send the PDF in the form field named file.", 400, { file: "Choose the PDF to check." });
        res.json(await service.verify(sha256));
      },
    },
  ]);
}
