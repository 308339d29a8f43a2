import express from "express";
import { Passport } from "passport";
import { Strategy as GoogleStrategy, type Profile } from "passport-google-oauth20";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { listenHttp } from "./http-listen.ts";
import { startOAuthProvider, type FakeOAuthProvider } from "./oauth-provider.ts";

const clientId = "sproutline-test-client";
const clientSecret = "sproutline-test-secret";
const redirectUri = "http://localhost:5190/auth/google/callback";
const accounts = [
  { email: "dana@cobblefield.example", name: "Dana Whitlow" },
  { email: "marco@cobblefield.example", name: "Marco Ibsen" },
];

let provider: FakeOAuthProvider;

beforeAll(async () => {
  provider = await startOAuthProvider({ clientId, clientSecret, accounts, codeTtlMs: 500 });
});
afterAll(async () => {
  await provider.stop();
});

const authorizeQuery = (overrides: Record<string, string> = {}) =>
  new URLSearchParams({ client_id: clientId, redirect_uri: redirectUri, response_type: "code", scope: "openid email profile", state: "st-123", ...overrides });

/** Plays the person on the chooser page: posts the form the page would post. */
async function choose(fields: Record<string, string>, query = authorizeQuery()): Promise<URL> {
  const res = await fetch(`${provider.url}/o/oauth2/v2/auth`, {
    method: "POST",
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ ...Object.fromEntries(query), ...fields }),
    redirect: "manual",
  });
  expect(res.status).toBe(303);
  return new URL(res.headers.get("location")!);
}

