import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../test/harness.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

/** The sessions of a user, as the store keeps them. */
function sessionsOf(userEmail: string) {
  return ctx.db("sessions").whereRaw("sess #>> '{passport,user}' = (select id::text from users where email = ?)", [userEmail]);
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

  it("gives each of many requests at once its own person, though their sessions are read together", async () => {
    const people = [
      { agent: await signInCustomer(ctx, "ruth.okonkwo@mail.example"), email: "ruth.okonkwo@mail.example" },
      { agent: await signInCustomer(ctx, "tomasz.brandt@mail.example"), email: "tomasz.brandt@mail.example" },
      { agent: await signInStaff(ctx, "marco@cobblefield.example"), email: "marco@cobblefield.example" },
    ];
    const asked = Array.from({ length: 30 }, (_, i) => people[i % people.length]!);
    const answers = await Promise.all(asked.map(({ agent }) => agent.get("/api/me").expect(200)));
    expect(answers.map((a) => a.body.user.email)).toEqual(asked.map((p) => p.email));
  });

  it("forgets a deactivated user in the session, so reactivating the account does not revive an old session", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get("/api/me").expect(200);
    await ctx.db("users").where({ email: "ruth.okonkwo@mail.example" }).update({ active: false });
    try {
      await ruth.get("/api/me").expect(401);
    } finally {
      await ctx.db("users").where({ email: "ruth.okonkwo@mail.example" }).update({ active: true });
    }
    await ruth.get("/api/me").expect(401);
    const again = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await again.get("/api/me").expect(200);
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
      // Signed in once only, so the session to spoil is certain (expiry times can tie to the second).
      await sessionsOf("tomasz.brandt@mail.example").delete();
      const tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
      await tomasz.get("/api/me").expect(200);
      const { sid } = (await sessionsOf("tomasz.brandt@mail.example").first<{ sid: string }>("sid"))!;
      await ctx.db.raw("update sessions set sess = jsonb_set(sess::jsonb, '{passport,user}', ?::jsonb)::json where sid = ?", [json, sid]);
      const res = await tomasz.get("/api/me");
      expect(res.status).toBe(401);
      expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
    },
  );
});
