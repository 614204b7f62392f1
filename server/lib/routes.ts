import { Router, type Request, type RequestHandler, type Response } from "express";
import { can, type Permission } from "../../shared/schemas/roles.ts";
import { forbidden, notFound, unauthorized } from "./errors.ts";
import { IdParam } from "./validate.ts";

export type Method = "get" | "post" | "put" | "patch" | "delete";

/**
 * Who may call a route: holders of a permission (shared/schemas/roles.ts), any signed-in user,
 * or anyone ("public": sign-in, password reset, invitations, the homeowner's link).
 */
export type Access = Permission | "signed-in" | "public";

/**
 * One API route as data: method, path under /api, who may call it and the handler. Kept
 * declarative so the route × role and tenant matrices (issue 9) can be generated from the
 * list itself and a new route cannot slip past them.
 */
export interface RouteSpec {
  method: Method;
  path: string;
  access: Access;
  /** Path parameters that are row ids of the caller's company: a foreign or malformed one answers 404. */
  idParams?: readonly string[];
  /**
   * A creating request: runs in one transaction with its audit entry and honours an
   * Idempotency-Key (server/lib/idempotency.ts). Its handler must answer with `res.json`.
   */
  creates?: boolean;
  /** Middleware that runs after the access check (e.g. a body parser); rarely needed. */
  before?: RequestHandler[];
  handler: (req: Request, res: Response) => Promise<void> | void;
}

export type RouteInfo = Pick<RouteSpec, "method" | "path" | "access" | "idParams">;

/** The app's transaction-and-idempotency middleware (app.locals.createsInTransaction, set by createApp). */
const createsInTransaction: RequestHandler = (req, res, next) => {
  const middleware = req.app.locals.createsInTransaction as RequestHandler | undefined;
  if (!middleware) return next(new Error("createApp did not set app.locals.createsInTransaction"));
  middleware(req, res, next);
};

function guard(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === "public") return next();
    if (!req.actor) return next(unauthorized());
    if (access !== "signed-in" && !can(req.actor.role, access)) return next(forbidden());
    next();
  };
}

/** A Router built from route specs, carrying the specs for the matrices and docs. */
export function routesRouter(specs: readonly RouteSpec[]): Router & { routes: readonly RouteInfo[] } {
  const router = Router() as Router & { routes: readonly RouteInfo[] };
  for (const spec of specs) {
    router[spec.method](spec.path, guard(spec.access), ...(spec.before ?? []), ...(spec.creates ? [createsInTransaction] : []), spec.handler);
  }
  router.routes = specs.map(({ method, path, access, idParams }) => ({ method, path, access, ...(idParams ? { idParams } : {}) }));
  return router;
}

/** A route's uuid parameter; a malformed id can match no row, so it answers exactly as a foreign one. */
export function idParam(req: Request, name: string, what: string): string {
  const parsed = IdParam.safeParse(req.params[name]);
  if (!parsed.success) throw notFound(what);
  return parsed.data;
}
