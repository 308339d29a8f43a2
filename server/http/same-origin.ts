import type { RequestHandler } from "express";
import { HttpError } from "./errors.ts";

const safeMethods = new Set(["GET", "HEAD", "OPTIONS"]);

/**
 * Cross-site request forgery guard for state-changing requests: browsers send Origin (or at
 * least Referer) with every POST/PUT/PATCH/DELETE, so a request carrying a foreign one was
 * started by another site. Requests with neither come from non-browser clients (webhooks,
 * mail clients' one-click unsubscribe), which carry their own proof (signature or token).
 */
export function requireSameOrigin(publicUrl: string): RequestHandler {
  const allowed = new URL(publicUrl).origin;
  return (req, _res, next) => {
    if (safeMethods.has(req.method)) return next();
    const origin = req.get("origin");
    const referer = req.get("referer");
    // "null" is an opaque origin (sandboxed frame, data: page, some redirects): the browser will not
    // say who started it, and a Referer beside it is not proof, since the opaque page chose it.
    const claimed = origin ? origin : referer ? safeOrigin(referer) : undefined;
    if (claimed !== undefined && claimed !== allowed) {
      return next(new HttpError(403, "cross_site", "This request came from another site and was refused."));
    }
    next();
  };
}

function safeOrigin(url: string): string {
  try {
    return new URL(url).origin;
  } catch {
    return "invalid";
  }
}
