import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, type TestContext } from "../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("headers on every answer", () => {
  it("a Content-Security-Policy whose scripts come from our own origin only, never inline", async () => {
    const res = await request(ctx.app).get("/api/health").expect(200);
    const policy = String(res.headers["content-security-policy"]);
    const scriptSrc = policy.split(";").map((d) => d.trim()).find((d) => d.startsWith("script-src"));
    expect(scriptSrc).toBe("script-src 'self'");
    expect(policy).toContain("frame-ancestors 'none'");
    expect(policy).toContain("object-src 'none'");
    expect(res.headers["x-content-type-options"]).toBe("nosniff");
  });

  it("compresses a large answer (a whole plan) for a client that accepts gzip, and only then", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const { plans } = (await ruth.get("/api/my/plans").expect(200)).body as { plans: { id: number }[] };
    const path = `/api/plans/${plans[0]!.id}`;
    const zipped = await ruth.get(path).set("Accept-Encoding", "gzip").expect(200);
    expect(zipped.headers["content-encoding"]).toBe("gzip");
    expect(zipped.body.plan.steps.length).toBeGreaterThan(0);
    const plain = await ruth.get(path).set("Accept-Encoding", "identity").expect(200);
    expect(plain.headers["content-encoding"]).toBeUndefined();
    expect(plain.body).toEqual(zipped.body);
  });

  it("sends a small answer (Today) as it is, even to a client that accepts gzip", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const { plans } = (await ruth.get("/api/my/plans").expect(200)).body as { plans: { id: number }[] };
    const today = await ruth.get(`/api/plans/${plans[0]!.id}/today`).set("Accept-Encoding", "gzip").expect(200);
    expect(today.headers["content-encoding"]).toBeUndefined();
    expect(Number(today.headers["content-length"])).toBeGreaterThan(1024);
    expect(Number(today.headers["content-length"])).toBeLessThan(14 * 1024);
  });
});
