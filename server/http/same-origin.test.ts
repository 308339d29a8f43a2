import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, type TestContext } from "../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("cross-site request forgery guard", () => {
  it("refuses a state-changing request started by another site", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const res = await ruth.post("/api/auth/sign-out").set("Origin", "https://evil.example").send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("cross_site");
    await ruth.get("/api/me").expect(200); // still signed in: the forged sign-out did nothing
  });

  it("refuses a foreign Referer when there is no Origin, and an opaque origin", async () => {
    await request(ctx.app).post("/api/auth/link").set("Referer", "https://evil.example/page").send({ contact: "x@y.example" }).expect(403);
    await request(ctx.app).post("/api/auth/link").set("Origin", "null").send({ contact: "x@y.example" }).expect(403);
  });

  it("refuses an opaque origin even when a same-site Referer comes with it", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const res = await ruth.post("/api/auth/sign-out").set("Origin", "null").set("Referer", "http://localhost:5999/portal/").send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("cross_site");
    await ruth.get("/api/me").expect(200);
  });

  it("accepts the app's own origin and leaves reads alone", async () => {
    await request(ctx.app).post("/api/auth/link").set("Origin", "http://localhost:5999").set("X-Forwarded-For", "192.0.2.200").send({ contact: "someone@nowhere.example" }).expect(202);
    await request(ctx.app).get("/api/health").set("Origin", "https://evil.example").expect(200);
  });
});
