import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createSmsSender } from "../../adapters/sms.ts";
import { createMessenger } from "../../messaging/create-messenger.ts";
import { ReminderDispatcher } from "./dispatcher.ts";
import { createSmsLookup } from "./sms-lookup.ts";
import { daytimeZone, eventually, fastSettings, manyDueReminders, sendsPerText, stateCounts, testDispatcher } from "./testing/fixtures.ts";

let ctx: TestContext;
beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => ctx.close());

describe("faults at the SMS provider", () => {
  it("with 30 % of requests failing and a rate limit, 500 due reminders are each delivered exactly once, by two workers at once", async () => {
    const zone = daytimeZone();
    const { ids, phones } = await manyDueReminders(ctx.db, 50, 10, zone, localDateAt(zone));
    ctx.fakes.sms.setFaults({ failureRate: 0.3, rateLimitPerSecond: 150 });
    const errors: unknown[] = [];
    const workers = [1, 2].map(() => testDispatcher(ctx.db, ctx.config, fastSettings({ REMINDER_CONCURRENCY: "25" }), (m, e) => errors.push(e ?? m)));
    try {
      workers.forEach((w) => w.start());
      await eventually(async () => (await stateCounts(ctx.db, ids)).sent === ids.length, 40_000, "all 500 reminders to be sent");
    } finally {
      await Promise.all(workers.map((w) => w.stop()));
      ctx.fakes.sms.setFaults({ failureRate: 0, rateLimitPerSecond: 0 });
    }
    const counts = sendsPerText(ctx.fakes.sms.messages(), phones);
    expect(counts.size).toBe(500);
    expect([...counts.values()].every((n) => n === 1)).toBe(true);
    // The faults really happened, and both workers did part of the work.
    const retries = workers.map((w) => w.counts.retry);
    expect(retries[0]! + retries[1]!).toBeGreaterThan(100);
    expect(workers.every((w) => w.counts.sent > 50)).toBe(true);
    expect(errors).toEqual([]);
    const rows = await ctx.db("reminders").whereIn("id", ids).select("provider_id", "attempts");
    expect(new Set(rows.map((r) => r.provider_id)).size).toBe(500);
  }, 60_000);

  it("a send that times out after the provider accepted it is found at the provider, not sent again", async () => {
    const zone = daytimeZone();
    const { ids, phones } = await manyDueReminders(ctx.db, 4, 5, zone, localDateAt(zone));
    // Every REST answer takes 400 ms; our client gives up after 150 ms, but the fake records the text anyway.
    ctx.fakes.sms.setFaults({ latencyMs: 400 });
    const settings = fastSettings({ REMINDER_SMS_TIMEOUT_MS: "150", REMINDER_IN_DOUBT_SETTLE_MS: "1000" });
    const sms = createSmsSender({ accountSid: ctx.config.TWILIO_ACCOUNT_SID, authToken: ctx.config.TWILIO_AUTH_TOKEN, from: ctx.config.TWILIO_FROM, apiBaseUrl: ctx.config.TWILIO_API_BASE_URL, timeoutMs: 150 });
    const messenger = { ...createMessenger(ctx.config), sendSms: async (m: { to: string; body: string }) => ({ providerId: (await sms.send(m)).sid }) };
    const worker = new ReminderDispatcher({ db: ctx.db, config: ctx.config, messenger, lookup: createSmsLookup(ctx.config), settings, log: () => {} });
    try {
      worker.start();
      await eventually(async () => (await stateCounts(ctx.db, ids)).sent === ids.length, 20_000, "all 20 reminders to be recorded as sent");
    } finally {
      await worker.stop();
      ctx.fakes.sms.setFaults({ latencyMs: 0 });
    }
    const counts = sendsPerText(ctx.fakes.sms.messages(), phones);
    expect(counts.size).toBe(20);
    expect([...counts.values()].every((n) => n === 1)).toBe(true);
    expect(worker.counts.retry).toBeGreaterThanOrEqual(20);
  }, 30_000);
});
