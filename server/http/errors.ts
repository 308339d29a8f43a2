import type { ErrorRequestHandler, RequestHandler } from "express";
import type { ZodError } from "zod";
import { loggablePath } from "./request-log.ts";

/** An error the client should see as-is: status, a stable code, a plain message. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string>,
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what = "That record") => new HttpError(404, "not_found", `${what} was not found.`);

export function fieldErrors(error: ZodError, prefix?: string): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = [prefix, ...issue.path.map(String)].filter(Boolean).join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

export const apiNotFound: RequestHandler = (req, _res, next) => {
  next(new HttpError(404, "not_found", `No API route for ${req.method} ${req.path}.`));
};

/** Database unreachable, restarting or overloaded: the client may retry shortly. */
const unavailableCodes = new Set([
  "ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT",
  "57P01", "57P02", "57P03", // admin shutdown, crash shutdown, cannot connect now
  "08000", "08001", "08003", "08006", // connection exceptions
  "53300", // too many connections
]);
const unavailableMessages = [
  "Knex: Timeout acquiring a connection",
  "Connection terminated",
  "Client has encountered a connection error",
  "terminating connection",
  "the database system is starting up",
  "the database system is shutting down",
];
function isDatabaseUnavailable(err: unknown): boolean {
  const code = (err as { code?: string } | null)?.code;
  const message = err instanceof Error ? err.message : "";
  return (code !== undefined && unavailableCodes.has(code)) || unavailableMessages.some((m) => message.includes(m));
}

/**
 * The last middleware: every failure becomes the JSON error shape of DESIGN.md §3.
 * Unexpected errors are logged with their stack on the server and never sent to the client.
 */
export function errorHandler(log: (message: string, err: unknown) => void): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) return;
    // The id the request log line carries (server/http/request-log.ts), so a user's report finds its line.
    const requestId = typeof req.id === "string" ? req.id : undefined;
    const answer = (status: number, error: { code: string; message: string; fields?: Record<string, string> }) =>
      res.status(status).json({ error: { ...error, requestId } });
    if (err instanceof HttpError) {
      for (const [name, value] of Object.entries(err.headers ?? {})) res.setHeader(name, value);
      answer(err.status, { code: err.code, message: err.message, fields: err.fields });
      return;
    }
    // body-parser and multer report client mistakes with a status of 4xx.
    const status = (err as { status?: number; statusCode?: number }).status ?? (err as { statusCode?: number }).statusCode;
    if (typeof status === "number" && status >= 400 && status < 500) {
      const code = (err as { type?: string }).type === "entity.too.large" ? "payload_too_large" : "bad_request";
      const message = code === "payload_too_large" ? "The request is too large." : "The request could not be read.";
      answer(status, { code, message });
      return;
    }
    if (isDatabaseUnavailable(err)) {
      res.setHeader("Retry-After", "5");
      answer(503, { code: "unavailable", message: "The service is busy or restarting. Try again in a few seconds." });
      return;
    }
    log(`unhandled error on ${req.method} ${loggablePath(req.originalUrl)} (request ${requestId ?? "without id"})`, err);
    answer(500, { code: "internal", message: "Something went wrong on our side. Please try again." });
  };
}
