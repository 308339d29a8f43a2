import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/index";
import { createTestContext, forgetSignInRequests, freshIp, signInStaff, tokenFromLink, waitForMessage, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { localMomentAt, zonedTimeToUtc } from "../reminders/schedule.ts";
import { createCustomerWithPlan, daytimeZone, nighttimeZone, testDispatcher, type FixtureCustomer } from "../reminders/testing/fixtures.ts";
import { replyAddress, replyTokenForPlan } from "../questions/reply-address.ts";
import { noticeOfNewPlan } from "./service.ts";
import { queueNotice } from "./queue.ts";

type Agent = ReturnType<typeof request.agent>;

let ctx: TestContext;
let marco: Agent;

beforeAll(async () => {
  ctx = await createTestContext();
  marco = await signInStaff(ctx, "marco@cobblefield.example");
});
afterAll(async () => ctx.close());
beforeEach(async () => {
  await ctx.fakes.clearOutbox();
});

type NoticeRow = { id: string; kind: string; channel: string; state: string; due_at: Date; next_attempt_at: Date; time_zone: string; last_error: string | null; body: string | null };
const noticesOf = (planId: number, kind = "conversation_update") => ctx.db("reminders").where({ plan_id: planId, kind }).orderBy("id").select<NoticeRow[]>();

async function customer(options: { zone?: string; email?: string | null; phone?: string | null } = {}): Promise<FixtureCustomer> {
  const zone = options.zone ?? daytimeZone();
  return createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: addDays(localDateAt(zone), 1), kind: "mow" }], email: options.email, phone: options.phone });
}

/** A homeowner's question, stored as the portal (or the SMS listener) stores it. */
async function ask(c: FixtureCustomer, text: string, source: "portal" | "sms" = "portal") {
  await ctx.db("conversations").insert({ plan_id: c.planId }).onConflict("plan_id").ignore();
  const conversation = await ctx.db("conversations").where({ plan_id: c.planId }).first<{ id: number }>("id");
  await ctx.db("messages").insert({ conversation_id: conversation!.id, kind: "question", author_user_id: c.userId, text, source });
}

const answer = (c: FixtureCustomer, text: string, resolve = false) => marco.post(`/api/plans/${c.planId}/answers`).send({ text, resolve }).expect(201);
const drain = () => testDispatcher(ctx.db, ctx.config).drain();
const outboxTo = async (to: string | null) => (await ctx.fakes.listOutbox()).filter((m) => m.to === to);

