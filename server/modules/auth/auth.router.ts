import { parse } from "../../lib/validate.ts";
import { actorOf, metaOf } from "../../lib/request-context.ts";
import { routesRouter } from "../../lib/routes.ts";
import {
  AcceptInviteSchema, ChangePasswordSchema, ResetConfirmSchema, ResetRequestSchema,
  SignInSchema, TokenSchema, UpdateMeSchema,
} from "../../../shared/schemas/auth.ts";
import type { AuthService } from "./auth.service.ts";
import type { AppLucia } from "./lucia.ts";
import { writeCookie } from "./session.middleware.ts";

export function authRouter(service: AuthService, lucia: AppLucia) {
  return routesRouter([
    {
      method: "post", path: "/auth/sign-in", access: "public",
      handler: async (req, res) => {
        const input = parse(SignInSchema, req.body);
        // A fresh session id at every sign-in; any session the browser held is ended first.
        if (req.sessionId) await lucia.invalidateSession(req.sessionId);
        const { session, ...me } = await service.signIn(input, metaOf(req));
        writeCookie(req, res, lucia.createSessionCookie(session.id));
        res.json(me);
      },
    },
    {
      method: "post", path: "/auth/sign-out", access: "public",
      handler: async (req, res) => {
        if (req.sessionId && req.actor) await service.signOut(req.sessionId, req.actor.userId, metaOf(req));
        writeCookie(req, res, lucia.createBlankSessionCookie());
        res.status(204).end();
      },
    },
    {
      method: "post", path: "/auth/sign-out-everywhere", access: "signed-in",
      handler: async (req, res) => {
        const actor = actorOf(req);
        await service.signOutEverywhere(actor.userId, actor.companyId, metaOf(req));
        writeCookie(req, res, lucia.createBlankSessionCookie());
        res.status(204).end();
      },
    },
    {
      method: "get", path: "/auth/me", access: "signed-in",
      handler: async (req, res) => { res.json(await service.me(actorOf(req).userId)); },
    },
    {
      method: "patch", path: "/auth/me", access: "signed-in",
      handler: async (req, res) => { res.json(await service.updateMe(actorOf(req).userId, parse(UpdateMeSchema, req.body))); },
    },
    {
      method: "post", path: "/auth/password", access: "signed-in",
      handler: async (req, res) => {
        await service.changePassword(actorOf(req).userId, req.sessionId!, parse(ChangePasswordSchema, req.body), metaOf(req));
        res.status(204).end();
      },
    },
    {
      method: "post", path: "/auth/password-reset/request", access: "public",
      handler: async (req, res) => {
        const { email } = parse(ResetRequestSchema, req.body);
        await service.requestReset(email, metaOf(req));
        res.status(202).json({ message: "If an account exists for that address, we have sent it a link to reset the password." });
      },
    },
    {
      method: "post", path: "/auth/password-reset/confirm", access: "public",
      handler: async (req, res) => {
        await service.confirmReset(parse(ResetConfirmSchema, req.body), metaOf(req));
        res.status(204).end();
      },
    },
    {
      method: "get", path: "/auth/invites/:token", access: "public",
      handler: async (req, res) => { res.json(await service.getInvite(parse(TokenSchema, req.params.token))); },
    },
    {
      method: "post", path: "/auth/invites/:token/accept", access: "public",
      handler: async (req, res) => {
        const token = parse(TokenSchema, req.params.token);
        const { session, ...me } = await service.acceptInvite(token, parse(AcceptInviteSchema, req.body), metaOf(req));
        writeCookie(req, res, lucia.createSessionCookie(session.id));
        res.json(me);
      },
    },
  ]);
}
