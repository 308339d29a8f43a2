import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import type { Role } from "#shared/schemas/auth";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../test/harness.ts";
import { collectRoutes } from "../routes.ts";
import { createMessenger } from "../messaging/create-messenger.ts";
import type { RouteSpec } from "./route.ts";
import { NO_STORE, REVALIDATE } from "./cache-control.ts";

/**
 * Every API answer is private: `no-store`, or `private, no-cache` for JSON reads that
 * revalidate with their ETag, and always `Vary: Cookie` (server/http/cache-control.ts).
 * The one public answer is the company logo, which e-mails show with no session.
 */
type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let agents: Record<Role | "signedOut", Agent>;
let ids: Record<string, number>;

beforeAll(async () => {
  ctx = await createTestContext();
  const ruth = await ctx.db("customers").where({ external_ref: "C-1001" }).first<{ id: number; company_id: number }>("id", "company_id");
  const property = await ctx.db("properties").where({ customer_id: ruth!.id }).orderBy("id").first<{ id: number }>("id");
  const plan = await ctx.db("care_plans").where({ property_id: property!.id }).orderBy("id").first<{ id: number }>("id");
  ids = { "properties:id": property!.id, "customers:id": ruth!.id, planId: plan!.id, companyId: ruth!.company_id };
  agents = {
    signedOut: request.agent(ctx.app),
    customer: await signInCustomer(ctx, "ruth.okonkwo@mail.example"),
    technician: await signInStaff(ctx, "marco@cobblefield.example"),
    manager: await signInStaff(ctx, "dana@cobblefield.example"),
  };
});
afterAll(async () => ctx.close());

/** Ruth's own records where the path names one, "1" elsewhere (a 404 is an answer too). */
function fillPath(path: string): string {
  return path.replace(/\/([^/]+)\/:(\w+)/g, (_whole, segment: string, param: string) => `/${segment}/${ids[`${segment}:${param}`] ?? ids[param] ?? 1}`).replace(/:(\w+)/g, "1");
}

/** The caller who gets furthest: one the route admits, staff before customers. */
function callerFor(spec: RouteSpec): Agent {
  if (spec.access === "public") return agents.signedOut;
  if (spec.access === "signed_in") return agents.manager;
  const role = (["manager", "technician", "customer"] as const).find((r) => (spec.access as readonly Role[]).includes(r));
  return agents[role!];
}

const routes = () => collectRoutes({ config: ctx.config, db: ctx.db, messenger: createMessenger(ctx.config), log: () => {} }).filter((r) => r.path.startsWith("/api/"));
const isLogo = (spec: RouteSpec) => spec.path === "/api/companies/:companyId/logo";

describe("Cache-Control and Vary on every API route", () => {
  it("reads revalidate or are not stored, changes and errors are never stored, and all vary by cookie", async () => {
    const problems: string[] = [];
    let revalidatingReads = 0;
    for (const spec of routes()) {
      const url = fillPath(spec.path);
      // Changes are sent signed out (or to public routes with an empty body), so this test changes no data.
      const res = spec.method === "get" ? await callerFor(spec).get(url) : await agents.signedOut[spec.method](url).set("Content-Type", "application/json").send("{}");
      const cacheControl = res.headers["cache-control"];
      const vary = String(res.headers.vary ?? "");
      const jsonRead = spec.method === "get" && res.status === 200 && /json/.test(res.headers["content-type"] ?? "");
      const photo = spec.path.startsWith("/api/photos/") && res.status === 200;
      const expected = isLogo(spec) && res.status === 200 ? /^public, max-age=\d+$/ : (jsonRead && spec.cache !== "no-store") || photo ? REVALIDATE : NO_STORE;
      if (jsonRead && spec.cache !== "no-store") revalidatingReads++;
      const fits = typeof expected === "string" ? cacheControl === expected : expected.test(cacheControl ?? "");
      if (!fits) problems.push(`${spec.method.toUpperCase()} ${url} (${res.status}): Cache-Control ${cacheControl}, expected ${expected}`);
      if (!/\bCookie\b/.test(vary)) problems.push(`${spec.method.toUpperCase()} ${url} (${res.status}): Vary "${vary}" lacks Cookie`);
    }
    expect(problems).toEqual([]);
    // The walk reached real answers, not only refusals: plans, customers, lists, the session.
    expect(revalidatingReads).toBeGreaterThanOrEqual(15);
  });

  it("a plan read answers 304 to its own ETag, with the same headers", async () => {
    const first = await agents.customer.get(`/api/plans/${ids.planId}`).expect(200);
    expect(first.headers["cache-control"]).toBe(REVALIDATE);
    expect(first.headers.etag).toBeTruthy();
    const again = await agents.customer.get(`/api/plans/${ids.planId}`).set("If-None-Match", first.headers.etag!).expect(304);
    expect(again.headers["cache-control"]).toBe(REVALIDATE);
    expect(again.headers.vary).toMatch(/\bCookie\b/);
  });

  it("exports, writes, sign-in, unknown routes and refusals are never stored", async () => {
    const csv = await agents.manager.get("/api/follow-ups.csv").expect(200);
    expect(csv.headers["content-type"]).toMatch(/text\/csv/);
    expect(csv.headers["cache-control"]).toBe(NO_STORE);
    const created = await agents.manager.post("/api/saved-replies").set("Origin", ctx.config.PUBLIC_URL).send({ title: `cache ${Date.now()}`, body: "Hello {{firstName}}" }).expect(201);
    expect(created.headers["cache-control"]).toBe(NO_STORE);
    const calendar = await agents.customer.get("/api/my/calendar").expect(200);
    expect(calendar.headers["cache-control"]).toBe(NO_STORE);
    for (const res of [await agents.signedOut.get("/api/nowhere"), await agents.signedOut.get("/api/my/plans"), await agents.customer.get("/api/customers")]) {
      expect([res.status, res.headers["cache-control"], res.headers.vary]).toEqual([res.status, NO_STORE, expect.stringMatching(/\bCookie\b/)]);
      expect(res.status).toBeGreaterThanOrEqual(400);
    }
  });
});
