import { Router, type Request } from "express";
import type { PassportStatic } from "passport";
import { signInLinkConsumeSchema, signInLinkRequestSchema, type CurrentUser } from "#shared/schemas/auth";
import { route, type RouteSpec } from "../../http/route.ts";
import { HttpError } from "../../http/errors.ts";
import { companyName, consumeSignInLink, requestSignInLink, signOutEverywhere, type SignInDeps } from "./service.ts";
import { findActiveUserById } from "../../auth/users-repo.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import type { GoogleRefusal } from "../../auth/passport.ts";

function logIn(req: Request, user: SessionUser): Promise<void> {
  // passport regenerates the session id here, so a planted session id is worthless.
  return new Promise((resolve, reject) => req.logIn(user, (err) => (err ? reject(err) : resolve())));
}

function logOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) =>
    req.logOut((err) => (err ? reject(err) : req.session.destroy((e) => (e ? reject(e) : resolve()))))
  );
}

async function toCurrentUser(deps: SignInDeps, user: SessionUser): Promise<CurrentUser> {
  return { ...user, companyName: await companyName(deps.db, user.companyId) };
}

export function authRoutes(deps: SignInDeps): RouteSpec[] {
  return [
    route({
      method: "get",
      path: "/api/me",
      access: "signed_in",
      handler: async ({ user }) => ({ user: await toCurrentUser(deps, user) }),
    }),
    route({
      method: "post",
      path: "/api/auth/link",
      access: "public",
      body: signInLinkRequestSchema,
      handler: async ({ req, res, body }) => {
        await requestSignInLink(deps, body.contact, req.ip ?? "unknown", body.next);
        res.status(202).json({ ok: true });
      },
    }),
    route({
      method: "post",
      path: "/api/auth/link/consume",
      access: "public",
      body: signInLinkConsumeSchema,
      handler: async ({ req, body }) => {
        const userId = await consumeSignInLink(deps.db, body.token);
        const user = await findActiveUserById(deps.db, userId);
        if (!user) throw new HttpError(400, "link_invalid", "This sign-in link is not valid. Ask for a new one.");
        await logIn(req, user);
        return { user: await toCurrentUser(deps, user) };
      },
    }),
    route({
      method: "post",
      path: "/api/auth/sign-out",
      access: "public",
      handler: async ({ req, res }) => {
        if (req.user) await logOut(req);
        res.clearCookie("sproutline.sid", { path: "/" });
        res.status(204).end();
      },
    }),
    route({
      method: "post",
      path: "/api/auth/sign-out-everywhere",
      access: "signed_in",
      // Recorded for staff only (buildRouter), so a manager can see when an account was locked down.
      audit: "account.signed_out_everywhere",
      handler: async ({ req, res, user }) => {
        await signOutEverywhere(deps.db, user.id);
        // The row is already gone; dropping the in-memory session stops express-session saving it back.
        await new Promise<void>((resolve, reject) => req.session.destroy((e) => (e ? reject(e) : resolve())));
        res.clearCookie("sproutline.sid", { path: "/" });
        res.status(204).end();
      },
    }),
  ];
}

/** Browser redirects for staff sign-in with Google (not JSON routes). */
export function googleSignInRouter(passport: PassportStatic): Router {
  const router = Router();
  router.get("/auth/google", passport.authenticate("google", { session: false }));
  router.get("/auth/google/callback", (req, res, next) => {
    passport.authenticate("google", { session: false }, (err: unknown, user: SessionUser | false, info?: { reason?: GoogleRefusal }) => {
      if (err) return res.redirect("/staff/sign-in?error=failed");
      if (!user) return res.redirect(`/staff/sign-in?error=${info?.reason ?? "failed"}`);
      logIn(req, user).then(() => res.redirect("/staff/"), next);
    })(req, res, next);
  });
  return router;
}

export const googleSignInPaths = ["/auth/google", "/auth/google/callback"] as const;
