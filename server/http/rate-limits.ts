import { rateLimit, type RateLimitRequestHandler } from "express-rate-limit";
import type { Db } from "../db.ts";
import { PostgresRateLimitStore } from "./rate-limit-store.ts";

type LimitSpec = { name: string; windowMinutes: number; limit: number; message: string };

/** Limits per client address, on top of the per-address sign-in limits counted in sign_in_requests. */
export const limitSpecs = {
  signIn: { name: "sign-in", windowMinutes: 15, limit: 60, message: "Too many sign-in attempts from your network. Please wait a few minutes and try again." },
  uploads: { name: "uploads", windowMinutes: 60, limit: 60, message: "Too many photo uploads in the last hour. Please try again later." },
  webhooks: { name: "webhooks", windowMinutes: 1, limit: 600, message: "Too many webhook calls." },
} satisfies Record<string, LimitSpec>;

export function createRateLimit(db: Db, spec: LimitSpec): RateLimitRequestHandler {
  return rateLimit({
    windowMs: spec.windowMinutes * 60_000,
    limit: spec.limit,
    standardHeaders: "draft-7",
    legacyHeaders: false,
    store: new PostgresRateLimitStore(db, `${spec.name}:`),
    // A database outage must not turn into refusing everyone or into a 500: let the request on.
    passOnStoreError: true,
    handler: (req, res, _next, options) => {
      const requestId = typeof req.id === "string" ? req.id : undefined;
      res.status(options.statusCode).json({ error: { code: "rate_limited", message: spec.message, requestId } });
    },
  });
}
