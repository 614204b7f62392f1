import type { ErrorRequestHandler } from "express";
import { ZodError } from "zod";
import { AppError } from "./errors.ts";
import type { Logger } from "./logger.ts";

/** Postgres says the server is unreachable or shutting down, or the database is gone for a moment (3D000, while `db:restore` swaps it): a 503, not our bug. */
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "CONNECT_TIMEOUT", "CONNECTION_CLOSED", "CONNECTION_ENDED",
  "CONNECTION_DESTROYED", "57P01", "57P02", "57P03", "3D000", "08006", "08001", "08003", "08004",
]);
/** Drizzle wraps driver errors (DrizzleQueryError.cause), so the whole cause chain is looked at. */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (let e = err as { code?: unknown; errno?: unknown; cause?: unknown } | null, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (UNAVAILABLE_CODES.has(String(e.code)) || UNAVAILABLE_CODES.has(String(e.errno))) return true;
    if (e instanceof AggregateError && e.errors.some((x) => isDatabaseUnavailable(x))) return true;
  }
  return false;
}

/** The database's own guard on signed work (migrations 0015 and 0016 raise restrict_violation). */
export function isSignedWorkRefusal(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | null, depth = 0; e && depth < 5; e = e.cause as typeof e, depth++) {
    if (e.code === "23001") return true;
  }
  return false;
}

export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    // A strict schema names the unexpected keys themselves, so the client can point at them.
    if (issue.code === "unrecognized_keys") {
      for (const k of issue.keys) fields[[...issue.path, k].join(".")] ??= "This field is not expected here.";
      continue;
    }
    const key = issue.path.length ? issue.path.join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return;
    if (err instanceof AppError) {
      // "Briefly unavailable" always says when to come back.
      if (err.status === 503) res.set("Retry-After", "5");
      res.status(err.status).json({ error: { ...err.details, code: err.code, message: err.message, fields: err.fields ?? {} } });
      return;
    }
    if (err instanceof ZodError) {
      const fields = zodFields(err);
      const first = Object.entries(fields)[0];
      const message = first ? `Please check ${first[0] === "_" ? "the request" : first[0]}: ${first[1]}` : "The request is not valid.";
      res.status(400).json({ error: { code: "invalid-input", message, fields } });
      return;
    }
    // body-parser / multer errors carry a status and a type.
    const e = err as { status?: number; statusCode?: number; type?: string; message?: string; code?: string };
    const status = e.status ?? e.statusCode;
    if (status && status >= 400 && status < 500) {
      const message =
        e.type === "entity.too.large" ? "The request is too large." :
        e.type === "entity.parse.failed" ? "The request body is not valid JSON." :
        e.message ?? "The request could not be read.";
      res.status(status).json({ error: { code: e.type ?? e.code ?? "bad-request", message, fields: {} } });
      return;
    }
    if (isSignedWorkRefusal(err)) {
      res.status(409).json({ error: { code: "accepted-locked", message: "The homeowner signed this work, so it is read-only. Draft a change order to change it.", fields: {} } });
      return;
    }
    if (isDatabaseUnavailable(err)) {
      logger.warn({ err: { message: e.message } }, "database unavailable");
      res.status(503).set("Retry-After", "5").json({ error: { code: "unavailable", message: "The service is briefly unavailable. Please try again in a moment.", fields: {} } });
      return;
    }
    ((req as { log?: Logger }).log ?? logger).error({ err }, "unhandled error");
    res.status(500).json({ error: { code: "internal", message: "Something went wrong on our side. Your input was not lost; please try again.", fields: {} } });
  };
}
