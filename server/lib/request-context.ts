import type { Request } from "express";
import type { Role } from "../../shared/schemas/roles.ts";
import { unauthorized } from "./errors.ts";

/** Who is asking; built once per request by the session middleware. */
export interface Actor {
  userId: string;
  companyId: string;
  role: Role;
  email: string;
  name: string;
}

export interface RequestMeta {
  ip: string | null;
  userAgent: string | null;
}

declare module "express-serve-static-core" {
  interface Request {
    actor?: Actor;
    sessionId?: string;
  }
}

export function actorOf(req: Request): Actor {
  if (!req.actor) throw unauthorized();
  return req.actor;
}

export function metaOf(req: Request): RequestMeta {
  return { ip: req.ip ?? null, userAgent: req.get("user-agent")?.slice(0, 500) ?? null };
}