describe("an answer reaches the homeowner", () => {
  it("queues one notice, and the worker texts the answer with the company's name and a link to the conversation", async () => {
    const c = await customer();
    await ask(c, "Is it normal that the new grass looks thin near the fence?");
    await answer(c, "Yes, shady spots come up a week later. Keep watering.");
    expect((await noticesOf(c.planId)).map((r) => `${r.channel} ${r.state}`)).toEqual(["sms scheduled"]);

    await drain();
    const texts = await outboxTo(c.phone);
    expect(texts).toHaveLength(1);
    expect(texts[0]!.text).toMatch(/^Cobblefield/);
    expect(texts[0]!.text).toContain("Marco");
    expect(texts[0]!.text).toContain("shady spots come up a week later");
    expect(texts[0]!.links).toEqual([`${ctx.config.PUBLIC_URL}/portal/messages?plan=${c.planId}`]);
    expect((await noticesOf(c.planId)).map((r) => r.state)).toEqual(["sent"]);
  });

  it("an e-mail answer names the company, links the conversation and carries the conversation's reply address", async () => {
    const c = await customer({ phone: null });
    await ask(c, "Can I walk the dog on it?");
    await answer(c, "Keep off for two more weeks, please.", true);
    await drain();
    const mails = ctx.fakes.smtp.messages().filter((m) => m.envelopeTo.includes(c.email!));
    expect(mails).toHaveLength(1);
    expect(mails[0]!.headers["reply-to"]).toBe(replyAddress(await replyTokenForPlan(ctx.db, c.planId), ctx.config.INBOUND_EMAIL_DOMAIN));
    const [sent] = await outboxTo(c.email);
    expect(sent!.subject).toBe("Cobblefield Turf Care answered your question");
    expect(sent!.text).toContain("Keep off for two more weeks, please.");
    expect(sent!.links).toContain(`${ctx.config.PUBLIC_URL}/portal/messages?plan=${c.planId}`);
  });

  it("three answers in a row make one message", async () => {
    const c = await customer();
    await ask(c, "Three things: water, mow, feed?");
    await answer(c, "Water twice a day.");
    await answer(c, "Mow at 4 inches after three weeks.");
    await answer(c, "Feed again in six weeks.");
    expect(await noticesOf(c.planId)).toHaveLength(1);
    await drain();
    const texts = await outboxTo(c.phone);
    expect(texts).toHaveLength(1);
    expect(texts[0]!.text).toContain("3 new replies");
    expect(texts[0]!.text).toContain("Feed again in six weeks.");
  });

  it("when the homeowner has read the answer in the portal first, the notice is cancelled and nothing is sent", async () => {
    const c = await customer({ phone: null });
    await ask(c, "When can I mow?");
    await answer(c, "In about three weeks.");
    // The homeowner signs in and opens the conversation before the notice is due.
    const home = request.agent(ctx.app);
    await forgetSignInRequests(ctx);
    await home.post("/api/auth/link").set("X-Forwarded-For", freshIp()).send({ contact: c.email }).expect(202);
    const link = (await waitForMessage(ctx.fakes, c.email!)).links.find((l) => l.includes("/portal/sign-in/verify"))!;
    await home.post("/api/auth/link/consume").send({ token: tokenFromLink(link) }).expect(200);
    await home.get(`/api/plans/${c.planId}/thread`).expect(200);
    await ctx.fakes.clearOutbox();

    await drain();
    expect((await noticesOf(c.planId)).map((r) => `${r.state} ${r.last_error}`)).toEqual(["cancelled already read in the portal"]);
    expect(await outboxTo(c.email)).toEqual([]);
  });

  it("an answer queued during quiet hours is held to 08:00 local and nothing is sent now", async () => {
    const zone = nighttimeZone();
    const c = await customer({ zone });
    await ask(c, "Is frost a problem?");
    await answer(c, "Not for established seedlings.");
    const [row] = await noticesOf(c.planId);
    expect(localMomentAt(row!.due_at, zone)).toMatchObject({ date: localDateAt(zone), time: "08:00" });
    // Even if a worker claims it early (e.g. a clock skew), it holds it rather than sending.
    await ctx.db("reminders").where({ id: row!.id }).update({ next_attempt_at: ctx.db.fn.now() });
    await drain();
    const held = (await noticesOf(c.planId))[0]!;
    expect(held.state).toBe("scheduled");
    expect(localMomentAt(held.next_attempt_at, zone)).toMatchObject({ date: localDateAt(zone), time: "08:00" });
    expect(await outboxTo(c.phone)).toEqual([]);
  });

  it("a notice that comes due late in the evening waits for the next morning instead of failing", async () => {
    // A zone where it is 21:30 now: after the window, so the next allowed time is tomorrow.
    const now = new Date();
    let offset = 21 - now.getUTCHours();
    if (offset > 14) offset -= 24;
    if (offset < -12) offset += 24;
    const zone = offset === 0 ? "Etc/UTC" : offset > 0 ? `Etc/GMT-${offset}` : `Etc/GMT+${-offset}`;
    if (localMomentAt(now, zone).time <= "21:00") return; // the minute right on the hour is still inside the window
    const c = await customer({ zone });
    await ask(c, "Late question");
    await answer(c, "Late answer");
    await ctx.db("reminders").where({ plan_id: c.planId }).update({ next_attempt_at: ctx.db.fn.now() });
    await drain();
    const held = (await noticesOf(c.planId))[0]!;
    expect(held.state).toBe("scheduled");
    expect(localMomentAt(held.next_attempt_at, zone)).toMatchObject({ date: addDays(localDateAt(zone), 1), time: "08:00" });
    expect(held.next_attempt_at.getTime()).toBe(zonedTimeToUtc(addDays(localDateAt(zone), 1), "08:00", zone).getTime());
  });

  it("an answer to a question that came in by text goes back by text, even to a homeowner who chose e-mail", async () => {
    const c = await customer();
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "email", daily_time: "08:00", watering_nudges: false });
    await ask(c, "bare spots by the drive, reseed?", "sms");
    await answer(c, "Yes, we'll bring seed on Friday.");
    expect((await noticesOf(c.planId)).map((r) => r.channel).sort()).toEqual(["email", "sms"]);
    await drain();
    expect((await outboxTo(c.phone)).map((m) => m.text)).toEqual([expect.stringContaining("we'll bring seed on Friday")]);
    expect(await outboxTo(c.email)).toHaveLength(1);
  });
});

