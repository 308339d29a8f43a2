import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

/** The newest session row of a user, as the store keeps it. */
async function sessionOf(userEmail: string): Promise<string> {
  const user = await ctx.db("users").where({ email: userEmail }).first<{ id: number }>("id");
  const row = await ctx.db("sessions")
    .whereRaw("sess #>> '{passport,user}' = ?", [String(user!.id)])
    .orderBy("expire", "desc")
    .first<{ sid: string }>("sid");
  return row!.sid;
}

describe("the session read, which loads the signed-in user with it", () => {
  it("sees a change of role or name on the very next request", async () => {
    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    const before = (await marco.get("/api/me").expect(200)).body.user;
    expect(before).toMatchObject({ role: "technician" });
    await ctx.db("users").where({ email: "marco@cobblefield.example" }).update({ role: "manager", name: "Marco R." });
    try {
      expect((await marco.get("/api/me").expect(200)).body.user).toMatchObject({ role: "manager", name: "Marco R." });
    } finally {
      await ctx.db("users").where({ email: "marco@cobblefield.example" }).update({ role: before.role, name: before.name });
    }
  });

  it("keeps a homeowner's own customer record with the user", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    const me = (await ruth.get("/api/me").expect(200)).body.user;
    const customer = await ctx.db("customers").where({ external_ref: "C-1001" }).first<{ id: number }>("id");
    expect(me).toMatchObject({ role: "customer", customerId: customer!.id });
  });

  it.each([["not a number", '"abc"'], ["too large for an id", '"99999999999999"'], ["an object", '{"id": 1}'], ["missing", "null"]])(
    "reads a session whose user id is %s as signed out, not as a failure",
    async (_what, json) => {
      const tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
      await tomasz.get("/api/me").expect(200);
      const sid = await sessionOf("tomasz.brandt@mail.example");
      await ctx.db.raw("update sessions set sess = jsonb_set(sess::jsonb, '{passport,user}', ?::jsonb)::json where sid = ?", [json, sid]);
      const res = await tomasz.get("/api/me");
      expect(res.status).toBe(401);
      expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
    },
  );
});
