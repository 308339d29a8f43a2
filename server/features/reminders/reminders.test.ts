import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { optOut } from "../preferences/repo.ts";
import { reconcilePlanReminders } from "./reconcile.ts";
import { localMomentAt } from "./schedule.ts";
import { addSteps, createCustomerWithPlan, daytimeZone, insertDueReminder, nighttimeZone, testDispatcher } from "./testing/fixtures.ts";

let ctx: TestContext;

beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());
beforeEach(async () => {
  await ctx.fakes.clearOutbox();
});

type Row = { id: string; kind: string; local_date: string; local_time: string; channel: string; state: string; due_at: Date; time_zone: string };
const remindersOf = (planId: number) => ctx.db("reminders").where({ plan_id: planId }).orderBy(["local_date", "kind", "local_time", "channel"]).select<Row[]>();
const localOf = (r: Row) => localMomentAt(r.due_at, r.time_zone);

describe("scheduling", () => {
  it("a visit logged through the API gets its daily summaries at 08:00 local, by text (the default), inside the same transaction", async () => {
    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    const property = await ctx.db("properties").join("customers", "customers.id", "properties.customer_id").where("customers.external_ref", "C-1002").first<{ id: number }>("properties.id");
    const today = localDateAt("America/New_York");
    const { planId } = (
      await marco
        .post("/api/visits")
        .send({ propertyId: property!.id, visit: { date: addDays(today, 1), services: ["aeration", "overseeding"], seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 5, areaFt2: 6000, products: [] } })
        .expect(201)
    ).body;
    const rows = await remindersOf(planId);
    const summaries = rows.filter((r) => r.kind === "daily_summary");
    const planDays = await ctx.db("plan_steps").where({ plan_id: planId, state: "pending" }).andWhere("date", ">", today).distinct("date");
    expect(summaries.length).toBeGreaterThanOrEqual(planDays.length);
    for (const r of summaries) {
      expect(r.channel).toBe("sms");
      expect(localOf(r)).toMatchObject({ date: r.local_date, time: "08:00" });
    }
    // Watering nudges are opt-in.
    expect(rows.some((r) => r.kind === "watering_nudge")).toBe(false);
  });

  it.each([
    ["America/New_York", ["2026-03-07", "2026-03-08", "2026-03-09", "2026-10-31", "2026-11-01", "2026-11-02"], ["13:00", "12:00", "12:00", "12:00", "13:00", "13:00"]],
    ["Europe/Berlin", ["2026-03-28", "2026-03-29", "2026-03-30", "2026-10-24", "2026-10-25", "2026-10-26"], ["07:00", "06:00", "06:00", "06:00", "07:00", "07:00"]],
  ])("in %s the daily summary stays at 08:00 local across both daylight-saving changes", async (zone, dates, utcTimes) => {
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: dates.map((date) => ({ date, kind: "mow" })) });
    await reconcilePlanReminders(ctx.db, c.planId, new Date("2026-03-01T00:00:00Z"));
    const rows = await remindersOf(c.planId);
    expect(rows.map((r) => r.local_date)).toEqual(dates);
    expect(rows.map((r) => r.due_at.toISOString().slice(11, 16))).toEqual(utcTimes);
    expect(rows.every((r) => localOf(r).time === "08:00")).toBe(true);
  });

  it("watering nudges at each watering time, held to the company's narrower window", async () => {
    const zone = "America/Los_Angeles";
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: "2027-03-14", times: ["07:00", "12:00", "19:30"] }] }); // US spring-forward day 2027
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "sms", daily_time: "08:00", watering_nudges: true });
    const company = await ctx.db("companies").where({ slug: "cobblefield" }).first<{ id: number }>("id");
    await ctx.db("companies").where({ id: company!.id }).update({ reminder_window_start: "09:30", reminder_window_end: "18:00" });
    try {
      await reconcilePlanReminders(ctx.db, c.planId, new Date("2027-03-01T00:00:00Z"));
    } finally {
      await ctx.db("companies").where({ id: company!.id }).update({ reminder_window_start: null, reminder_window_end: null });
    }
    const rows = await remindersOf(c.planId);
    expect(rows.map((r) => `${r.kind} ${r.local_time} → ${localOf(r).time}`)).toEqual([
      "daily_summary 08:00 → 09:30",
      // 07:00 held to 09:30 lands on the summary's minute and is left out; 19:30 can't go before the day ends.
      "watering_nudge 12:00 → 12:00",
    ]);
    expect(rows[0]!.due_at.toISOString()).toBe("2027-03-14T16:30:00.000Z"); // 09:30 PDT
  });

  it("a due reminder outside quiet hours waits for 08:00 local and sends nothing now", async () => {
    const zone = nighttimeZone();
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: localDateAt(zone), kind: "mow" }] });
    const id = await insertDueReminder(ctx.db, c, { localDate: localDateAt(zone), timeZone: zone });
    await testDispatcher(ctx.db, ctx.config).drain();
    const row = await ctx.db("reminders").where({ id }).first<Row & { next_attempt_at: Date; attempts: number }>();
    // 02:00 local: the next allowed time is 08:00 the same day, six hours on, and the hold used no attempt.
    expect(row).toMatchObject({ state: "scheduled", attempts: 0 });
    expect(localMomentAt(row!.next_attempt_at, zone)).toMatchObject({ date: localDateAt(zone), time: "08:00" });
    expect((await ctx.fakes.listOutbox()).filter((m) => m.to === c.phone)).toEqual([]);
  });

  it("an opted-out channel gets nothing: its reminders are cancelled and the other channel is used", async () => {
    const zone = daytimeZone();
    const tomorrow = addDays(localDateAt(zone), 1);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: tomorrow, kind: "mow" }] });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).map((r) => `${r.channel} ${r.state}`)).toEqual(["sms scheduled"]);
    await optOut(ctx.db, c.customerId, "sms", "sms_keyword");
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).map((r) => `${r.channel} ${r.state}`)).toEqual(["email scheduled", "sms cancelled"]);
  });

  it("the worker skips a reminder whose channel was opted out after it was scheduled", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: today, kind: "mow" }], email: null });
    const id = await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone });
    await optOut(ctx.db, c.customerId, "sms", "sms_keyword");
    await testDispatcher(ctx.db, ctx.config).drain();
    expect(await ctx.db("reminders").where({ id }).first("state")).toEqual({ state: "skipped_opted_out" });
    expect((await ctx.fakes.listOutbox()).filter((m) => m.to === c.phone)).toEqual([]);
  });
});

