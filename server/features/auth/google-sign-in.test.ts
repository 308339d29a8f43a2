import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, googleRoundTrip, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("staff sign-in with Google (local fake provider)", () => {
  it("signs in a manager listed in the database and shows the role", async () => {
    const agent = await signInStaff(ctx, "dana@cobblefield.example");
    const me = await agent.get("/api/me").expect(200);
    expect(me.body.user).toMatchObject({ role: "manager", name: "Dana Whitlow" });
    const stored = await ctx.db("users").where({ email: "dana@cobblefield.example" }).first();
    expect(stored.google_sub).toBeTruthy();
  });

  it("signs in a technician", async () => {
    const agent = await signInStaff(ctx, "marco@cobblefield.example");
    expect((await agent.get("/api/me").expect(200)).body.user.role).toBe("technician");
  });

  it("refuses someone who is not on the staff list, with a clear reason", async () => {
    const agent = request.agent(ctx.app);
    const result = await googleRoundTrip(agent, ctx, "visitor@elsewhere.example");
    expect(result).toEqual({ status: 302, location: "/staff/sign-in?error=not_staff" });
    await agent.get("/api/me").expect(401);
  });

  it("refuses a homeowner's address: customers cannot reach the staff app through Google", async () => {
    const result = await googleRoundTrip(request.agent(ctx.app), ctx, "ruth.okonkwo@mail.example");
    expect(result.location).toBe("/staff/sign-in?error=not_staff");
  });

  it("ends a deactivated staff member's session and refuses new sign-ins", async () => {
    const agent = await signInStaff(ctx, "priya@cobblefield.example");
    await agent.get("/api/me").expect(200);
    await ctx.db("users").where({ email: "priya@cobblefield.example" }).update({ active: false });
    try {
      await agent.get("/api/me").expect(401);
      const again = await googleRoundTrip(request.agent(ctx.app), ctx, "priya@cobblefield.example");
      expect(again.location).toBe("/staff/sign-in?error=deactivated");
    } finally {
      await ctx.db("users").where({ email: "priya@cobblefield.example" }).update({ active: true });
    }
  });
});

describe("role guards", () => {
  it("lets staff read the development outbox and keeps others out", async () => {
    await request(ctx.app).get("/api/dev/outbox").expect(401);
    const customer = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const forbidden = await customer.get("/api/dev/outbox");
    expect(forbidden.status).toBe(403);
    expect(forbidden.body.error.code).toBe("forbidden");
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    const outbox = await technician.get("/api/dev/outbox").expect(200);
    expect(Array.isArray(outbox.body.messages)).toBe(true);
  });

  it("lets staff read any property of their company", async () => {
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    const any = await ctx.db("properties").first<{ id: number }>("id");
    await technician.get(`/api/properties/${any!.id}`).expect(200);
  });
});
