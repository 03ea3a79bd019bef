import type { RequestHandler } from "express";
import { ForbiddenError } from "./errors";

const stateChanging = new Set(["POST", "PUT", "PATCH", "DELETE"]);

/**
 * Refuses cross-site state-changing requests: a POST/PUT/PATCH/DELETE whose Origin header names
 * a site other than `appUrl` or the request's own Host gets 403. Requests without an Origin
 * header (scripts, curl) pass; browsers always send one on cross-site requests of these methods.
 */
export function originCheck(appUrl: string): RequestHandler {
  const allowed = new URL(appUrl).origin;
  return (req, _res, next) => {
    const origin = req.headers.origin;
    if (!stateChanging.has(req.method) || origin === undefined) return next();
    if (origin === allowed) return next();
    let host: string | null = null;
    try {
      host = new URL(origin).host;
    } catch {
      host = null; // "null" or garbage: not a site we serve
    }
    if (host !== null && host === req.headers.host) return next();
    throw new ForbiddenError("Cross-site request refused");
  };
}
