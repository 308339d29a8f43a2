import { afterAll, beforeAll, beforeEach, describe, expect, it } from "vitest";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createCustomerWithPlan, daytimeZone, insertDueReminder, testDispatcher } from "./testing/fixtures.ts";

/*
 * On a slope every watering is split into short runs (shared/engine/rules/slopes.ts). Homeowners get one
 * reminder per watering, at its first run, that names the runs: not a text for every run.
 */

let ctx: TestContext;

beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());
beforeEach(async () => {
  await ctx.fakes.clearOutbox();
});

type Content = { times?: string[]; cycleAndSoak?: { runsPerCycle: number; cycleStarts: string[] } };

describe("watering reminders on a sloped lawn", () => {
  it("a steep lawn's plan stores each watering's first run, and nudges come only then", async () => {
    const marco = await signInStaff(ctx, "marco@cobblefield.example");
    const property = await ctx.db("properties")
      .join("customers", "customers.id", "properties.customer_id")
      .where("customers.external_ref", "C-1007")
      .first<{ id: number; customer_id: number }>("properties.id", "properties.customer_id");
    const today = localDateAt("America/New_York");
    // A first frost still weeks away, so the plan waters whatever month the suite runs in.
    await ctx.db("properties").where({ id: property!.id }).update({ lawn: ctx.db.raw("lawn || ?::jsonb", [JSON.stringify({ expectedFirstFrost: addDays(today, 50) })]) });
    await ctx.db("notification_preferences")
      // Summaries in the evening, so a 06:00 watering's nudge, held to 08:00, is not folded into the summary.
      .insert({ customer_id: property!.customer_id, channels: "sms", daily_time: "18:00", watering_nudges: true })
      .onConflict("customer_id")
      .merge();
    const { planId } = (
      await marco
        .post("/api/visits")
        .send({ propertyId: property!.id, visit: { date: addDays(today, 1), services: ["sod_installation"], areaFt2: 3600, products: [] }, lawn: { slope: "steep" } })
        .expect(201)
    ).body as { planId: number };

    const steps = await ctx.db("plan_steps").where({ plan_id: planId, kind: "water" }).select<{ date: string; content: Content }[]>("date", "content");
    const split = steps.filter((s) => s.content.cycleAndSoak && (s.content.times?.length ?? 0) > 1);
    expect(split.length).toBeGreaterThan(0);
    const startsOn = new Map<string, Set<string>>();
    const runsOn = new Map<string, Set<string>>();
    for (const s of split) {
      const { cycleStarts, runsPerCycle } = s.content.cycleAndSoak!;
      expect(cycleStarts.length).toBeGreaterThan(0);
      expect(cycleStarts.every((t) => s.content.times!.includes(t))).toBe(true);
      expect(s.content.times!.length).toBeLessThanOrEqual(cycleStarts.length * runsPerCycle);
      startsOn.set(s.date, new Set([...(startsOn.get(s.date) ?? []), ...cycleStarts]));
      runsOn.set(s.date, new Set([...(runsOn.get(s.date) ?? []), ...s.content.times!]));
    }

    // The plan as the API serves it carries the same, for the portal's step cards.
    const { plan } = (await marco.get(`/api/plans/${planId}`).expect(200)).body as { plan: { steps: ({ kind: string } & Content)[] } };
    expect(plan.steps.some((s) => s.kind === "water" && (s.cycleAndSoak?.cycleStarts.length ?? 0) > 0)).toBe(true);

    const nudges = await ctx.db("reminders").where({ plan_id: planId, kind: "watering_nudge" }).select<{ local_date: string; local_time: string }[]>("local_date", "local_time");
    const onSplitDays = nudges.filter((n) => runsOn.has(n.local_date)).map((n) => `${n.local_date} ${n.local_time}`);
    // Exactly one nudge per watering, at its first run (before: one per run, four a morning).
    const expected = [...startsOn].flatMap(([date, starts]) => [...starts].map((t) => `${date} ${t}`));
    expect(onSplitDays.sort()).toEqual(expected.sort());
    expect(expected.length).toBeLessThan([...runsOn.values()].reduce((n, runs) => n + runs.size, 0));
  });

  it("the nudge text names the watering's runs and pauses; a nudge left at a later run's time sends nothing", async () => {
    const zone = daytimeZone();
    const today = localDateAt(zone);
    const c = await createCustomerWithPlan(ctx.db, {
      timeZone: zone,
      email: null,
      steps: [
        {
          date: today,
          minutesPerCycle: 2,
          times: ["13:00", "13:32", "14:04", "14:36"],
          cycleAndSoak: { runsPerCycle: 4, soakMinutes: 30, minutesBefore: 8, cycleStarts: ["13:00"] },
        },
      ],
    });
    await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone, kind: "watering_nudge", localTime: "13:00" });
    // As an older schedule might still hold: a nudge at the second run.
    const stale = await insertDueReminder(ctx.db, c, { localDate: today, timeZone: zone, kind: "watering_nudge", localTime: "13:32" });
    await testDispatcher(ctx.db, ctx.config).drain();

    const texts = ctx.fakes.sms.messages().filter((m) => m.to === c.phone);
    expect(texts).toHaveLength(1);
    expect(texts[0]!.body).toContain("Watering time (1:00 pm). Water in 4 short runs of about 2 min each zone or spot, with 30-min pauses so it soaks in: 1:00 pm, 1:32 pm, 2:04 pm, 2:36 pm.");
    expect(await ctx.db("reminders").where({ id: stale }).first("state", "last_error")).toEqual({ state: "cancelled", last_error: "nothing left to do that day" });
  });
});
