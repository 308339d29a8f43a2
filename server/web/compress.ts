import compression from "compression";
import type { Request, Response } from "express";

/**
 * About one TCP initial congestion window (10 segments of ~1.4 KB). An answer smaller than
 * this reaches the phone in one round trip whether squeezed or not.
 */
const initialWindowBytes = 14 * 1024;

function isSmallApiAnswer(req: Request, res: Response): boolean {
  const length = Number(res.getHeader("Content-Length") ?? Number.POSITIVE_INFINITY);
  return req.originalUrl.startsWith("/api/") && length < initialWindowBytes;
}

/**
 * gzip for clients that ask. The apps' scripts and styles from 1 KB up: they shrink to a
 * fifth on slow phone connections. API answers only from about one initial window up (the
 * question queue, a whole plan): squeezing a Today answer of 2 KB costs server time on the
 * busiest request and saves the phone no round trip. Images are left alone.
 */
export function compressWherePays() {
  return compression({ filter: (req, res) => compression.filter(req, res) && !isSmallApiAnswer(req as Request, res as Response) });
}
