import passport, { type PassportStatic } from "passport";
import { Strategy as GoogleStrategy, type Profile } from "passport-google-oauth20";
import type { Config } from "../config.ts";
import type { Db } from "../db.ts";
import { findUserByEmail, rememberGoogleSubject } from "./users-repo.ts";
import { staffRoles } from "#shared/schemas/auth";
import type { SessionUser } from "./session-user.ts";

/** Why a Google sign-in was refused; the staff sign-in page explains each. */
export type GoogleRefusal = "not_staff" | "deactivated" | "unverified";

/**
 * One passport instance per app (not the global singleton) so tests can build
 * several apps with different settings in one process.
 */
export function createPassport(config: Config, db: Db): PassportStatic {
  const instance = new passport.Passport() as unknown as PassportStatic;

  instance.serializeUser<number>((user, done) => done(null, (user as SessionUser).id));

  const fake = config.GOOGLE_AUTH_BASE_URL;
  instance.use(
    new GoogleStrategy(
      {
        clientID: config.GOOGLE_CLIENT_ID,
        clientSecret: config.GOOGLE_CLIENT_SECRET,
        callbackURL: `${config.PUBLIC_URL}/auth/google/callback`,
        scope: ["openid", "email", "profile"],
        state: true,
        ...(fake && {
          authorizationURL: `${fake}/o/oauth2/v2/auth`,
          tokenURL: `${fake}/token`,
          userProfileURL: `${fake}/v1/userinfo`,
        }),
      },
      (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: SessionUser | false, info?: { reason: GoogleRefusal }) => void) => {
        verifyStaff(db, profile).then(
          (result) => ("user" in result ? done(null, result.user) : done(null, false, { reason: result.refused })),
          done,
        );
      },
    ),
  );
  return instance;
}

async function verifyStaff(db: Db, profile: Profile): Promise<{ user: SessionUser } | { refused: GoogleRefusal }> {
  const email = profile.emails?.find((e) => e.verified !== false)?.value;
  if (!email) return { refused: "unverified" };
  const user = await findUserByEmail(db, email.toLowerCase());
  if (!user || !staffRoles.includes(user.role)) return { refused: "not_staff" };
  if (!user.active) return { refused: "deactivated" };
  await rememberGoogleSubject(db, user.id, profile.id);
  const { active: _active, ...sessionUser } = user;
  return { user: sessionUser };
}
