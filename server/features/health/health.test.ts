import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, type TestContext } from "../../test/harness.ts";
import { loadConfig, ConfigError } from "../../config.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("health, unknown routes and bad input", () => {
  it("reports the database as reachable", async () => {
    const res = await request(ctx.app).get("/api/health").expect(200);
    expect(res.body).toMatchObject({ status: "ok", database: { reachable: true } });
  });

  it("answers unknown API routes with a JSON 404", async () => {
    const res = await request(ctx.app).get("/api/no-such-thing").expect(404);
    expect(res.body.error.code).toBe("not_found");
  });

  it("answers a malformed JSON body with a JSON 400 and no stack trace", async () => {
    const res = await request(ctx.app).post("/api/auth/link").set("Content-Type", "application/json").send("{not json");
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("bad_request");
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });

  it("answers a bad path parameter with field errors", async () => {
    const res = await request(ctx.app).get("/api/properties/abc");
    // signed out: the role check comes first
    expect(res.status).toBe(401);
  });

  it("refuses to start in production with a fake configured", () => {
    const base = { NODE_ENV: "production", DATABASE_URL: "postgres://x", SESSION_SECRET: "t7Qm2vX9pL4sW8kR1nB6yH3cJ5fD0gZa", TWILIO_AUTH_TOKEN: "real", GOOGLE_CLIENT_SECRET: "real" };
    expect(() => loadConfig(base)).not.toThrow();
    expect(() => loadConfig({ ...base, TWILIO_API_BASE_URL: "http://127.0.0.1:5181" })).toThrow(ConfigError);
    expect(() => loadConfig({ ...base, GOOGLE_AUTH_BASE_URL: "http://127.0.0.1:5182" })).toThrow(/fakes are not allowed/);
  });
});
