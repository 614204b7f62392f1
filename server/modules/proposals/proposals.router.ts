import type { Request } from "express";
import { pipeline } from "node:stream/promises";
import { z } from "zod";
import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import { CompanyProfilePatchSchema, ProposalCreateSchema, ProposalPatchSchema, SendSchema, SignatureInputSchema } from "../../../shared/proposals/schemas.ts";
import type { CompanyService } from "./company.service.ts";
import { MAX_LOGO_BYTES } from "./company.service.ts";
import type { ProposalsService } from "./proposals.service.ts";
import { receiveFile } from "./uploads.ts";

const proposalId = (req: Request) => idParam(req, "id", "That proposal");
const PdfQuerySchema = z.object({ kind: z.enum(["original", "signed", "latest"], { error: "kind is original, signed or latest." }).default("latest") });

/** Staff routes: the company profile, the seller's signature and proposals. */
export function proposalsRouter(service: ProposalsService, company: CompanyService) {
  return routesRouter([
    {
      method: "get", path: "/company", access: "company:edit",
      handler: async (req, res) => { res.json({ company: await company.get(actorOf(req)) }); },
    },
    {
      method: "patch", path: "/company", access: "company:edit",
      handler: async (req, res) => { res.json({ company: await company.update(actorOf(req), parse(CompanyProfilePatchSchema, req.body)) }); },
    },
    {
      method: "post", path: "/company/logo", access: "company:edit",
      handler: async (req, res) => {
        await receiveFile(req, res, MAX_LOGO_BYTES, "logo");
        res.json({ company: await company.setLogo(actorOf(req), req.file) });
      },
    },
    {
      method: "get", path: "/company/estimate-conditions", access: "signed-in",
      handler: async (req, res) => { res.json({ estimateConditions: await company.estimateConditions(actorOf(req)) }); },
    },
    {
      method: "get", path: "/company/logo", access: "signed-in",
      handler: async (req, res) => {
        const { object, contentType } = await company.openLogo(actorOf(req));
        res.set({ "Content-Type": contentType });
        await pipeline(object.body, res);
      },
    },
    {
      method: "get", path: "/auth/me/signature", access: "signed-in",
      handler: async (req, res) => { res.json(await service.sellerSignature(actorOf(req))); },
    },
    {
      method: "put", path: "/auth/me/signature", access: "signed-in",
      handler: async (req, res) => { res.json(await service.setSellerSignature(actorOf(req), parse(SignatureInputSchema, req.body))); },
    },
    {
      method: "get", path: "/projects/:id/proposals", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => { res.json({ proposals: await service.listForProject(actorOf(req), idParam(req, "id", "That project")) }); },
    },
    {
      method: "post", path: "/projects/:id/proposals", access: "proposals:draft", idParams: ["id"], creates: true,
      handler: async (req, res) => {
        const projectId = idParam(req, "id", "That project");
        res.status(201).json({ proposal: await service.create(actorOf(req), projectId, parse(ProposalCreateSchema, req.body), metaOf(req)) });
      },
    },
    {
      method: "get", path: "/proposals/:id", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.detail(actorOf(req), proposalId(req))); },
    },
    {
      method: "patch", path: "/proposals/:id", access: "proposals:draft", idParams: ["id"],
      handler: async (req, res) => {
        const id = proposalId(req);
        res.json(await service.update(actorOf(req), id, parse(ProposalPatchSchema, req.body), metaOf(req)));
      },
    },
    {
      method: "post", path: "/proposals/:id/render", access: "proposals:draft", idParams: ["id"],
      handler: async (req, res) => { res.status(202).json({ proposal: await service.render(actorOf(req), proposalId(req)) }); },
    },
    {
      method: "get", path: "/proposals/:id/render-status", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => { res.json({ render: await service.renderStatus(actorOf(req), proposalId(req)) }); },
    },
    {
      method: "get", path: "/proposals/:id/pdf", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => {
        const id = proposalId(req);
        const { kind } = parse(PdfQuerySchema, req.query);
        const actor = actorOf(req);
        const file = await service.pdf(actor, await service.requireProposal(actor, id), kind);
        sendPdf(req, res, file);
        await pipeline(file.object.body, res);
      },
    },
    {
      method: "post", path: "/proposals/:id/send", access: "proposals:send", idParams: ["id"],
      handler: async (req, res) => {
        const id = proposalId(req);
        res.json(await service.send(actorOf(req), id, metaOf(req), parse(SendSchema, req.body ?? {})));
      },
    },
    {
      method: "post", path: "/proposals/:id/revoke-link", access: "proposals:send", idParams: ["id"],
      handler: async (req, res) => { res.json({ proposal: await service.revokeLink(actorOf(req), proposalId(req), metaOf(req)) }); },
    },
    {
      method: "post", path: "/proposals/:id/resend", access: "proposals:send", idParams: ["id"],
      handler: async (req, res) => {
        const id = proposalId(req);
        res.json(await service.resend(actorOf(req), id, metaOf(req), parse(SendSchema, req.body ?? {})));
      },
    },
    {
      method: "post", path: "/proposals/:id/reissue-link", access: "proposals:send", idParams: ["id"],
      handler: async (req, res) => {
        const id = proposalId(req);
        res.json(await service.reissueLink(actorOf(req), id, metaOf(req), parse(SendSchema, req.body ?? {})));
      },
    },
  ]);
}

/** PDFs are served by their hash: the ETag is the SHA-256, so a copy can be checked against it. */
export function sendPdf(req: Request, res: import("express").Response, file: { sha256: string; filename: string; object: { sizeBytes: number | null } }) {
  res.set({
    "Content-Type": "application/pdf",
    "Content-Disposition": `attachment; filename="${file.filename}"`,
    ETag: `"${file.sha256}"`,
    "X-Content-SHA256": file.sha256,
    ...(file.object.sizeBytes !== null ? { "Content-Length": String(file.object.sizeBytes) } : {}),
  });
  void req;
}