describe("the welcome message", () => {
  it("a logged visit queues one welcome per plan, which carries a one-tap sign-in link and the next days", async () => {
    const property = await ctx.db("properties").join("customers", "customers.id", "properties.customer_id").where("customers.external_ref", "C-1002").first<{ id: number; customer_id: number; time_zone: string }>("properties.id", "properties.customer_id", "properties.time_zone");
    const today = localDateAt(property!.time_zone);
    const logged = await marco
      .post("/api/visits")
      .send({ propertyId: property!.id, visit: { date: today, services: ["aeration", "overseeding"], seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 5, areaFt2: 6000, products: [] } })
      .expect(201);
    const { planId, welcomeChannels, invitationSent } = logged.body;
    expect(invitationSent).toBe(true);
    const rows = await noticesOf(planId, "welcome");
    expect(rows.map((r) => r.channel)).toEqual(welcomeChannels);
    expect(rows.length).toBeGreaterThan(0);
    // Queuing it again (a retried request, an import of the same plan) adds nothing.
    expect(await noticeOfNewPlan(ctx.db, planId)).toEqual([]);
    expect(await noticesOf(planId, "welcome")).toHaveLength(rows.length);

    const local = localMomentAt(new Date(), property!.time_zone);
    if (local.time < "08:00" || local.time > "21:00") return; // outside allowed hours the welcome rightly waits
    await drain();
    const user = await ctx.db("customers").join("users", "users.id", "customers.user_id").where("customers.id", property!.customer_id).first<{ email: string; phone: string }>("users.email", "users.phone");
    // The same drain also sends the plan's first daily summary; the welcome is the message with a sign-in link.
    const sent = (await ctx.fakes.listOutbox()).filter((m) => (m.to === user!.email || m.to === user!.phone) && m.links.some((l) => l.includes("/portal/sign-in/verify")));
    expect(sent).toHaveLength(rows.length);
    for (const m of sent) {
      expect(m.text).toContain("Cobblefield");
      const link = m.links.find((l) => l.includes("/portal/sign-in/verify?token="));
      expect(link).toBeDefined();
    }
    // The link signs the homeowner in, once.
    const link = sent[0]!.links.find((l) => l.includes("/portal/sign-in/verify?token="))!;
    const home = request.agent(ctx.app);
    await home.post("/api/auth/link/consume").send({ token: tokenFromLink(link) }).expect(200);
    await home.get(`/api/plans/${planId}`).expect(200);
  });

  it("the welcome e-mail lists the plan's first steps from today on and shows the company's phone", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, {
      timeZone: zone,
      phone: null,
      steps: [
        { date: addDays(today, -1), kind: "mow", title: "Mow before the visit" },
        { date: today, title: "Water the seeded areas lightly" },
        { date: addDays(today, 1), kind: "mow", title: "Keep off the new grass" },
      ],
    });
    const company = await ctx.db("companies").where({ slug: "cobblefield" }).first<{ id: number; phone: string | null }>("id", "phone");
    await ctx.db("companies").where({ id: company!.id }).update({ phone: "+15555550142" });
    try {
      await queueNotice(ctx.db, { planId: c.planId, kind: "welcome" });
      await drain();
    } finally {
      await ctx.db("companies").where({ id: company!.id }).update({ phone: company!.phone });
    }
    const [mail] = await outboxTo(c.email);
    expect(mail!.subject).toBe("Your lawn care plan from Cobblefield Turf Care");
    expect(mail!.text).toContain("Water the seeded areas lightly");
    expect(mail!.text).toContain("Keep off the new grass");
    expect(mail!.text).not.toContain("Mow before the visit");
    expect(mail!.text).toContain("Call or text the office at (555) 555-0142.");
  });
});

