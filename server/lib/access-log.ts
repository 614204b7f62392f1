import type { RequestHandler } from "express";
import type { Logger } from "./logger.ts";

/**
 * One log line per answered request (method, path, status, time), as pino-http wrote it, without
 * its per-request child logger, id generator and serializers: those cost more than the line
 * itself on a JSON answer (bench/api-load-bench.ts). Nothing at all is attached when the level
 * is above info. 5xx answers log at error, the rest at info (as pino-http did).
 */
export function accessLog(logger: Logger, opts: { ignore?: (url: string) => boolean } = {}): RequestHandler {
  let requestCount = 0;
  return (req, res, next) => {
    if (!logger.isLevelEnabled("info") && !logger.isLevelEnabled("error")) return next();
    if (opts.ignore?.(req.url)) return next();
    const startMs = performance.now();
    const id = ++requestCount;
    const { method, originalUrl } = req;
    res.once("finish", () => {
      const status = res.statusCode;
      const level = status >= 500 ? "error" : "info";
      if (!logger.isLevelEnabled(level)) return;
      logger[level]({ req: { id, method, url: originalUrl }, res: { statusCode: status }, responseTime: Math.round(performance.now() - startMs) }, "request completed");
    });
    next();
  };
}
