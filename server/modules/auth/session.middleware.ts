import type { Request, Response, RequestHandler } from "express";
import type { Cookie } from "lucia";
import type { AppLucia } from "./lucia.ts";

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

/** Reads the session cookie (if any) and puts the actor on the request. Never refuses by itself. */
export function sessionMiddleware(lucia: AppLucia, now: () => Date = () => new Date()): RequestHandler {
  return async (req, res, next) => {
    try {
      const id = lucia.readSessionCookie(req.get("cookie") ?? "");
      if (!id) return next();
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
      next();
    } catch (err) {
      next(err);
    }
  };
}