describe("visit notices", () => {
  it("a booked follow-up visit is texted with its day, arrival window, technician and what to do before it; a cancelled one that no longer exists is not sent", async () => {
    const c = await customer();
    const marcoUser = await ctx.db("users").where({ email: "marco@cobblefield.example" }).first<{ id: number }>("id");
    const [visit] = await ctx.db("follow_up_visits")
      .insert({ property_id: c.propertyId, plan_id: c.planId, status: "scheduled", scheduled_for: "2026-12-09", technician_id: marcoUser!.id, reason: "no_germination", arrival_start: "09:00", arrival_end: "11:00", customer_prep: "Please don't mow the day before." })
      .returning<{ id: number }[]>("id");
    expect(await queueNotice(ctx.db, { planId: c.planId, kind: "visit_update", context: { followUpId: visit!.id, change: "booked" } })).toEqual(["sms"]);
    await drain();
    const [text] = await outboxTo(c.phone);
    expect(text!.text).toMatch(/^Cobblefield/);
    expect(text!.text).toContain("A visit is booked on Wed, Dec 9 between 9:00 am and 11:00 am.");
    expect(text!.text).toContain("Marco");
    expect(text!.text).toContain("Please don't mow the day before.");
    expect(text!.links).toEqual([`${ctx.config.PUBLIC_URL}/portal/plan/${c.planId}`]);

    await ctx.fakes.clearOutbox();
    await queueNotice(ctx.db, { planId: c.planId, kind: "visit_update", context: { followUpId: visit!.id, change: "cancelled" } });
    await ctx.db("follow_up_visits").where({ id: visit!.id }).delete();
    // The first notice already took this minute's slot, so the second is due a minute later: let that minute pass.
    await ctx.db("reminders").where({ plan_id: c.planId, kind: "visit_update", state: "scheduled" }).update({ next_attempt_at: ctx.db.fn.now() });
    await drain();
    expect((await noticesOf(c.planId, "visit_update")).map((r) => `${r.state} ${r.last_error ?? ""}`)).toEqual(["sent ", "cancelled the follow-up visit is no longer on this plan"]);
    expect(await outboxTo(c.phone)).toEqual([]);
  });
});

describe("every customer e-mail carries the conversation's reply address", () => {
  it("a daily summary e-mail has Reply-To too", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, phone: null, steps: [{ date: today, kind: "mow" }] });
    await ctx.db("reminders").insert({ customer_id: c.customerId, plan_id: c.planId, kind: "daily_summary", local_date: today, local_time: "08:00", time_zone: zone, channel: "email", due_at: ctx.db.fn.now(), next_attempt_at: ctx.db.fn.now() });
    await drain();
    const mails = ctx.fakes.smtp.messages().filter((m) => m.envelopeTo.includes(c.email!));
    expect(mails).toHaveLength(1);
    expect(mails[0]!.headers["reply-to"]).toMatch(new RegExp(`^reply\\+[A-Za-z0-9_-]{16,64}@${ctx.config.INBOUND_EMAIL_DOMAIN.replaceAll(".", "\\.")}$`));
  });
});

describe("links survive sign-in", () => {
  it("a sign-in link asked for from a notice's page carries that page through sign-in/verify; other targets are refused", async () => {
    const c = await customer({ phone: null });
    await forgetSignInRequests(ctx);
    const target = `/portal/messages?plan=${c.planId}`;
    await request(ctx.app).post("/api/auth/link").set("X-Forwarded-For", freshIp()).send({ contact: c.email, next: target }).expect(202);
    const link = (await waitForMessage(ctx.fakes, c.email!)).links.find((l) => l.includes("/portal/sign-in/verify"))!;
    expect(new URL(link).searchParams.get("next")).toBe(target);

    for (const next of ["//evil.example/portal/", "https://evil.example/portal/messages", "/staff/"]) {
      const res = await request(ctx.app).post("/api/auth/link").set("X-Forwarded-For", freshIp()).send({ contact: c.email, next }).expect(400);
      expect(res.body.error.fields).toHaveProperty("next");
    }
  });
});
