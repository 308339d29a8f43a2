import type { RequestHandler } from "express";
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
export function userFromSession(): RequestHandler {
  return (req, _res, next) => {
    const stored = (req.session as PassportSession | undefined)?.passport;
    if (stored?.user !== undefined) {
      // Every session the store reads comes with its user: null when gone or deactivated.
      const read = userReadWithSession(req);
      if (read && read.id === stored.user) req.user = read;
      else if (read === null) delete stored.user;
    }
    next();
  };
}
