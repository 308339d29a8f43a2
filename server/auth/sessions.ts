import session from "express-session";
import connectPgSimple from "connect-pg-simple";
import pg from "pg";
import type { RequestHandler } from "express";
import type { Config } from "../config.ts";
import { sessionStoreWithUser } from "./session-store.ts";

/** A care plan runs about two months; a homeowner should not have to sign in again midway. */
const sessionDays = 30;

/**
 * Sessions live in PostgreSQL so any server process can serve any request.
 * The cookie is httpOnly and SameSite=Lax (so the OAuth redirect back still carries it),
 * and Secure in production. Sessions last a fixed 30 days from sign-in.
 */
export function createSessionMiddleware(config: Config): { middleware: RequestHandler; close: () => Promise<void> } {
  // Every signed-in request reads its session first, so this pool must not be the narrow part.
  const pool = new pg.Pool({ connectionString: config.DATABASE_URL, max: 15 });
  // A restarting database must not crash the process through an idle client's error.
  pool.on("error", () => {});
  const PgStore = sessionStoreWithUser(connectPgSimple(session), pool);
  // No "touch": extending every session on every request would turn each read into a write.
  const store = new PgStore({ pool, tableName: "sessions", createTableIfMissing: false, pruneSessionInterval: 15 * 60, disableTouch: true });
  const middleware = session({
    name: "sproutline.sid",
    store,
    secret: config.SESSION_SECRET,
    resave: false,
    saveUninitialized: false,
    rolling: false,
    proxy: config.TRUST_PROXY > 0,
    cookie: {
      httpOnly: true,
      sameSite: "lax",
      secure: config.NODE_ENV === "production",
      maxAge: sessionDays * 24 * 60 * 60 * 1000,
      path: "/",
    },
  });
  return {
    middleware,
    close: async () => {
      store.close();
      await pool.end();
    },
  };
}
