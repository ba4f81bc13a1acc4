import type { RequestHandler } from "express";
import { AppError } from "./appError.js";

const safeMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Origin check for state-changing requests (the lucia guide's approach). Browsers send `Origin` on
 * every cross-origin and same-origin POST/PATCH/DELETE, so a request whose Origin differs from the
 * Host it was sent to came from another site. A request without Origin is a non-browser client
 * (curl, scripts) and is allowed unless it carries the session cookie, which only a browser
 * (or a deliberate script, which can then add Origin) would send.
 */
export function checkOrigin(options: { allowedOrigins: readonly string[]; sessionCookieName: string }): RequestHandler {
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const origin = req.get("origin");
    const host = req.get("host");
    if (!origin) {
      const hasSession = Boolean(req.cookies?.[options.sessionCookieName]);
      if (hasSession) return next(new AppError("csrf", "requests that change data must come from this site"));
      return next();
    }
    if (options.allowedOrigins.includes(origin)) return next();
    let originHost: string | null = null;
    try {
      originHost = new URL(origin).host;
    } catch {
      originHost = null;
    }
    if (host && originHost === host) return next();
    next(new AppError("csrf", "requests that change data must come from this site"));
  };
}
