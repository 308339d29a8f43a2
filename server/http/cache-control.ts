import type { RequestHandler } from "express";

/**
 * What browsers and proxies may keep of API answers, by kind of answer:
 *
 * - JSON reads (GET routes whose handler returns the body): `private, no-cache`. The browser may
 *   keep its own copy but must ask every time; the ETag Express adds turns an unchanged answer
 *   into an empty 304. No shared cache (proxy, CDN) may keep it.
 * - Everything else: `no-store`. Writes, sign-in, errors, 404s, rate-limit answers, and files a
 *   handler sends itself (CSV exports, the import template): an export is a copy of customer
 *   data that should not linger in a browser's disk cache.
 * - A route that declares `cache: "no-store"` is a JSON read that must not be kept either (a
 *   secret link in the answer).
 * - A handler may set its own header for a file that is immutable or public (photos revalidate
 *   like JSON reads; the company logo is public on purpose, for e-mails).
 *
 * `Vary: Cookie` on every answer: the same URL answers differently for each signed-in person.
 */
export const NO_STORE = "no-store";
export const REVALIDATE = "private, no-cache";

/** Mounted on /api before anything that can answer, so every answer starts as no-store. */
export function privateApiAnswers(): RequestHandler {
  return (_req, res, next) => {
    res.setHeader("Cache-Control", NO_STORE);
    res.vary("Cookie");
    next();
  };
}
