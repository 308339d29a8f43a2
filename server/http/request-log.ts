import { randomUUID } from "node:crypto";
import type { IncomingMessage, ServerResponse } from "node:http";
import type { RequestHandler } from "express";
import { pinoHttp } from "pino-http";
import type { Logger } from "../lib/logger.ts";

/*
 * One JSON line per request: request id, method, path, status, time, and who asked (user id and
 * role only). Never headers (cookies, authorization), bodies, query strings (sign-in and
 * unsubscribe tokens, OAuth codes, e-mail addresses) or the calendar feed's secret path.
 */
export const REQUEST_ID_HEADER = "X-Request-Id";

// A proxy's or client's id is kept only when it cannot break a log line or a header: short, plain characters.
const SANE_ID = /^[A-Za-z0-9._:-]{8,128}$/;

export function requestIdOf(incoming: string | string[] | undefined): string {
  return typeof incoming === "string" && SANE_ID.test(incoming) ? incoming : randomUUID();
}

/** The path an operator may read: no query string, and no secret path segment. */
export function loggablePath(url: string): string {
  const q = url.indexOf("?");
  const path = q === -1 ? url : url.slice(0, q);
  // The calendar feed's token is its whole last segment ("/calendar/<token>.ics").
  const safe = path.startsWith("/calendar/") ? "/calendar/[redacted]" : path;
  return q === -1 ? safe : `${safe}?[redacted]`;
}

type WithUser = IncomingMessage & { id?: unknown; originalUrl?: string; user?: { id: number; role: string } };

function whoAsked(req: WithUser): { userId?: number; role?: string } {
  return req.user ? { userId: req.user.id, role: req.user.role } : {};
}

export function requestLogger(logger: Logger): RequestHandler {
  // Silent (tests, the API benchmark's server): the id still goes back, without building log lines nobody reads.
  if (!logger.isLevelEnabled("fatal")) {
    return (req, res, next) => {
      req.id = requestIdOf(req.headers["x-request-id"]);
      res.setHeader(REQUEST_ID_HEADER, req.id);
      next();
    };
  }
  return pinoHttp({
    logger,
    quietReqLogger: true,
    customAttributeKeys: { reqId: "requestId" },
    genReqId: (req: IncomingMessage, res: ServerResponse) => {
      const id = requestIdOf(req.headers["x-request-id"]);
      res.setHeader(REQUEST_ID_HEADER, id);
      return id;
    },
    // Plain fields only: the raw request and response objects carry headers, cookies and bodies.
    wrapSerializers: false,
    serializers: {
      req: (req: WithUser) => ({ method: req.method, path: loggablePath(req.originalUrl ?? req.url ?? "") }),
      res: (res: ServerResponse) => ({ status: res.statusCode }),
    },
    // The user is known only once the session was read, so it joins the line when the answer is done.
    customSuccessObject: (req, _res, value) => ({ ...value, ...whoAsked(req as WithUser) }),
    customErrorObject: (req, _res, _err, value) => ({ ...value, ...whoAsked(req as WithUser) }),
    customLogLevel: (_req, res, err) => (err || res.statusCode >= 500 ? "error" : res.statusCode >= 400 ? "warn" : "info"),
    customSuccessMessage: (req, res) => `${req.method} ${loggablePath((req as WithUser).originalUrl ?? req.url ?? "")} ${res.statusCode}`,
    customErrorMessage: (req, res) => `${req.method} ${loggablePath((req as WithUser).originalUrl ?? req.url ?? "")} ${res.statusCode}`,
  });
}
