import { randomBytes } from "node:crypto";
import type { OAuthIdentity } from "./oauth-identity.ts";

/** What the user agreed to on the sign-in page, waiting to be exchanged for a token. */
export interface AuthorizationGrant {
  clientId: string;
  redirectUri: string;
  scope: string;
  nonce: string | null;
  identity: OAuthIdentity;
}

interface Expiring<T> {
  value: T;
  expiresAt: number;
}

/**
 * Authorisation codes (single use, short-lived) and access tokens, in memory: the fake runs as one
 * process and losing them on restart only means signing in again.
 */
export class GrantStore {
  private readonly codes = new Map<string, Expiring<AuthorizationGrant>>();
  private readonly tokens = new Map<string, Expiring<{ identity: OAuthIdentity; scope: string }>>();

  constructor(
    private readonly codeTtlMs: number,
    readonly tokenTtlSec: number,
    private readonly now: () => number = Date.now,
  ) {}

  issueCode(grant: AuthorizationGrant): string {
    this.forgetExpired();
    const code = `4/${randomBytes(24).toString("base64url")}`;
    this.codes.set(code, { value: grant, expiresAt: this.now() + this.codeTtlMs });
    return code;
  }

  /** Returns the grant once; a second attempt with the same code finds nothing, as OAuth 2.0 requires. */
  redeemCode(code: string): AuthorizationGrant | null {
    const entry = this.codes.get(code);
    this.codes.delete(code);
    if (!entry || entry.expiresAt <= this.now()) return null;
    return entry.value;
  }

  issueAccessToken(identity: OAuthIdentity, scope: string): string {
    this.forgetExpired();
    const token = `ya29.fake-${randomBytes(24).toString("base64url")}`;
    this.tokens.set(token, { value: { identity, scope }, expiresAt: this.now() + this.tokenTtlSec * 1000 });
    return token;
  }

  lookupAccessToken(token: string): { identity: OAuthIdentity; scope: string } | null {
    const entry = this.tokens.get(token);
    if (!entry || entry.expiresAt <= this.now()) return null;
    return entry.value;
  }

  private forgetExpired(): void {
    const now = this.now();
    for (const [key, entry] of this.codes) if (entry.expiresAt <= now) this.codes.delete(key);
    for (const [key, entry] of this.tokens) if (entry.expiresAt <= now) this.tokens.delete(key);
  }
}