describe("plan changes", () => {
  it("a watering step done early cancels that day's nudges; undoing it brings them back", async () => {
    const zone = daytimeZone();
    const tomorrow = addDays(localDateAt(zone), 1);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: tomorrow, times: ["12:00", "15:00"] }, { date: tomorrow, kind: "mow" }] });
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "sms", daily_time: "10:00", watering_nudges: true });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).map((r) => `${r.kind} ${r.local_time} ${r.state}`)).toEqual(["daily_summary 10:00 scheduled", "watering_nudge 12:00 scheduled", "watering_nudge 15:00 scheduled"]);

    await ctx.db("plan_steps").where({ plan_id: c.planId, kind: "water" }).update({ state: "done" });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).map((r) => `${r.kind} ${r.local_time} ${r.state}`)).toEqual(["daily_summary 10:00 scheduled", "watering_nudge 12:00 cancelled", "watering_nudge 15:00 cancelled"]);

    await ctx.db("plan_steps").where({ plan_id: c.planId, kind: "water" }).update({ state: "pending" });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).every((r) => r.state === "scheduled")).toBe(true);
  });

  it("a moved date moves its reminders, a cancelled plan cancels them all, and reconciling twice changes nothing", async () => {
    const zone = daytimeZone();
    const d1 = addDays(localDateAt(zone), 2);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: d1, kind: "mow" }] });
    await reconcilePlanReminders(ctx.db, c.planId);
    await ctx.db("plan_steps").where({ plan_id: c.planId }).update({ date: addDays(d1, 3) });
    await reconcilePlanReminders(ctx.db, c.planId);
    const moved = await remindersOf(c.planId);
    expect(moved.map((r) => `${r.local_date} ${r.state}`)).toEqual([`${d1} cancelled`, `${addDays(d1, 3)} scheduled`]);
    await reconcilePlanReminders(ctx.db, c.planId);
    expect(await remindersOf(c.planId)).toEqual(moved);

    await ctx.db("care_plans").where({ id: c.planId }).update({ status: "cancelled" });
    await reconcilePlanReminders(ctx.db, c.planId);
    expect((await remindersOf(c.planId)).every((r) => r.state === "cancelled")).toBe(true);
  });

  it("ticking a step off through the API runs the hook in the step's transaction", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: addDays(today, 1), times: ["12:00"] }] });
    await addSteps(ctx.db, c.planId, []);
    await ctx.db("notification_preferences").insert({ customer_id: c.customerId, channels: "sms", daily_time: "10:00", watering_nudges: true });
    await reconcilePlanReminders(ctx.db, c.planId);
    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    const step = await ctx.db("plan_steps").where({ plan_id: c.planId }).first<{ id: number }>("id");
    await marco.put(`/api/plans/${c.planId}/steps/${step!.id}/state`).send({ state: "done" }).expect(200);
    expect((await remindersOf(c.planId)).map((r) => r.state)).toEqual(["cancelled", "cancelled"]);
  });
});

