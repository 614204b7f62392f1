import type { RequestHandler } from "express";
import type { ZodType } from "zod";
import { z } from "zod";
import { SafeInputSchema } from "../../shared/schemas/input-safety.ts";

/**
 * Parses untrusted input with a schema; the error middleware turns a ZodError into a 400. The shared
 * input checks (no control characters, no deep nesting) run first, so a body read after the API's
 * middleware (a multipart form's fields, a CSV) is held to them too.
 */
export function parse<T>(schema: ZodType<T>, input: unknown): T {
  SafeInputSchema.parse(input);
  return schema.parse(input);
}

/**
 * Every API request's JSON body and query string pass the shared input checks before any route runs,
 * so a route that reads a field without a schema still never hands NUL to PostgreSQL.
 */
export function safeInput(opts: { exemptPaths: RegExp[] }): RequestHandler {
  return (req, _res, next) => {
    if (opts.exemptPaths.some((p) => p.test(req.path))) return next();
    SafeInputSchema.parse(req.query);
    if (req.body !== undefined) SafeInputSchema.parse(req.body);
    next();
  };
}

/** Route ids are uuids; anything else can never match a row, so it is simply not found. */
export const IdParam = z.string().uuid();
