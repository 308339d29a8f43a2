import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import express from "express";
import { createTestContext, type TestContext } from "../test/harness.ts";
import { createRateLimit } from "./rate-limits.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

/** Two separate apps stand in for two server processes sharing one database. */
function appWithLimit(limit: number) {
  const app = express();
  app.set("trust proxy", 1);
  app.use(createRateLimit(ctx.db, { name: `test-${limit}-${Date.now()}`, windowMinutes: 1, limit, message: "Slow down." }));
  app.get("/", (_req, res) => res.json({ ok: true }));
  return app;
}

describe("rate limits stored in PostgreSQL", () => {
  it("holds across two server processes and answers 429 in the JSON error shape", async () => {
    const name = `shared-${Date.now()}`;
    const make = () => {
      const app = express();
      app.set("trust proxy", 1);
      app.use(createRateLimit(ctx.db, { name, windowMinutes: 1, limit: 4, message: "Slow down." }));
      app.get("/", (_req, res) => res.json({ ok: true }));
      return app;
    };
    const first = make();
    const second = make();
    const ip = "192.0.2.33";
    await request(first).get("/").set("X-Forwarded-For", ip).expect(200);
    await request(second).get("/").set("X-Forwarded-For", ip).expect(200);
    await request(first).get("/").set("X-Forwarded-For", ip).expect(200);
    await request(second).get("/").set("X-Forwarded-For", ip).expect(200);
    const limited = await request(first).get("/").set("X-Forwarded-For", ip);
    expect(limited.status).toBe(429);
    expect(limited.body.error).toEqual({ code: "rate_limited", message: "Slow down." });
    expect(limited.headers["ratelimit-policy"]).toBeDefined();
    // Another address is not affected.
    await request(second).get("/").set("X-Forwarded-For", "192.0.2.34").expect(200);
  });

  it("starts a new window once the old one has ended", async () => {
    const app = appWithLimit(1);
    await request(app).get("/").set("X-Forwarded-For", "192.0.2.40").expect(200);
    await request(app).get("/").set("X-Forwarded-For", "192.0.2.40").expect(429);
    await ctx.db("rate_limit_hits").where("key", "like", "test-1-%").update({ reset_at: ctx.db.raw("now() - interval '1 second'") });
    await request(app).get("/").set("X-Forwarded-For", "192.0.2.40").expect(200);
  });

  it("limits sign-in link requests per client address in the real app", async () => {
    await ctx.db("rate_limit_hits").delete();
    const ip = "192.0.2.77";
    let status = 0;
    for (let i = 0; i < 61 && status !== 429; i++) {
      status = (await request(ctx.app).post("/api/auth/link/consume").set("X-Forwarded-For", ip).send({ token: "x" })).status;
    }
    expect(status).toBe(429);
  });
});