function exchange(code: string, overrides: Record<string, string> = {}) {
  return fetch(`${provider.url}/token`, {
    method: "POST",
    headers: { "Content-Type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ code, client_id: clientId, client_secret: clientSecret, redirect_uri: redirectUri, grant_type: "authorization_code", ...overrides }),
  });
}

describe("fake Google OAuth provider", () => {
  it("shows an accessible local chooser page listing the demo accounts", async () => {
    const res = await fetch(`${provider.url}/o/oauth2/v2/auth?${authorizeQuery()}`);
    expect(res.status).toBe(200);
    const html = await res.text();
    expect(html).toContain('<html lang="en">');
    expect(html).toContain("Local test sign-in page");
    expect(html).toContain("Dana Whitlow");
    expect(html).toContain('value="marco@cobblefield.example"');
    expect(html).toMatch(/<label for="other-email">/);
    expect(html).toContain("http://localhost:5190");
  });

  it("round-trips authorise → code → token → userinfo", async () => {
    const back = await choose({ email: "dana@cobblefield.example" });
    expect(back.origin + back.pathname).toBe(redirectUri);
    expect(back.searchParams.get("state")).toBe("st-123");
    const code = back.searchParams.get("code")!;

    const tokenRes = await exchange(code);
    expect(tokenRes.status).toBe(200);
    const token = (await tokenRes.json()) as { access_token: string; token_type: string; expires_in: number; scope: string; id_token: string };
    expect(token).toMatchObject({ token_type: "Bearer", scope: "openid email profile" });
    expect(token.expires_in).toBeGreaterThan(0);
    const idClaims = JSON.parse(Buffer.from(token.id_token.split(".")[1]!, "base64url").toString()) as Record<string, unknown>;
    expect(idClaims).toMatchObject({ aud: clientId, email: "dana@cobblefield.example", iss: provider.url });

    const userinfo = await fetch(`${provider.url}/v1/userinfo`, { headers: { Authorization: `Bearer ${token.access_token}` } });
    const profile = (await userinfo.json()) as Record<string, unknown>;
    expect(profile).toMatchObject({ name: "Dana Whitlow", given_name: "Dana", family_name: "Whitlow", email: "dana@cobblefield.example", email_verified: true });
    expect(profile.sub).toMatch(/^\d{21}$/);
    expect(profile.sub).toBe(idClaims.sub);

    const viaQuery = await fetch(`${provider.url}/v1/userinfo?access_token=${encodeURIComponent(token.access_token)}`);
    expect(viaQuery.status).toBe(200);
    expect((await fetch(`${provider.url}/v1/userinfo`, { headers: { Authorization: "Bearer nope" } })).status).toBe(401);
  });

  it("refuses a code used twice, an expired code and a wrong redirect URI", async () => {
    const code = (await choose({ email: "marco@cobblefield.example" })).searchParams.get("code")!;
    expect((await exchange(code)).status).toBe(200);
    const reused = await exchange(code);
    expect(reused.status).toBe(400);
    expect(await reused.json()).toMatchObject({ error: "invalid_grant" });

    const mismatched = (await choose({ email: "marco@cobblefield.example" })).searchParams.get("code")!;
    expect(await (await exchange(mismatched, { redirect_uri: "http://localhost:5190/elsewhere" })).json()).toMatchObject({ error: "redirect_uri_mismatch" });

    const late = (await choose({ email: "marco@cobblefield.example" })).searchParams.get("code")!;
    await new Promise((resolve) => setTimeout(resolve, 600));
    expect(await (await exchange(late)).json()).toMatchObject({ error: "invalid_grant" });
  });

  it("refuses a bad client secret and an unknown client", async () => {
    const code = (await choose({ email: "dana@cobblefield.example" })).searchParams.get("code")!;
    const bad = await exchange(code, { client_secret: "guess" });
    expect(bad.status).toBe(401);
    expect(await bad.json()).toMatchObject({ error: "invalid_client" });

    const unknown = await fetch(`${provider.url}/o/oauth2/v2/auth?${authorizeQuery({ client_id: "someone-else" })}`, { redirect: "manual" });
    expect(unknown.status).toBe(400);
    expect(unknown.headers.get("location")).toBeNull();
  });

  it("lets anyone sign in by typing an address, optionally unverified, and supports cancelling", async () => {
    const code = (await choose({ email: "Visitor@Elsewhere.example", name: "", unverified: "1" })).searchParams.get("code")!;
    const token = (await (await exchange(code)).json()) as { access_token: string };
    const profile = (await (await fetch(`${provider.url}/v1/userinfo`, { headers: { Authorization: `Bearer ${token.access_token}` } })).json()) as Record<string, unknown>;
    expect(profile).toMatchObject({ email: "visitor@elsewhere.example", name: "Visitor", email_verified: false });

    const cancelled = await choose({ cancel: "1" });
    expect(cancelled.searchParams.get("error")).toBe("access_denied");
    expect(cancelled.searchParams.get("state")).toBe("st-123");
  });

  it("works with the real passport-google-oauth20 strategy", async () => {
    const passport = new Passport();
    const web = express();
    passport.use(
      new GoogleStrategy(
        { clientID: clientId, clientSecret, callbackURL: "/auth/google/callback", ...provider.strategyUrls },
        (_accessToken: string, _refreshToken: string, profile: Profile, done: (error: unknown, user?: Express.User) => void) => done(null, profile),
      ),
    );
    web.use(passport.initialize());
    web.get("/auth/google", passport.authenticate("google", { session: false, scope: ["openid", "email", "profile"] }));
    web.get("/auth/google/callback", passport.authenticate("google", { session: false }), (req, res) => {
      const profile = req.user as Profile;
      res.json({ id: profile.id, email: profile.emails?.[0]?.value, name: profile.displayName });
    });
    const app = await listenHttp(web, 0, "127.0.0.1");
    try {
      const start = await fetch(`${app.url}/auth/google`, { redirect: "manual" });
      const authorizeUrl = new URL(start.headers.get("location")!);
      expect(authorizeUrl.href.startsWith(provider.strategyUrls.authorizationURL)).toBe(true);
      expect((await fetch(authorizeUrl)).status).toBe(200);

      const back = await choose({ email: "marco@cobblefield.example" }, authorizeUrl.searchParams);
      const done = await fetch(back, { redirect: "manual" });
      expect(done.status).toBe(200);
      expect(await done.json()).toMatchObject({ email: "marco@cobblefield.example", name: "Marco Ibsen" });
    } finally {
      await app.close();
    }
  });
});
