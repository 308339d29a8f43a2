import type { RequestHandler } from "express";
import type { Db } from "../db.ts";
import { findActiveUserById } from "./users-repo.ts";
import { userReadWithSession } from "./session-store.ts";

type PassportSession = { passport?: { user?: unknown } };

/**
 * Puts the signed-in person on `req.user`, from the user the session store read with the
 * session. This is what passport's session strategy would do on every request, without its
 * per-request set-up (the login and logout methods, a strategy object): only the sign-in and
 * sign-out routes need those, and they get passport.initialize(). A session whose user is gone
 * or deactivated forgets that user, as passport's would, so a later reactivation does not
 * revive it.
 */
export function userFromSession(db: Db): RequestHandler {
  return (req, _res, next) => {
    const stored = (req.session as PassportSession | undefined)?.passport;
    const id = stored?.user;
    if (id === undefined) return next();
    const read = userReadWithSession(req);
    if (read !== undefined && (read === null || read.id === id)) return settle(read ?? undefined);
    // Not read with the session (the store did not load it): ask once.
    if (typeof id !== "number") return settle(undefined);
    findActiveUserById(db, id).then(settle, next);

    function settle(user: Express.User | undefined) {
      if (user) req.user = user;
      else delete stored!.user;
      next();
    }
  };
}
