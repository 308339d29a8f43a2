import express, { type Request, type Response } from "express";
import { timingSafeEqual } from "node:crypto";
import { parseBasicAuth } from "./basic-auth.ts";
import { listenHttp } from "./http-listen.ts";
import { GrantStore } from "./oauth-grants.ts";
import { identityFor, signIdToken, userinfoBody, type OAuthAccount } from "./oauth-identity.ts";
import { renderAccountChooser, renderAuthorizationError, type AuthorizationRequest } from "./oauth-pages.ts";

export interface OAuthProviderOptions {
  port?: number;
  host?: string;
  clientId: string;
  clientSecret: string;
  /** Demo accounts offered as one-tap buttons; any other address can be typed in. */
  accounts: OAuthAccount[];
  /** When given, only these redirect URIs are accepted (as registered with Google); otherwise any http(s) URL. */
  redirectUris?: string[];
  codeTtlMs?: number;
  tokenTtlSec?: number;
}

export interface FakeOAuthProvider {
  url: string;
  port: number;
  /** passport-google-oauth20 options that point the strategy at this fake. */
  strategyUrls: { authorizationURL: string; tokenURL: string; userProfileURL: string };
  stop(): Promise<void>;
}

const AUTHORIZE_PATH = "/o/oauth2/v2/auth";
/** Google's own token and userinfo paths are served too, so either style of configuration works. */
const TOKEN_PATHS = ["/token", "/oauth2/v4/token"];
const USERINFO_PATHS = ["/v1/userinfo", "/oauth2/v3/userinfo"];

