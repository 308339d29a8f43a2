/**
 * Builds the real app against the test database and in-process fakes, for supertest.
 * No database mocks: every API test talks to PostgreSQL.
 */
import { createServer } from "node:http";
import type { AddressInfo } from "node:net";
import { inject } from "vitest";
import request from "supertest";
import { createApp, type BuiltApp } from "../app.ts";
import { loadConfig, type Config } from "../config.ts";
import { createDb, type Db } from "../db.ts";
import { createMessenger } from "../messaging/create-messenger.ts";
import { startFakes, type RunningFakes } from "../fakes/index.ts";
import { fakeOAuthAccounts } from "../../scripts/lib/stack.ts";
import type { Logger } from "../lib/logger.ts";

export type TestContext = {
  app: BuiltApp["app"];
  db: Db;
  config: Config;
  fakes: RunningFakes;
  errors: unknown[];
  close(): Promise<void>;
};

/** `logger`: where request lines go (tests of logging capture them); otherwise silent. */
export async function createTestContext(env: Record<string, string> = {}, options: { logger?: Logger } = {}): Promise<TestContext> {
  const fakes = await startFakes({ oauth: { accounts: fakeOAuthAccounts } });
  // Notices read their gathering delay from the environment (notices/queue.ts); API tests drain at once.
  process.env.NOTICE_GATHER_SECONDS ??= env.NOTICE_GATHER_SECONDS ?? "0";
  const config = loadConfig({
    NODE_ENV: "test",
    DATABASE_URL: inject("databaseUrl"),
    SESSION_SECRET: "api-tests-session-secret-0123456789",
    PUBLIC_URL: "http://localhost:5999",
    // Tests set X-Forwarded-For to stand in for different client addresses.
    TRUST_PROXY: "1",
    SMTP_HOST: fakes.smtpHost,
    SMTP_PORT: String(fakes.smtpPort),
    TWILIO_API_BASE_URL: fakes.smsUrl,
    GOOGLE_AUTH_BASE_URL: fakes.oauthUrl,
    FAKES_CONTROL_URL: fakes.controlUrl,
    ...env,
  });
  const db = createDb(config.DATABASE_URL);
  const errors: unknown[] = [];
  const built = await createApp({ config, db, messenger: createMessenger(config), log: (_m, err) => errors.push(err), logger: options.logger }, "none");
  return {
    app: built.app,
    db,
    config,
    fakes,
    errors,
    close: async () => {
      await built.close();
      await db.destroy();
      await fakes.stop();
    },
  };
}

/** Waits for a message to reach a fake (sending is asynchronous) and returns it. */
export async function waitForMessage(fakes: RunningFakes, to: string, timeoutMs = 5_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await fakes.listOutbox()).find((m) => m.to === to);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`no message reached ${to} within ${timeoutMs} ms`);
}

let ipCounter = 0;
/** A fresh client address per call, so per-IP limits don't leak between tests. */
export function freshIp(): string {
  ipCounter += 1;
  return `198.51.100.${ipCounter % 250}`;
}

export function tokenFromLink(link: string): string {
  const token = new URL(link).searchParams.get("token");
  if (!token) throw new Error(`no token in ${link}`);
  return token;
}

/** Sign-in limits count recent requests; tests that are not about the limits start from none. */
export async function forgetSignInRequests(ctx: TestContext) {
  await ctx.db("sign_in_requests").delete();
  await ctx.db("rate_limit_hits").where("key", "like", "sign-in:%").delete();
}

/** Signs a homeowner in through a real one-time link and returns the signed-in agent. */
export async function signInCustomer(ctx: TestContext, email: string) {
  const agent = request.agent(ctx.app);
  await forgetSignInRequests(ctx);
  await ctx.fakes.clearOutbox();
  await agent.post("/api/auth/link").set("X-Forwarded-For", freshIp()).send({ contact: email }).expect(202);
  const message = await waitForMessage(ctx.fakes, email);
  const link = message.links.find((l) => l.includes("/portal/sign-in/verify"))!;
  await agent.post("/api/auth/link/consume").send({ token: tokenFromLink(link) }).expect(200);
  await ctx.fakes.clearOutbox();
  return agent;
}

/** Signs a staff member in through the fake Google provider and returns the agent. */
export async function signInStaff(ctx: TestContext, email: string) {
  const agent = request.agent(ctx.app);
  const { status, location } = await googleRoundTrip(agent, ctx, email);
  if (status !== 302 || location !== "/staff/") throw new Error(`staff sign-in for ${email} ended at ${location}`);
  return agent;
}

/** Follows the OAuth redirects by hand: app → fake provider (choosing an account) → app callback. */
export async function googleRoundTrip(agent: ReturnType<typeof request.agent>, ctx: TestContext, email: string) {
  const start = await agent.get("/auth/google").expect(302);
  const authorizeUrl = new URL(start.headers.location!);
  const params = Object.fromEntries(authorizeUrl.searchParams);
  const chosen = await fetch(`${ctx.fakes.oauthUrl}${authorizeUrl.pathname}`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded" },
    body: new URLSearchParams({ ...params, email }),
  });
  const callback = new URL(chosen.headers.get("location")!);
  const done = await agent.get(`${callback.pathname}${callback.search}`);
  return { status: done.status, location: done.headers.location as string | undefined };
}

/**
 * A loopback port free right now. Webhook tests need the app listening on its PUBLIC_URL, because the
 * SMS fake signs the URL it calls and the app checks the signature against PUBLIC_URL.
 */
export async function freePort(): Promise<number> {
  const probe = createServer();
  await new Promise<void>((r) => probe.listen(0, "127.0.0.1", r));
  const { port } = probe.address() as AddressInfo;
  await new Promise((r) => probe.close(r));
  return port;
}
