import express, { type Request, type RequestHandler } from "express";
import { z } from "zod";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { idParam, routesRouter } from "../../lib/routes.ts";
import type { PaymentsService } from "./payments.service.ts";

/** The same shape check as the proposal link's (public.router.ts): a malformed token answers as an unknown one. */
const TokenSchema = z.string().regex(/^[A-Za-z0-9_-]{20,100}$/);
const tokenOf = (req: Request) => {
  const parsed = TokenSchema.safeParse(req.params.token);
  return parsed.success ? parsed.data : "";
};

export const PAYMENTS_WEBHOOK_PATH = "/webhooks/payments";

/**
 * The webhook's body kept as the exact bytes received: the signature is over them, so it must be
 * read before the API's JSON parser (which then leaves the request alone).
 */
export function paymentsWebhookBody(): RequestHandler {
  return express.raw({ type: () => true, limit: "512kb" });
}

/**
 * Deposits: the homeowner's checkout and status (by the proposal link), the provider's webhook,
 * and the staff views and refunds.
 */
export function paymentsRouter(service: PaymentsService) {
  return routesRouter([
    {
      method: "get", path: "/public/proposals/:token/deposit", access: "public",
      handler: async (req, res) => {
        res.set("Cache-Control", "no-store");
        res.json({ deposit: await service.publicDeposit(tokenOf(req)) });
      },
    },
    {
      // The body is not read: the amount is always the server's.
      method: "post", path: "/public/proposals/:token/deposit/checkout", access: "public",
      handler: async (req, res) => { res.json(await service.startCheckout(tokenOf(req), metaOf(req))); },
    },
    {
      method: "post", path: PAYMENTS_WEBHOOK_PATH, access: "public",
      handler: async (req, res) => { res.json(await service.handleWebhook(req.body, req.get("stripe-signature"), metaOf(req))); },
    },
    {
      method: "get", path: "/proposals/:id/payments", access: "proposals:read", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.forProposal(actorOf(req), idParam(req, "id", "That proposal"))); },
    },
    {
      method: "post", path: "/payments/:id/refund", access: "payments:refund", idParams: ["id"],
      handler: async (req, res) => { res.json(await service.refund(actorOf(req), idParam(req, "id", "That payment"), metaOf(req))); },
    },
  ]);
}
