import type { ErrorRequestHandler } from "express";
import { ZodError } from "zod";
import { AppError } from "./errors.ts";
import type { Logger } from "./logger.ts";

/** Postgres says the server is unreachable or shutting down: a 503, not our bug. */
function isDatabaseUnavailable(err: unknown): boolean {
  const e = err as { code?: string; errno?: string; message?: string } | null;
  if (!e) return false;
  const codes = ["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "CONNECT_TIMEOUT", "CONNECTION_CLOSED", "CONNECTION_ENDED", "CONNECTION_DESTROYED", "57P01", "57P02", "57P03", "08006", "08001", "08003"];
  return codes.includes(String(e.code)) || codes.includes(String(e.errno));
}

export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.length ? issue.path.join(".") : "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export function errorMiddleware(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return;
    if (err instanceof AppError) {
      res.status(err.status).json({ error: { code: err.code, message: err.message, fields: err.fields ?? {} } });
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
    if (isDatabaseUnavailable(err)) {
      logger.warn({ err: { code: e.code, message: e.message } }, "database unavailable");
      res.status(503).set("Retry-After", "5").json({ error: { code: "unavailable", message: "The service is briefly unavailable. Please try again in a moment.", fields: {} } });
      return;
    }
    ((req as { log?: Logger }).log ?? logger).error({ err }, "unhandled error");
    res.status(500).json({ error: { code: "internal", message: "Something went wrong on our side. Your input was not lost; please try again.", fields: {} } });
  };
}
