import { createHash, createHmac } from "node:crypto";

/** A demo account offered on the fake sign-in page. */
export interface OAuthAccount {
  email: string;
  name: string;
  picture?: string;
}

/** Who signed in, as the fake provider reports it. */
export interface OAuthIdentity {
  sub: string;
  email: string;
  emailVerified: boolean;
  name: string;
  givenName: string;
  familyName: string;
  picture: string | null;
}

/**
 * Google's subject is a stable numeric string per account; derive one from the address so the
 * same person gets the same id across restarts, as the app's account linking expects.
 */
export function stableSubject(email: string): string {
  const digest = createHash("sha256").update(email.trim().toLowerCase()).digest();
  let digits = "1";
  for (const byte of digest) digits += String(byte % 10);
  return digits.slice(0, 21);
}

/** "sam.outsider@x.example" → "Sam Outsider", for free-form sign-ins that give no name. */
function nameFromEmail(email: string): string {
  const local = email.split("@")[0] ?? email;
  return local
    .split(/[._+-]+/)
    .filter(Boolean)
    .map((part) => part[0]!.toUpperCase() + part.slice(1))
    .join(" ");
}

export function identityFor(input: { email: string; name?: string; picture?: string; emailVerified?: boolean }): OAuthIdentity {
  const email = input.email.trim().toLowerCase();
  const name = input.name?.trim() || nameFromEmail(email);
  const [givenName = name, ...rest] = name.split(/\s+/);
  return {
    sub: stableSubject(email),
    email,
    emailVerified: input.emailVerified ?? true,
    name,
    givenName,
    familyName: rest.join(" "),
    picture: input.picture ?? null,
  };
}

/** The body of Google's OpenID Connect userinfo endpoint. */
export function userinfoBody(identity: OAuthIdentity) {
  return {
    sub: identity.sub,
    name: identity.name,
    given_name: identity.givenName,
    ...(identity.familyName && { family_name: identity.familyName }),
    ...(identity.picture && { picture: identity.picture }),
    email: identity.email,
    email_verified: identity.emailVerified,
  };
}

/**
 * An OpenID Connect id_token. Google signs with RS256; OpenID Connect also allows HS256 keyed with
 * the client secret, which lets a client verify it without fetching keys. passport-google-oauth20
 * does not read it, but other clients might.
 */
export function signIdToken(identity: OAuthIdentity, claims: { issuer: string; audience: string; nonce: string | null; secret: string; ttlSec: number }): string {
  const now = Math.floor(Date.now() / 1000);
  const header = { alg: "HS256", typ: "JWT" };
  const payload = {
    iss: claims.issuer,
    aud: claims.audience,
    azp: claims.audience,
    sub: identity.sub,
    email: identity.email,
    email_verified: identity.emailVerified,
    name: identity.name,
    iat: now,
    exp: now + claims.ttlSec,
    ...(claims.nonce && { nonce: claims.nonce }),
  };
  const encode = (value: object) => Buffer.from(JSON.stringify(value)).toString("base64url");
  const unsigned = `${encode(header)}.${encode(payload)}`;
  const signature = createHmac("sha256", claims.secret).update(unsigned).digest("base64url");
  return `${unsigned}.${signature}`;
}