describe("sending", () => {
  it("the first text says how to stop, later ones don't; e-mails carry one-click unsubscribe and the plan link", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: today, kind: "mow" }, { date: addDays(today, -1), kind: "mow" }] });
    const first = await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone });
    await testDispatcher(ctx.db, ctx.config).drain();
    await insertDueReminder(ctx.db, c, { localDate: addDays(today, -1), timeZone: zone });
    await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone, channel: "email" });
    await testDispatcher(ctx.db, ctx.config).drain();

    const texts = ctx.fakes.sms.messages().filter((m) => m.to === c.phone);
    expect(texts).toHaveLength(2);
    expect(texts[0]!.body).toMatch(/^Cobblefield Turf: .*Mow to 3\.5 in\. Plan: http:\/\/localhost:5999\/portal\/plan\/\d+ Reply STOP to stop, HELP for help\.$/);
    expect(texts[1]!.body).not.toContain("STOP");
    expect(await ctx.db("sms_intros").where({ customer_id: c.customerId }).first("reminder_id")).toEqual({ reminder_id: String(first) });

    const [email] = ctx.fakes.smtp.messages().filter((m) => m.envelopeTo.includes(c.email!));
    expect(email!.html).toContain(`/portal/plan/${c.planId}`);
    expect(email!.text).toContain(`/portal/plan/${c.planId}`);
    expect(email!.headers["list-unsubscribe-post"]).toBe("List-Unsubscribe=One-Click");
    expect(email!.listUnsubscribe).toMatch(/^<http:\/\/localhost:5999\/api\/unsubscribe\/email\?c=\d+&t=[\w-]+>, <mailto:unsubscribe@sproutline\.example\?subject=/);
    expect((await ctx.db("reminders").where({ customer_id: c.customerId }).select("state")).map((r) => r.state)).toEqual(["sent", "sent", "sent"]);
  });

  it("a permanent failure (invalid number) is not retried, falls back to e-mail, and is listed for staff", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, { timeZone: zone, steps: [{ date: today, kind: "mow" }], phone: "+13315550000" });
    const id = await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone });
    await testDispatcher(ctx.db, ctx.config).drain();
    const rows = await ctx.db("reminders").where({ customer_id: c.customerId }).orderBy("id").select("id", "channel", "state", "attempts", "last_error", "fallback_for");
    expect(rows).toMatchObject([
      { channel: "sms", state: "failed", attempts: 1, last_error: expect.stringContaining("21211") },
      { channel: "email", state: "sent", fallback_for: String(id) },
    ]);
    const dana = await signInStaff(ctx, "dana@cobblefield.example");
    const failed = await dana.get("/api/reminders/failed").expect(200);
    expect(failed.body.reminders).toContainEqual(expect.objectContaining({ id, channel: "sms", customerName: "Robin Tester", fallback: { channel: "email", state: "sent" } }));
  });
});
