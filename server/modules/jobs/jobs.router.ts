import type { Request } from "express";
import { pipeline } from "node:stream/promises";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { AssignJobSchema, JobPhotoFieldsSchema, TickSchema } from "../../../shared/jobs/schemas.ts";
import { receiveFile } from "../photos/photos.router.ts";
import { sendPdf } from "../proposals/proposals.router.ts";
import { sendImage } from "../proposals/public.router.ts";
import type { JobsService } from "./jobs.service.ts";

const jobId = (req: Request) => idParam(req, "id", "That job");
/** Checklist ids are generated (`w3`, `m-<uuid>`, `co2-l1`); anything else can match no item. */
const ItemIdSchema = z.string().regex(/^[A-Za-z0-9_-]{1,120}$/);
const itemIdOf = (req: Request) => {
  const parsed = ItemIdSchema.safeParse(req.params.itemId);
  return parsed.success ? parsed.data : "-";
};
const ThumbQuerySchema = z.object({ thumb: z.enum(["1", "0", "true", "false"], { error: "thumb is 1 or 0." }).optional() });
const TokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/);
const tokenOf = (req: Request) => {
  const parsed = TokenSchema.safeParse(req.params.token);
  return parsed.success ? parsed.data : "";
};

/** Staff and crew: assign accepted work, read job sheets, tick the checklist with photos, complete. */
export function jobsRouter(service: JobsService) {
  return routesRouter([
    {
      method: "get", path: "/jobs", access: "jobs:read",
      handler: async (req, res) => { res.json(await service.list(actorOf(req))); },
    },
    {
      method: "get", path: "/crew-members", access: "jobs:assign",
      handler: async (req, res) => { res.json({ crew: await service.crewMembers(actorOf(req)) }); },
    },
    {
      method: "get", path: "/projects/:id/job", access: "projects:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.forProject(actorOf(req), idParam(req, "id", "That project"))); },
    },
    {
      method: "put", path: "/projects/:id/job", access: "jobs:assign", idParams: ["id"],
      handler: async (req, res) => {
        const projectId = idParam(req, "id", "That project");
        res.json(await service.assign(actorOf(req), projectId, parse(AssignJobSchema, req.body)));
      },
    },
    {
      method: "get", path: "/jobs/:id", access: "jobs:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.sheet(actorOf(req), jobId(req))); },
    },
    {
      method: "put", path: "/jobs/:id/items/:itemId", access: "jobs:work", idParams: ["id"],
      handler: async (req, res) => {
        const id = jobId(req);
        res.json(await service.setTick(actorOf(req), id, itemIdOf(req), parse(TickSchema, req.body).isDone));
      },
    },
    {
      method: "post", path: "/jobs/:id/items/:itemId/photos", access: "jobs:work", idParams: ["id"],
      handler: async (req, res) => {
        const id = jobId(req);
        const actor = actorOf(req);
        // Check the job (and that it is this crew member's) before taking in up to 15 MB for it.
        await service.sheetAccess(actor, id);
        await receiveFile(req, res);
        const { caption } = parse(JobPhotoFieldsSchema, { ...(req.body as object) });
        res.status(201).json({ photo: await service.addPhoto(actor, id, itemIdOf(req), req.file, caption ?? null) });
      },
    },
    {
      method: "get", path: "/jobs/:id/photos/:photoId", access: "jobs:read", idParams: ["id", "photoId"],
      handler: async (req, res) => {
        const id = jobId(req);
        const photoId = idParam(req, "photoId", "That photo");
        const { thumb } = parse(ThumbQuerySchema, req.query);
        const file = await service.openPhoto(actorOf(req), id, photoId, thumb === "1" || thumb === "true");
        res.set({ "Content-Type": file.contentType, "Content-Disposition": "inline", ...(file.sizeBytes !== null ? { "Content-Length": String(file.sizeBytes) } : {}) });
        await pipeline(file.body, res);
      },
    },
    {
      method: "post", path: "/jobs/:id/complete", access: "jobs:work", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.complete(actorOf(req), jobId(req), metaOf(req))); },
    },
    {
      method: "get", path: "/jobs/:id/report.pdf", access: "jobs:read", idParams: ["id"],
      handler: async (req, res) => {
        const file = await service.reportPdf(actorOf(req), jobId(req));
        sendPdf(req, res, file);
        await pipeline(file.object.body, res);
      },
    },
  ]);
}

/** The homeowner's completion page: the report, its PDF and the crew's photos, through an unguessable link. */
export function publicJobsRouter(service: JobsService) {
  return routesRouter([
    {
      method: "get", path: "/public/completion/:token", access: "public",
      handler: async (req, res) => { res.json(await service.publicReport(tokenOf(req))); },
    },
    {
      method: "get", path: "/public/completion/:token/pdf", access: "public",
      handler: async (req, res) => {
        const file = await service.publicPdf(tokenOf(req));
        sendPdf(req, res, file);
        await pipeline(file.object.body, res);
      },
    },
    {
      method: "post", path: "/public/completion/:token/balance/checkout", access: "public",
      handler: async (req, res) => { res.json(await service.publicBalanceCheckout(tokenOf(req), metaOf(req))); },
    },
    {
      method: "get", path: "/public/completion/:token/photos/:photoId", access: "public",
      handler: async (req, res) => {
        const token = tokenOf(req);
        const parsed = z.string().uuid().safeParse(req.params.photoId);
        await sendImage(res, await service.publicPhoto(token, parsed.success ? parsed.data : "00000000-0000-0000-0000-000000000000"));
      },
    },
  ]);
}
