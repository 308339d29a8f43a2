import { createServer, type Server } from "node:http";
import twilio from "twilio";
import request from "supertest";
import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { addDays } from "#shared/engine/index";
import { createTestContext, freePort, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { reconcilePlanReminders } from "../reminders/reconcile.ts";
import { createCustomerWithPlan, daytimeZone, eventually, fastSettings, insertDueReminder, testDispatcher, type FixtureCustomer } from "../reminders/testing/fixtures.ts";

let ctx: TestContext;
let server: Server;
let publicUrl: string;

beforeAll(async () => {
  const port = await freePort();
  publicUrl = `http://127.0.0.1:${port}`;
  ctx = await createTestContext({ PUBLIC_URL: publicUrl });
  server = createServer(ctx.app);
  await new Promise<void>((r) => server.listen(port, "127.0.0.1", r));
  ctx.fakes.sms.setInboundWebhookUrl(`${publicUrl}/api/webhooks/sms/inbound`);
});
afterAll(async () => {
  await new Promise((r) => server.close(r));
  await ctx.close();
});
beforeEach(async () => {
  await ctx.fakes.clearOutbox();
});

const textsTo = (phone: string | null) => ctx.fakes.sms.messages().filter((m) => m.to === phone && m.direction === "outbound-api");
const sign = (url: string, params: Record<string, string>) => twilio.getExpectedTwilioSignature(ctx.config.TWILIO_AUTH_TOKEN, url, params);

async function customerWithTodaysPlan(): Promise<FixtureCustomer & { zone: string; today: string }> {
  const zone = daytimeZone();
  const today = localDateAt(zone);
  const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: today, times: ["12:00", "23:00"] }, { date: today, kind: "mow" }, { date: addDays(today, 1), kind: "mow" }] });
  return { ...c, zone, today };
}

describe("webhook signatures", () => {
  const params = { From: "+13315550199", To: "+15005550006", Body: "HELP", MessageSid: "SM0123" };

  it("accepts a request signed for PUBLIC_URL + path", async () => {
    const res = await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", sign(`${publicUrl}/api/webhooks/sms/inbound`, params)).send(params);
    expect(res.status).toBe(200);
    expect(res.headers["content-type"]).toMatch(/text\/xml/);
  });

  it("refuses a missing or wrong signature with 403", async () => {
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").send(params).expect(403);
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", "bm90IGEgc2lnbmF0dXJl").send(params).expect(403);
    // Signed with another auth token, or for the Host the caller chose rather than our public URL.
    const otherToken = twilio.getExpectedTwilioSignature("someone-elses-token", `${publicUrl}/api/webhooks/sms/inbound`, params);
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", otherToken).send(params).expect(403);
    const forHost = sign("http://evil.example/api/webhooks/sms/inbound", params);
    await request(ctx.app).post("/api/webhooks/sms/inbound").set("Host", "evil.example").type("form").set("X-Twilio-Signature", forHost).send(params).expect(403);
    // Signed, but a field changed afterwards.
    await request(ctx.app).post("/api/webhooks/sms/inbound").type("form").set("X-Twilio-Signature", sign(`${publicUrl}/api/webhooks/sms/inbound`, params)).send({ ...params, Body: "STOP" }).expect(403);
    await request(ctx.app).post("/api/webhooks/sms/status").type("form").send({ MessageSid: "SM1", MessageStatus: "delivered" }).expect(403);
  });
});