export async function startOAuthProvider(options: OAuthProviderOptions): Promise<FakeOAuthProvider> {
  const grants = new GrantStore(options.codeTtlMs ?? 120_000, options.tokenTtlSec ?? 3599);
  let issuer = "";

  const app = express();
  app.disable("x-powered-by");
  app.use(express.urlencoded({ extended: false }));
  app.use((_req, res, next) => {
    // Tokens and sign-in pages must never be cached, as with the real provider.
    res.setHeader("Cache-Control", "no-store");
    next();
  });

  /** Client and redirect URI are checked before anything else; when they fail, never redirect. */
  const readRequest = (source: Record<string, unknown>): { request: AuthorizationRequest } | { error: string; description: string } => {
    const field = (name: string) => (typeof source[name] === "string" ? (source[name] as string) : "");
    const request: AuthorizationRequest = {
      clientId: field("client_id"),
      redirectUri: field("redirect_uri"),
      responseType: field("response_type"),
      scope: field("scope"),
      state: field("state"),
      nonce: field("nonce"),
    };
    if (request.clientId !== options.clientId) return { error: "invalid_client", description: "The OAuth client was not found." };
    if (!isAcceptableRedirect(request.redirectUri, options.redirectUris)) {
      return { error: "redirect_uri_mismatch", description: `The redirect URI "${request.redirectUri}" is not registered for this client.` };
    }
    return { request };
  };

  const redirectBack = (res: Response, request: AuthorizationRequest, params: Record<string, string>) => {
    const target = new URL(request.redirectUri);
    for (const [key, value] of Object.entries(params)) target.searchParams.set(key, value);
    if (request.state) target.searchParams.set("state", request.state);
    res.redirect(303, target.href);
  };

  /** Errors about the request itself go back to the client, as the OAuth 2.0 spec says. */
  const requestError = (request: AuthorizationRequest): string | null => {
    if (request.responseType !== "code") return "unsupported_response_type";
    if (!request.scope.trim()) return "invalid_scope";
    return null;
  };

  app.get(AUTHORIZE_PATH, (req, res) => {
    const read = readRequest(req.query as Record<string, unknown>);
    if ("error" in read) return void res.status(400).type("html").send(renderAuthorizationError(read.error, read.description));
    const error = requestError(read.request);
    if (error) return redirectBack(res, read.request, { error });
    res.type("html").send(renderAccountChooser(read.request, options.accounts, AUTHORIZE_PATH));
  });

  app.post(AUTHORIZE_PATH, (req, res) => {
    const body = (req.body ?? {}) as Record<string, unknown>;
    const read = readRequest(body);
    if ("error" in read) return void res.status(400).type("html").send(renderAuthorizationError(read.error, read.description));
    const { request } = read;
    const error = requestError(request);
    if (error) return redirectBack(res, request, { error });
    if (body.cancel) return redirectBack(res, request, { error: "access_denied" });
    const email = typeof body.email === "string" ? body.email.trim() : "";
    if (!/^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(email)) {
      return void res.status(400).type("html").send(renderAccountChooser(request, options.accounts, AUTHORIZE_PATH));
    }
    const known = options.accounts.find((a) => a.email.toLowerCase() === email.toLowerCase());
    const identity = identityFor({
      email,
      name: known?.name ?? (typeof body.name === "string" ? body.name : undefined),
      picture: known?.picture,
      emailVerified: !body.unverified,
    });
    const code = grants.issueCode({ clientId: request.clientId, redirectUri: request.redirectUri, scope: request.scope, nonce: request.nonce || null, identity });
    redirectBack(res, request, { code, scope: request.scope });
  });

  const tokenHandler = (req: Request, res: Response) => {
    const body = (req.body ?? {}) as Record<string, string | undefined>;
    const fail = (status: number, error: string, description: string) => res.status(status).json({ error, error_description: description });
    // Client credentials may come in the form (what passport-oauth2 does) or as HTTP Basic.
    const basic = parseBasicAuth(req.headers.authorization, { formEncoded: true });
    const clientId = basic?.user ?? body.client_id ?? "";
    const clientSecret = basic?.password ?? body.client_secret ?? "";
    if (clientId !== options.clientId || !sameSecret(clientSecret, options.clientSecret)) {
      return void fail(401, "invalid_client", "Unauthorized");
    }
    if (body.grant_type !== "authorization_code") return void fail(400, "unsupported_grant_type", "Invalid grant_type: " + (body.grant_type ?? ""));
    const grant = grants.redeemCode(body.code ?? "");
    if (!grant || grant.clientId !== clientId) return void fail(400, "invalid_grant", "Malformed auth code.");
    if (grant.redirectUri !== body.redirect_uri) return void fail(400, "redirect_uri_mismatch", "Bad Request");
    const accessToken = grants.issueAccessToken(grant.identity, grant.scope);
    const scopes = grant.scope.split(/\s+/);
    res.json({
      access_token: accessToken,
      token_type: "Bearer",
      expires_in: grants.tokenTtlSec,
      scope: grant.scope,
      ...(scopes.includes("openid") && {
        id_token: signIdToken(grant.identity, { issuer, audience: clientId, nonce: grant.nonce, secret: options.clientSecret, ttlSec: grants.tokenTtlSec }),
      }),
    });
  };
  for (const path of TOKEN_PATHS) app.post(path, tokenHandler);

  const userinfoHandler = (req: Request, res: Response) => {
    // passport-google-oauth20 sends the token as ?access_token=…; other clients use the Bearer header.
    const header = req.headers.authorization;
    const token = header?.startsWith("Bearer ") ? header.slice("Bearer ".length).trim() : typeof req.query.access_token === "string" ? req.query.access_token : "";
    const found = token ? grants.lookupAccessToken(token) : null;
    if (!found) {
      res.setHeader("WWW-Authenticate", 'Bearer error="invalid_token"');
      return void res.status(401).json({ error: "invalid_token", error_description: "Invalid Credentials" });
    }
    res.json(userinfoBody(found.identity));
  };
  for (const path of USERINFO_PATHS) app.get(path, userinfoHandler);

  app.get("/.well-known/openid-configuration", (_req, res) => {
    res.json({
      issuer,
      authorization_endpoint: issuer + AUTHORIZE_PATH,
      token_endpoint: issuer + TOKEN_PATHS[0],
      userinfo_endpoint: issuer + USERINFO_PATHS[0],
      response_types_supported: ["code"],
      subject_types_supported: ["public"],
      id_token_signing_alg_values_supported: ["HS256"],
      scopes_supported: ["openid", "email", "profile"],
      token_endpoint_auth_methods_supported: ["client_secret_post", "client_secret_basic"],
    });
  });

  const running = await listenHttp(app, options.port ?? 0, options.host ?? "127.0.0.1");
  issuer = running.url;
  return {
    url: running.url,
    port: running.port,
    strategyUrls: {
      authorizationURL: running.url + AUTHORIZE_PATH,
      tokenURL: running.url + TOKEN_PATHS[0],
      userProfileURL: running.url + USERINFO_PATHS[0],
    },
    stop: () => running.close(),
  };
}

function isAcceptableRedirect(uri: string, allowed: string[] | undefined): boolean {
  if (allowed?.length) return allowed.includes(uri);
  try {
    const url = new URL(uri);
    return (url.protocol === "http:" || url.protocol === "https:") && !url.hash;
  } catch {
    return false;
  }
}

function sameSecret(given: string, expected: string): boolean {
  const a = Buffer.from(given);
  const b = Buffer.from(expected);
  return a.length === b.length && timingSafeEqual(a, b);
}
