import type { Request } from "express";
import { pipeline } from "node:stream/promises";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { ChangeOrderDraftSchema, ChangeOrderSignSchema } from "../../../shared/change-orders/index.ts";
import { DeclineSchema } from "../../../shared/proposals/schemas.ts";
import { sendPdf } from "../proposals/proposals.router.ts";
import type { ChangeOrdersService } from "./change-orders.service.ts";

const changeOrderId = (req: Request) => idParam(req, "id", "That change order");
const ChangeOrderPatchSchema = ChangeOrderDraftSchema.extend({ version: z.number({ error: "The version of the change order you edited is required." }).int().min(1) });
const TokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/);
/** A malformed token can match nothing, so it answers exactly as an unknown one. */
const tokenOf = (req: Request) => {
  const parsed = TokenSchema.safeParse(req.params.token);
  return parsed.success ? parsed.data : "";
};

/** Staff: draft, edit, send and read change orders against an accepted proposal. */
export function changeOrdersRouter(service: ChangeOrdersService) {
  return routesRouter([
    {
      method: "get", path: "/proposals/:id/change-orders", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.listForProposal(actorOf(req), idParam(req, "id", "That proposal"))); },
    },
    {
      method: "post", path: "/proposals/:id/change-orders", access: "proposals:draft", idParams: ["id"],
      handler: async (req, res) => {
        const proposalId = idParam(req, "id", "That proposal");
        res.status(201).json({ changeOrder: await service.create(actorOf(req), proposalId, parse(ChangeOrderDraftSchema, req.body), metaOf(req)) });
      },
    },
    {
      method: "put", path: "/change-orders/:id", access: "proposals:draft", idParams: ["id"],
      handler: async (req, res) => {
        const id = changeOrderId(req);
        res.json({ changeOrder: await service.update(actorOf(req), id, parse(ChangeOrderPatchSchema, req.body)) });
      },
    },
    {
      method: "post", path: "/change-orders/:id/send", access: "proposals:send", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.send(actorOf(req), changeOrderId(req), metaOf(req))); },
    },
    {
      method: "get", path: "/change-orders/:id/pdf", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => {
        const file = await service.pdf(actorOf(req), changeOrderId(req));
        sendPdf(req, res, file);
        await pipeline(file.object.body, res);
      },
    },
  ]);
}

/** The homeowner's side of a change order: read, download, sign or decline through its own link. */
export function publicChangeOrdersRouter(service: ChangeOrdersService) {
  return routesRouter([
    {
      method: "get", path: "/public/change-orders/:token", access: "public",
      handler: async (req, res) => {
        res.set("Cache-Control", "no-store");
        res.json(await service.view(tokenOf(req)));
      },
    },
    {
      method: "get", path: "/public/change-orders/:token/pdf", access: "public",
      handler: async (req, res) => {
        const file = await service.publicPdf(tokenOf(req));
        sendPdf(req, res, file);
        await pipeline(file.object.body, res);
      },
    },
    {
      method: "post", path: "/public/change-orders/:token/sign", access: "public",
      handler: async (req, res) => { res.json(await service.sign(tokenOf(req), parse(ChangeOrderSignSchema, req.body), metaOf(req))); },
    },
    {
      method: "post", path: "/public/change-orders/:token/decline", access: "public",
      handler: async (req, res) => { res.json(await service.decline(tokenOf(req), parse(DeclineSchema, req.body ?? {}).reason, metaOf(req))); },
    },
  ]);
}