describe("keywords from the customer's phone (through the fake's signed inbound webhook)", () => {
  it("HELP answers with the company's name and how to stop", async () => {
    const c = await customerWithTodaysPlan();
    const result = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "help" });
    expect(result.webhookStatus).toBe(200);
    expect(result.replies).toEqual(["Cobblefield Turf: lawn care plan reminders from Cobblefield Turf Care. Reply STOP to stop, START to resume. Msg & data rates may apply."]);
  });

  it("STOP opts out (with a confirmation), after which a due reminder sends nothing; START resumes", async () => {
    const c = await customerWithTodaysPlan();
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "sms", daily_time: "08:00", watering_nudges: false });
    await reconcilePlanReminders(ctx.db, c.planId);

    const stop = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "Stop" });
    expect(stop.replies[0]).toMatch(/^Cobblefield Turf: You're unsubscribed .* Reply START to resume\.$/);
    expect(await ctx.db("channel_opt_outs").where({ customer_id: c.customerId }).select("channel", "source")).toEqual([{ channel: "sms", source: "sms_keyword" }]);
    // A text reminder that was already queued when STOP arrived is skipped by the worker, not sent.
    const racing = await insertDueReminder(ctx.db, c, { localDate: c.today, timeZone: c.zone, localTime: "09:15" });
    await testDispatcher(ctx.db, ctx.config).drain();
    expect(textsTo(c.phone)).toEqual([]);
    expect(await ctx.db("reminders").where({ id: racing }).first("state")).toEqual({ state: "skipped_opted_out" });
    // The plan's texts were cancelled; e-mail (which the customer has) carries the reminders instead
    // (the skipped text too, through a fallback row, which is left out here).
    const channels = await ctx.db("reminders").where({ plan_id: c.planId }).whereNot({ id: racing }).whereNull("fallback_for").orderBy(["channel", "state"]).select("channel", "state");
    expect(channels).toEqual([
      { channel: "email", state: "scheduled" },
      { channel: "email", state: "sent" },
      { channel: "sms", state: "cancelled" },
      { channel: "sms", state: "cancelled" },
    ]);

    const start = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "START" });
    expect(start.replies[0]).toBe("Cobblefield Turf: Text reminders are back on. Reply HELP for help, STOP to stop.");
    expect(await ctx.db("channel_opt_outs").where({ customer_id: c.customerId })).toEqual([]);
    await testDispatcher(ctx.db, ctx.config).drain();
    const texts = textsTo(c.phone);
    expect(texts).toHaveLength(1);
    expect(texts[0]!.body).toMatch(/^Cobblefield Turf: Your lawn today/);
  });

  it("DONE marks today's watering done and cancels the rest of today's nudges", async () => {
    const c = await customerWithTodaysPlan();
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "sms", daily_time: "08:00", watering_nudges: true });
    await ctx.db("plan_steps").where({ plan_id: c.planId, kind: "water" }).update({ content: JSON.stringify({ detail: "", times: ["20:59"], minutesPerCycle: 5 }) });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect(await ctx.db("reminders").where({ plan_id: c.planId, kind: "watering_nudge" }).pluck("state")).toEqual(["scheduled"]);
    const done = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "done!" });
    expect(done.replies).toEqual(["Cobblefield Turf: Marked today's watering done. Nice work!"]);
    expect(await ctx.db("plan_steps").where({ plan_id: c.planId, kind: "water" }).pluck("state")).toEqual(["done"]);
    expect(await ctx.db("reminders").where({ plan_id: c.planId, kind: "watering_nudge" }).pluck("state")).toEqual(["cancelled"]);
    const again = await ctx.fakes.sms.simulateInbound({ from: c.phone!, body: "DONE" });
    expect(again.replies).toEqual(["Cobblefield Turf: There is no watering left to mark for today."]);
  });

  it("STOP from a number we don't know still gets a confirmation; other texts get the office number from the demo company and are kept as unmatched (two-way.test.ts)", async () => {
    expect((await ctx.fakes.sms.simulateInbound({ from: "+13315550198", body: "UNSUBSCRIBE" })).replies[0]).toMatch(/^Cobblefield Turf: You're unsubscribed/);
    expect((await ctx.fakes.sms.simulateInbound({ from: "+13315550198", body: "what time do I water?" })).replies).toEqual([
      "Cobblefield Turf: Hello! This number isn't on file with Cobblefield Turf Care, so we couldn't pass your text on. Please call or text us at (330) 555-0100.",
    ]);
  });
});

describe("delivery status callbacks", () => {
  it("move a sent text to delivered, and an undelivered one to failed with an e-mail fallback", async () => {
    const c = await customerWithTodaysPlan();
    const good = await insertDueReminder(ctx.db, c, { localDate: c.today, timeZone: c.zone });
    const unreachable = await createCustomerWithPlan(ctx.db, { timeZone: c.zone, steps: [{ date: c.today, kind: "mow" }], phone: "+13315551111" });
    const bad = await insertDueReminder(ctx.db, unreachable, { localDate: c.today, timeZone: c.zone });
    await testDispatcher(ctx.db, ctx.config, fastSettings({ REMINDER_STATUS_CALLBACKS: "true" })).drain();
    await eventually(async () => (await ctx.db("reminders").where({ id: good }).first("state")).state === "delivered", 5_000, "the delivered callback");
    await eventually(async () => (await ctx.db("reminders").where({ id: bad }).first("state")).state === "failed", 5_000, "the undelivered callback");
    expect(await ctx.db("reminders").where({ id: bad }).first("last_error")).toEqual({ last_error: "undelivered (error 30003)" });
    const fallback = await ctx.db("reminders").where({ fallback_for: bad }).first("channel", "state");
    // Due at once: on a slow machine the same drain may already have sent it.
    expect(fallback.channel).toBe("email");
    expect(["scheduled", "sent"]).toContain(fallback.state);
    const callbacks = ctx.fakes.sms.messages().find((m) => m.to === c.phone)!.callbacks;
    expect(callbacks.map((cb) => cb.httpStatus)).toEqual([204, 204, 204]);
    expect(callbacks[0]!.url).toBe(`${publicUrl}/api/webhooks/sms/status?reminder=${good}`);
  });
});

describe("one-click e-mail unsubscribe (RFC 8058)", () => {
  it("the header's URL takes a POST with List-Unsubscribe=One-Click; a GET only shows a button; a forged link is refused", async () => {
    const c = await customerWithTodaysPlan();
    await insertDueReminder(ctx.db, c, { localDate: c.today, timeZone: c.zone, channel: "email" });
    await testDispatcher(ctx.db, ctx.config).drain();
    const [email] = ctx.fakes.smtp.messages().filter((m) => m.envelopeTo.includes(c.email!));
    const url = new URL(/^<([^>]+)>/.exec(email!.listUnsubscribe!)![1]!);
    expect(url.origin).toBe(publicUrl);

    const page = await request(ctx.app).get(url.pathname + url.search).expect(200);
    expect(page.text).toContain("<form method=\"post\"");
    expect(await ctx.db("channel_opt_outs").where({ customer_id: c.customerId })).toEqual([]);

    await request(ctx.app).post(url.pathname + url.search).type("form").send("List-Unsubscribe=One-Click").expect(200);
    expect(await ctx.db("channel_opt_outs").where({ customer_id: c.customerId }).select("channel", "source")).toEqual([{ channel: "email", source: "email_one_click" }]);

    const forged = new URL(url);
    forged.searchParams.set("c", String(c.customerId + 1));
    await request(ctx.app).post(forged.pathname + forged.search).type("form").send("List-Unsubscribe=One-Click").expect(404);
  });
});
