import type { Request } from "express";
import type session from "express-session";
import type connectPgSimple from "connect-pg-simple";
import type pg from "pg";
import { toSessionUser, type UserRow } from "./users-repo.ts";
import type { SessionUser } from "./session-user.ts";
import { batchedReads } from "../lib/batched-reads.ts";

type PgStoreClass = ReturnType<typeof connectPgSimple>;
type StoredSession = session.SessionData & { [userRead]?: SessionUser | null };

/** Carries the user from the store's read to the request, invisible to the session's JSON and change check. */
const userRead = Symbol("user read with the session");
const userOfRequest = new WeakMap<Request, SessionUser | null>();

/*
 * "Who is this", for every session read at the same moment: each session row with its
 * signed-in, still active user. The id in the session is checked to be a number before the
 * cast, because a malformed session must read as signed out, not fail the query. Prepared by
 * name, since every signed-in request runs it.
 */
export const sessionsWithUsers = {
  name: "sessions-with-active-users",
  text: `
    select s.sid, s.sess, u.id, u.company_id, u.role, u.name, u.email, u.phone, u.active, c.id as customer_id
    from sessions s
    left join users u on u.active and u.id = case when s.sess #>> '{passport,user}' ~ '^[0-9]{1,9}$' then (s.sess #>> '{passport,user}')::int end
    left join customers c on c.user_id = u.id
    where s.sid = any($1::text[]) and s.expire >= now()`,
};

type SessionRow = { sid: string; sess: StoredSession } & Partial<UserRow>;

/**
 * The PostgreSQL session store (connect-pg-simple) with a read that also loads the signed-in
 * user, so finding the request's user (userFromSession) needs no query of its own.
 */
export function sessionStoreWithUser(PgStore: PgStoreClass, pool: pg.Pool) {
  // Shared by all requests: concurrent sign-in checks become one query (see batchedReads).
  const sessionReads = batchedReads<string, SessionRow>(async (sids) => {
    const { rows } = await pool.query<SessionRow>({ ...sessionsWithUsers, values: [[...new Set(sids)]] });
    const bySid = new Map(rows.map((row) => [row.sid, row]));
    // A session asked for twice in one batch (two tabs) gets a copy: each request changes its own.
    const handedOut = new Set<string>();
    return sids.map((sid) => {
      const row = bySid.get(sid);
      if (!row) return undefined;
      if (handedOut.has(sid)) return { ...row, sess: structuredClone(row.sess) };
      handedOut.add(sid);
      return row;
    });
  });

  return class SessionStoreWithUser extends PgStore {
    override get(sid: string, done: (err: unknown, sess?: session.SessionData | null) => void): void {
      sessionReads.load(sid).then((row) => {
        if (!row) return done(null, null);
        const sess = row.sess;
        sess[userRead] = row.id === null || row.id === undefined ? null : toSessionUser(row as UserRow);
        done(null, sess);
      }, done);
    }

    override createSession(req: Request, sess: StoredSession): session.Session & Partial<session.SessionData> {
      if (userRead in sess) {
        userOfRequest.set(req, sess[userRead] ?? null);
        delete sess[userRead];
      }
      return super.createSession(req, sess);
    }
  };
}

/**
 * The user read with this request's session: a user, null when the session's user is gone or
 * deactivated, undefined when the store did not read one (e.g. a session saved in this request).
 */
export function userReadWithSession(req: Request): SessionUser | null | undefined {
  return userOfRequest.get(req);
}
