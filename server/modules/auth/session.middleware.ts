import type { Request, Response, RequestHandler } from "express";
import type { Cookie } from "lucia";
import { SESSION_IDLE, type AppLucia } from "./lucia.ts";
import type { SessionCache } from "./session-cache.ts";

/** Requests that may change something: always checked against the database, never the cache. */
const READ_METHODS = new Set(["GET", "HEAD"]);
const HALF_IDLE_MS = SESSION_IDLE.milliseconds() / 2;

/** Writes a lucia cookie, Secure whenever this request came over https. */
export function writeCookie(req: Request, res: Response, cookie: Cookie): void {
  const a = cookie.attributes;
  res.cookie(cookie.name, cookie.value, {
    httpOnly: true,
    sameSite: "lax",
    secure: req.secure,
    path: a.path ?? "/",
    ...(a.maxAge !== undefined ? { maxAge: a.maxAge * 1000 } : {}),
    ...(a.expires ? { expires: a.expires } : {}),
  });
}

/**
 * Reads the session cookie (if any) and puts the actor on the request. Never refuses by itself.
 *
 * With a cache (session-cache.ts), a read (GET/HEAD) whose session this process validated moments
 * ago is answered from it, as long as lucia would not extend the session now (it extends once
 * less than half the idle time is left; lucia keeps its own clock, so this check does too) and its
 * absolute expiry is still ahead. Writes always validate against the database.
 */
export function sessionMiddleware(lucia: AppLucia, now: () => Date = () => new Date(), cache?: SessionCache): RequestHandler {
  return async (req, res, next) => {
    try {
      const id = lucia.readSessionCookie(req.get("cookie") ?? "");
      if (!id) return next();
      const isRead = READ_METHODS.has(req.method);
      if (cache && isRead) {
        const hit = cache.get(id, Date.now());
        if (hit && hit.expiresAt.getTime() - Date.now() > HALF_IDLE_MS && hit.absoluteExpiresAt.getTime() > now().getTime()) {
          req.sessionId = id;
          req.actor = hit.actor;
          return next();
        }
      }
      const fillToken = cache?.fillToken();
      const { session, user } = await lucia.validateSession(id);
      if (!session || !user) {
        writeCookie(req, res, lucia.createBlankSessionCookie());
        return next();
      }
      if (!user.isActive || session.absoluteExpiresAt.getTime() <= now().getTime()) {
        await lucia.invalidateSession(session.id);
        writeCookie(req, res, lucia.createBlankSessionCookie());
        return next();
      }
      if (session.fresh) writeCookie(req, res, lucia.createSessionCookie(session.id));
      req.sessionId = session.id;
      req.actor = { userId: user.id, companyId: user.companyId, role: user.role, email: user.email, name: user.name };
      if (cache && fillToken !== undefined) {
        cache.set(session.id, { actor: req.actor, expiresAt: session.expiresAt, absoluteExpiresAt: session.absoluteExpiresAt }, fillToken, Date.now());
      }
      next();
    } catch (err) {
      next(err);
    }
  };
}
