import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addDays } from "#shared/engine/dates";
import { customerDetailSchema } from "#shared/schemas/customers";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";
import { savePreferences } from "../preferences/repo.ts";
import { reconcilePlanReminders } from "../reminders/reconcile.ts";

/**
 * The customer page shows when each reminder really goes out. The plan asks for a 06:00
 * watering nudge, but nothing is sent before 08:00 at the lawn, so the ledger holds it to 08:00
 * and the page must say 08:00, "held for quiet hours"; a noon nudge and a 09:00 summary go out
 * as asked.
 */
let ctx: TestContext;
let customerId: number;
let planDay: string;
let staff: Awaited<ReturnType<typeof signInStaff>>;

beforeAll(async () => {
  ctx = await createTestContext();
  const stamp = Date.now();
  const made = await createIsolatedCompany(ctx.db, `send-time-${stamp}`, [{ email: `tech-${stamp}@send.example`, role: "technician", name: "Tess Tech" }]);
  const owner = await createCustomer(ctx.db, made.companyId, { first: "Rhea", last: "Early" });
  customerId = owner.customerId;
  await savePreferences(ctx.db, customerId, { channels: "email", dailyTime: "09:00", wateringNudges: true, language: "en", units: "us" });
  planDay = addDays(localDateAt("America/New_York"), 3);
  const visit = await createVisit(ctx.db, owner.propertyId, null, addDays(planDay, -10), ["overseeding"]);
  const planId = await createHandMadePlan(ctx.db, owner.propertyId, visit, []);
  await ctx.db("plan_steps").insert({
    plan_id: planId, key: `water:${planDay}:1`, date: planDay, phase: "germination", kind: "water", title: "Water lightly",
    content: JSON.stringify({ detail: "Keep the seed moist.", times: ["06:00", "12:00"], why: { text: "t", source: "s", provenance: "common practice" }, cautions: [] }),
  });
  await reconcilePlanReminders(ctx.db, planId);
  staff = await signInStaff(ctx, `tech-${stamp}@send.example`);
});

afterAll(async () => {
  await ctx.close();
});

describe("reminders on the customer page", () => {
  it("show the time each one will really be sent on the lawn's clock, and which were held for quiet hours", async () => {
    const res = await staff.get(`/api/customers/${customerId}`).expect(200);
    const { reminders } = customerDetailSchema.parse(res.body);
    const shown = reminders
      .map((r) => ({ kind: r.kind, asked: r.localTime, sendDate: r.sendDate, sendTime: r.sendTime, held: r.heldForQuietHours, zone: r.timeZone }))
      .sort((a, b) => a.asked.localeCompare(b.asked));
    expect(shown).toEqual([
      { kind: "watering_nudge", asked: "06:00", sendDate: planDay, sendTime: "08:00", held: true, zone: "America/New_York" },
      { kind: "daily_summary", asked: "09:00", sendDate: planDay, sendTime: "09:00", held: false, zone: "America/New_York" },
      { kind: "watering_nudge", asked: "12:00", sendDate: planDay, sendTime: "12:00", held: false, zone: "America/New_York" },
    ]);
    // The real send time is the ledger's due time, not a second computation of it.
    const held = reminders.find((r) => r.localTime === "06:00")!;
    const row = await ctx.db("reminders").where({ id: held.id }).first<{ due_at: Date }>("due_at");
    expect(held.dueAt).toBe(row!.due_at.toISOString());
  });
});
