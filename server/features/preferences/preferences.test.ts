import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/index";
import { preferencesResponseSchema } from "#shared/schemas/preferences";
import { createTestContext, signInCustomer, tokenFromLink, waitForMessage, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { reconcilePlanReminders } from "../reminders/reconcile.ts";
import { localMomentAt } from "../reminders/schedule.ts";
import { createCustomerWithPlan, daytimeZone, freshPhone } from "../reminders/testing/fixtures.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

async function customerSignedIn() {
  const zone = daytimeZone();
  const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: addDays(localDateAt(zone), 1), kind: "mow" }] });
  await reconcilePlanReminders(ctx.db, c.planId);
  return { ...c, zone, agent: await signInCustomer(ctx, c.email!) };
}

describe("notification preferences", () => {
  it("start from the defaults, follow the contract, and reschedule reminders when changed", async () => {
    const c = await customerSignedIn();
    const initial = await c.agent.get("/api/my/preferences").expect(200);
    expect(preferencesResponseSchema.parse(initial.body)).toEqual({
      preferences: { channels: "sms", dailyTime: "08:00", wateringNudges: false, language: "en", units: "us" },
      contact: { email: c.email, phone: c.phone },
      optedOut: [],
    });

    const bad = await c.agent.put("/api/my/preferences").send({ ...initial.body.preferences, dailyTime: "07:30" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.dailyTime).toMatch(/8:00 am/);

    const changed = await c.agent.put("/api/my/preferences").send({ channels: "both", dailyTime: "18:15", wateringNudges: true, language: "es", units: "metric" }).expect(200);
    expect(changed.body.preferences).toEqual({ channels: "both", dailyTime: "18:15", wateringNudges: true, language: "es", units: "metric" });
    const rows = await ctx.db("reminders").where({ plan_id: c.planId, kind: "daily_summary", state: "scheduled" }).select("channel", "due_at", "local_time");
    expect(rows.map((r) => r.channel).sort()).toEqual(["email", "sms"]);
    expect(rows.every((r) => r.local_time === "18:15" && localMomentAt(r.due_at, c.zone).time === "18:15")).toBe(true);

    await c.agent.put("/api/my/preferences").send({ ...changed.body.preferences, channels: "none" }).expect(200);
    expect(await ctx.db("reminders").where({ plan_id: c.planId, state: "scheduled" })).toEqual([]);
  });

  it("are for customers only", async () => {
    await request(ctx.app).get("/api/my/preferences").expect(401);
  });
});

describe("changing a contact detail", () => {
  it("sends a confirmation link to the NEW address and applies the change only when it is followed, once", async () => {
    const c = await customerSignedIn();
    const newEmail = `moved-${c.customerId}@test.example`;
    await c.agent.post("/api/my/contact").send({ email: newEmail }).expect(202, { pending: ["email"] });
    expect((await ctx.db("users").where({ id: c.userId }).first("email")).email).toBe(c.email);

    const message = await waitForMessage(ctx.fakes, newEmail);
    const link = message.links.find((l) => l.includes("/api/my/contact/confirm"))!;
    const url = new URL(link);
    const confirmed = await request(ctx.app).get(url.pathname + url.search).expect(303);
    expect(confirmed.headers.location).toBe("/portal/preferences?contact=confirmed");
    expect((await ctx.db("users").where({ id: c.userId }).first("email")).email).toBe(newEmail);

    const again = await request(ctx.app).get(url.pathname + url.search).expect(303);
    expect(again.headers.location).toBe("/portal/preferences?contact=link_used");
    await request(ctx.app).post("/api/my/contact/confirm").send({ token: tokenFromLink(link) }).expect(410);
    await request(ctx.app).post("/api/my/contact/confirm").send({ token: "x".repeat(43) }).expect(400);
  });

  it("texts a new mobile number, stores it in E.164, and gives the new number the how-to-stop intro again", async () => {
    const c = await customerSignedIn();
    await ctx.db("sms_intros").insert({ customer_id: c.customerId, reminder_id: null });
    const phone = freshPhone();
    const local = `(${phone.slice(2, 5)}) ${phone.slice(5, 8)}-${phone.slice(8)}`;
    await c.agent.post("/api/my/contact").send({ phone: local }).expect(202, { pending: ["phone"] });
    const text = await waitForMessage(ctx.fakes, phone);
    expect(text.text).toMatch(/^Cobblefield Turf: confirm this number/);
    const link = text.links.find((l) => l.includes("/api/my/contact/confirm"))!;
    await request(ctx.app).post("/api/my/contact/confirm").send({ token: tokenFromLink(link) }).expect(200, { applied: { kind: "phone", value: phone } });
    expect((await ctx.db("users").where({ id: c.userId }).first("phone")).phone).toBe(phone);
    expect(await ctx.db("sms_intros").where({ customer_id: c.customerId })).toEqual([]);
  });

  it("refuses a bad number and an address that belongs to someone else", async () => {
    const c = await customerSignedIn();
    const bad = await c.agent.post("/api/my/contact").send({ phone: "12345678" });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.phone).toBeDefined();
    await c.agent.post("/api/my/contact").send({ email: "ruth.okonkwo@mail.example" }).expect(202);
    const message = await waitForMessage(ctx.fakes, "ruth.okonkwo@mail.example");
    const link = message.links.find((l) => l.includes("/api/my/contact/confirm"))!;
    await request(ctx.app).post("/api/my/contact/confirm").send({ token: tokenFromLink(link) }).expect(409);
  });
});
