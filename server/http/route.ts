import { Router, type Request, type Response, type NextFunction } from "express";
import type { z } from "zod";
import type { Role } from "#shared/schemas/auth";
import { findNul, NUL_MESSAGE } from "#shared/schemas/text";
import { HttpError, fieldErrors } from "./errors.ts";
import { REVALIDATE } from "./cache-control.ts";
import type { SessionUser } from "../auth/session-user.ts";

/**
 * Who may call a route. "public" needs nothing; "signed_in" any active account;
 * a role list, only those roles. Every route declares this next to its path so the
 * authorisation matrix can be generated from the route table.
 */
export type Access = "public" | "signed_in" | readonly Role[];

type Schema = z.ZodType;
type Infer<S> = S extends Schema ? z.infer<S> : undefined;

export type RouteContext<P, Q, B> = {
  req: Request;
  res: Response;
  params: P;
  query: Q;
  body: B;
  /** The signed-in person; present whenever access is not "public". */
  user: SessionUser;
};

export type RouteSpec<PS extends Schema | undefined = Schema | undefined, QS extends Schema | undefined = Schema | undefined, BS extends Schema | undefined = Schema | undefined> = {
  method: "get" | "post" | "put" | "patch" | "delete";
  path: string;
  access: Access;
  params?: PS;
  query?: QS;
  body?: BS;
  /**
   * Staff reads and changes of customer records are written to the audit log under this
   * action name (e.g. "plan.read"); the first path parameter names the record.
   */
  audit?: string;
  /**
   * A JSON read whose answer must not be kept even by the browser (server/http/cache-control.ts);
   * other JSON reads revalidate with their ETag.
   */
  cache?: "no-store";
  /** Extra middleware before validation (e.g. multipart parsing). */
  before?: ((req: Request, res: Response, next: NextFunction) => void)[];
  handler: (ctx: RouteContext<Infer<PS>, Infer<QS>, Infer<BS>>) => Promise<unknown> | unknown;
};

/** Identity function that keeps the schema types flowing into the handler. */
export function route<PS extends Schema | undefined = undefined, QS extends Schema | undefined = undefined, BS extends Schema | undefined = undefined>(
  spec: RouteSpec<PS, QS, BS>,
): RouteSpec {
  return spec as unknown as RouteSpec;
}

const invalidInput = (fields: Record<string, string>) => new HttpError(400, "invalid_input", "Some of the information is not valid.", fields);

/**
 * Every part is checked for NUL characters, with or without a schema: handlers and
 * middleware may read the raw request, and PostgreSQL refuses NUL in text.
 */
function refuseNul(value: unknown, part: string) {
  const path = findNul(value);
  if (path) throw invalidInput({ [[part === "body" ? undefined : part, ...path.map(String)].filter(Boolean).join(".") || "_"]: NUL_MESSAGE });
}

function parsePart(schema: Schema | undefined, value: unknown, part: string) {
  refuseNul(value, part);
  if (!schema) return undefined;
  const result = schema.safeParse(value ?? {});
  if (!result.success) {
    throw invalidInput(fieldErrors(result.error, part === "body" ? undefined : part));
  }
  return result.data;
}

export function checkAccess(access: Access, user: SessionUser | undefined): asserts user is SessionUser {
  if (access === "public") return;
  if (!user) throw new HttpError(401, "unauthenticated", "Please sign in first.");
  if (access === "signed_in") return;
  if (!access.includes(user.role)) throw new HttpError(403, "forbidden", "Your account cannot do this.");
}

/**
 * Mounts route specs on a router. Handlers return the response body (sent as JSON with 200,
 * or the status they set), or undefined after sending the response themselves.
 */
export type AuditEntry = {
  user: SessionUser;
  action: string;
  subjectId: string | null;
  method: string;
  path: string;
  ip: string | undefined;
  /** What a handler added so the entry still reads well once the record is gone (a deleted place's name). */
  detail?: Record<string, string | number>;
};

/**
 * A handler that creates its record (no id in the path yet) names it here, so the audit entry
 * points at what was made; `detail` keeps words the record may not outlive.
 */
export function auditSubject(res: Response, subjectId: string | number, detail?: Record<string, string | number>): void {
  res.locals.auditSubjectId = String(subjectId);
  if (detail) res.locals.auditDetail = detail;
}
const auditSubjectOf = (res: Response): string | undefined => res.locals.auditSubjectId as string | undefined;
const auditDetailOf = (res: Response): Record<string, string | number> | undefined => res.locals.auditDetail as Record<string, string | number> | undefined;

export function buildRouter(specs: readonly RouteSpec[], options: { audit?: (entry: AuditEntry) => void } = {}): Router {
  const router = Router();
  for (const spec of specs) {
    router[spec.method](spec.path, ...(spec.before ?? []), async (req: Request, res: Response) => {
      const user = req.user as SessionUser | undefined;
      checkAccess(spec.access, user);
      if (spec.audit && user && user.role !== "customer" && options.audit) {
        const action = spec.audit;
        const record = options.audit;
        // Only what actually happened is recorded: refused or failed requests are not reads or changes.
        res.on("finish", () => {
          if (res.statusCode >= 400) return;
          const subjectId = auditSubjectOf(res) ?? Object.values(req.params)[0];
          record({ user, action, subjectId: subjectId === undefined ? null : String(subjectId), method: req.method, path: req.originalUrl, ip: req.ip, detail: auditDetailOf(res) });
        });
      }
      const ctx = {
        req,
        res,
        user: user as SessionUser,
        params: parsePart(spec.params, req.params, "params"),
        query: parsePart(spec.query, req.query, "query"),
        body: parsePart(spec.body, req.body, "body"),
      };
      const result = await spec.handler(ctx as never);
      if (res.headersSent) return;
      if (result === undefined) res.status(204).end();
      else {
        if (spec.method === "get" && spec.cache !== "no-store") res.setHeader("Cache-Control", REVALIDATE);
        res.json(result);
      }
    });
  }
  return router;
}
