import type { RequestHandler } from "express";
import { AppError } from "./errors.ts";

const SAFE = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * CSRF defence in depth beside SameSite=Lax cookies: a state-changing request must carry an
 * Origin (or, failing that, a Referer) from this app's own origin. Browsers always send
 * Origin on cross-site POSTs, so a forged form post from elsewhere is refused here.
 */
export function originCheck(opts: { allowedOrigins: string[]; exemptPaths?: RegExp[] }): RequestHandler {
  return (req, _res, next) => {
    if (SAFE.has(req.method)) return next();
    if (opts.exemptPaths?.some((re) => re.test(req.path))) return next();
    const host = req.get("host");
    const allowed = new Set(opts.allowedOrigins);
    if (host) {
      allowed.add(`http://${host}`);
      allowed.add(`https://${host}`);
    }
    const origin = req.get("origin");
    let source = origin && origin !== "null" ? origin : undefined;
    if (!source) {
      const referer = req.get("referer");
      if (referer) {
        try {
          source = new URL(referer).origin;
        } catch {
          source = undefined;
        }
      }
    }
    if (!source || !allowed.has(source)) {
      return next(new AppError("cross-origin", "This request did not come from the Eavesight app and was refused.", 403));
    }
    next();
  };
}
