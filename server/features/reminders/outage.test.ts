/**
 * Requirement: "SMS or SMTP fake down for a minute: reminders wait and go out afterwards, none lost,
 * none doubled."
 *
 * 1. End to end: the real worker process (`server/worker.ts`, as in worker-kill.test.ts) against the
 *    test database and the in-process fakes, with both fakes down, then both back. Counted at the fakes.
 * 2. Pure: with the production defaults, a 60 s outage cannot use up a reminder's attempts.
 */
import fc from "fast-check";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { loadReminderSettings, retryDelayMs, type ReminderSettings } from "./settings.ts";
import { exited, workerProcesses } from "./testing/worker-process.ts";
import { daytimeZone, eventually, manyDueRemindersOnBothChannels, receivedPerMessage, sendsPerText, stateCounts } from "./testing/fixtures.ts";

const ONE_MINUTE_MS = 60_000;

/** The production settings: the defaults, whatever the environment of this test run says. */
const production = loadReminderSettings({});

/**
 * How long a reminder can keep failing before its last allowed attempt, at the least favourable
 * jitter (equal jitter with random() = 0: every delay is half its ceiling). The worker never tries a
 * row before its next_attempt_at, and sends, polls and in-doubt settling only add to this.
 */
function shortestTimeToExhaust(settings: Pick<ReminderSettings, "REMINDER_RETRY_BASE_MS" | "REMINDER_RETRY_MAX_MS" | "REMINDER_MAX_ATTEMPTS">, jitter: (attempt: number) => number = () => 0): number {
  let total = 0;
  // The retry after attempt n waits retryDelayMs(n); after attempt MAX the reminder fails instead.
  for (let attempt = 1; attempt < settings.REMINDER_MAX_ATTEMPTS; attempt++) total += retryDelayMs(attempt, settings, () => jitter(attempt));
  return total;
}

describe("a one-minute provider outage with the production retry settings", () => {
  it("cannot use up a reminder's attempts: the retry delays before the last allowed attempt add up to more than 60 s", () => {
    const { REMINDER_RETRY_BASE_MS: base, REMINDER_RETRY_MAX_MS: max, REMINDER_MAX_ATTEMPTS: attempts } = production;
    const shortest = shortestTimeToExhaust(production);
    // Today: 5 s doubling, 8 attempts → 2.5 + 5 + 10 + 20 + 40 + 80 + 160 = 317.5 s at the least favourable jitter.
    expect(shortest, `base ${base} ms, max ${max} ms, ${attempts} attempts`).toBeGreaterThan(ONE_MINUTE_MS);
  });

  it("random() = 0 is the least favourable jitter: no other jitter makes any delay, or the total, shorter", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }), (attempt, random) => {
        expect(retryDelayMs(attempt, production, () => random)).toBeGreaterThanOrEqual(retryDelayMs(attempt, production, () => 0));
      }),
    );
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, maxExcluded: true, noNaN: true }), { minLength: 64, maxLength: 64 }), (jitters) => {
        expect(shortestTimeToExhaust(production, (attempt) => jitters[attempt % jitters.length]!)).toBeGreaterThanOrEqual(shortestTimeToExhaust(production));
      }),
    );
  });
});

/*
 * The end-to-end outage, scaled down 20× so the suite stays fast: the worker runs the production retry
 * policy with every duration divided by SCALE (REMINDER_RETRY_BASE_MS 5 s → 250 ms,
 * REMINDER_RETRY_MAX_MS 15 min → 45 s; REMINDER_MAX_ATTEMPTS unchanged, 8), and the outage lasts
 * 60 s / 20 = 3 s. Every retry wait keeps its proportion to the outage, so the worker goes through
 * what a production worker goes through in a one-minute outage: a reminder's attempts start at 0,
 * 0.125–0.25, 0.375–0.75, 0.875–1.75, 1.875–3.75, 3.875–7.75 s… after it first falls due (plus
 * queueing, poll and send time), so in 3 s each one fails 3 to 5 times, and none can reach its 8th
 * attempt (no sooner than 15.875 s).
 * The idle poll (production 15 s) is 100 ms rather than scaled: it only delays retries further
 * (more margin, not less) and would otherwise be most of the test's running time.
 *
 * A busy machine slows the worker's first passes over the batch (each attempt at the SMTP fake
 * takes ~100 ms: it waits before its greeting, as real servers do), so the outage lasts the scaled
 * minute *and* until every reminder has failed FAILED_ATTEMPTS_AT_LEAST times, up to the scaled two
 * minutes (OUTAGE_CAP_MS, still far below the 15.875 s needed to use up 8 attempts). On an idle
 * machine the two coincide (3 s); the test says so if the cap is ever reached rather than passing
 * without the outage having been felt.
 */
const SCALE = 20;
const OUTAGE_MS = ONE_MINUTE_MS / SCALE;
const OUTAGE_CAP_MS = (2 * ONE_MINUTE_MS) / SCALE;
const scaled = loadReminderSettings({
  REMINDER_RETRY_BASE_MS: String(production.REMINDER_RETRY_BASE_MS / SCALE),
  REMINDER_RETRY_MAX_MS: String(production.REMINDER_RETRY_MAX_MS / SCALE),
  REMINDER_MAX_ATTEMPTS: String(production.REMINDER_MAX_ATTEMPTS),
});
/** Failed attempts every reminder must have had before the providers come back: the outage was really felt. */
const FAILED_ATTEMPTS_AT_LEAST = 3;

/** 12 customers × 4 days × (SMS + e-mail) = 96 due reminders. */
const CUSTOMERS = 12;
const DAYS = 4;

type WaitingRow = { id: string; channel: string; state: string; attempts: number; last_error: string | null };

describe("the worker process through an outage of both providers", () => {
  let ctx: TestContext;
  const workers = workerProcesses(() => ctx);

  beforeAll(async () => {
    ctx = await createTestContext();
  });
  afterAll(async () => {
    workers.killAll();
    if (!ctx) return;
    ctx.fakes.sms.setFaults({ down: false });
    ctx.fakes.smtp.setDown(false);
    await ctx.close();
  });

  const startWorker = (output: string[]) =>
    workers.start(
      {
        REMINDER_POLL_MS: "100",
        REMINDER_CONCURRENCY: String(production.REMINDER_CONCURRENCY),
        REMINDER_LEASE_SECONDS: String(production.REMINDER_LEASE_SECONDS),
        REMINDER_RETRY_BASE_MS: String(scaled.REMINDER_RETRY_BASE_MS),
        REMINDER_RETRY_MAX_MS: String(scaled.REMINDER_RETRY_MAX_MS),
        REMINDER_MAX_ATTEMPTS: String(scaled.REMINDER_MAX_ATTEMPTS),
        REMINDER_IN_DOUBT_SETTLE_MS: String(production.REMINDER_IN_DOUBT_SETTLE_MS),
        REMINDER_SMS_TIMEOUT_MS: String(production.REMINDER_SMS_TIMEOUT_MS),
      },
      output,
    );

  it("holds every SMS and e-mail while both fakes are down, then sends each exactly once (counted at the fakes)", async ({ annotate }) => {
    const annotations: string[] = [];
    // The scaled outage, even at its cap, cannot use up 8 attempts (15.875 s at the least favourable jitter).
    expect(shortestTimeToExhaust(scaled)).toBeGreaterThan(OUTAGE_CAP_MS);

    const zone = daytimeZone();
    const { smsIds, emailIds, customerIds, phones, emails } = await manyDueRemindersOnBothChannels(ctx.db, CUSTOMERS, DAYS, zone, localDateAt(zone));
    const ids = [...smsIds, ...emailIds];
    expect(ids).toHaveLength(CUSTOMERS * DAYS * 2);
    // Parked until the worker is up, so the outage is measured from the moment they fall due.
    await ctx.db("reminders").whereIn("id", ids).update({ next_attempt_at: ctx.db.raw("now() + interval '1 hour'") });

    const delivered = () => ({ sms: sendsPerText(ctx.fakes.sms.messages(), phones), email: receivedPerMessage(ctx.fakes.smtp.messages(), emails) });
    const output: string[] = [];
    ctx.fakes.sms.setFaults({ down: true });
    ctx.fakes.smtp.setDown(true);
    try {
      const worker = startWorker(output);
      await eventually(async () => /"name":"worker".*"msg":"started: concurrency/.test(output.join("")), 30_000, "the worker to start");

      // t0: everything falls due while both providers are down.
      await ctx.db("reminders").whereIn("id", ids).update({ next_attempt_at: ctx.db.fn.now() });
      const outageStart = Date.now();
      let outageMs = 0;
      for (;;) {
        // Throughout the outage: nothing reaches anyone, nothing is given up on or counted as sent;
        // every reminder is waiting (scheduled for a retry) or in an attempt that is about to fail.
        const { sms, email } = delivered();
        expect(sms.size + email.size, "messages delivered while the providers were down").toBe(0);
        const now = await ctx.db("reminders").whereIn("id", ids).select<WaitingRow[]>("id", "channel", "state", "attempts", "last_error");
        expect(now.filter((r) => r.state !== "scheduled" && r.state !== "sending")).toEqual([]);
        outageMs = Date.now() - outageStart;
        const failedSoFar = Math.min(...now.map((r) => r.attempts - (r.state === "sending" ? 1 : 0)));
        if (outageMs >= OUTAGE_MS && failedSoFar >= FAILED_ATTEMPTS_AT_LEAST) break;
        if (outageMs > OUTAGE_CAP_MS) throw new Error(`after ${outageMs} ms of outage some reminder had failed only ${failedSoFar} times: the worker is far slower than expected`);
        await new Promise((r) => setTimeout(r, 100));
      }

      // At the end of the outage every reminder is waiting for a retry after provider errors.
      const waiting = await ctx.db("reminders").whereIn("id", ids).select<WaitingRow[]>("id", "channel", "state", "attempts", "last_error");
      const scheduled = waiting.filter((r) => r.state === "scheduled");
      expect(waiting.filter((r) => r.state !== "scheduled" && r.state !== "sending")).toEqual([]);
      expect(scheduled.length).toBeGreaterThan(ids.length / 2);
      for (const r of scheduled) {
        expect(r.attempts).toBeGreaterThanOrEqual(FAILED_ATTEMPTS_AT_LEAST);
        expect(r.last_error).toMatch(r.channel === "sms" ? /^SMS 503 \(20503\)/ : /^e-mail 421/);
      }
      annotations.push(`outage ${outageMs} ms`);

      // Both providers back.
      ctx.fakes.sms.setFaults({ down: false });
      ctx.fakes.smtp.setDown(false);
      const backAt = Date.now();
      await eventually(async () => (await stateCounts(ctx.db, ids)).sent === ids.length, 30_000, "every reminder to be sent after the outage");
      annotations.push(`all ${ids.length} sent ${Date.now() - backAt} ms after the providers came back`);

      process.kill(-worker.pid!, "SIGTERM");
      await exited(worker);
      expect(worker.exitCode).toBe(0);
    } catch (error) {
      throw new Error(`${String(error)}\nworker output:\n${output.join("")}`, { cause: error });
    } finally {
      ctx.fakes.sms.setFaults({ down: false });
      ctx.fakes.smtp.setDown(false);
    }

    // Counted at the fakes once the worker has stopped, so a late duplicate would show.
    const rows = await ctx.db("reminders")
      .whereIn("id", ids)
      .select<{ id: string; channel: string; state: string; attempts: number; provider_id: string; body: string }[]>("id", "channel", "state", "attempts", "provider_id", "body");
    expect(rows.filter((r) => r.state !== "sent")).toEqual([]);
    const { sms, email } = delivered();
    // None lost, none doubled: every (number, text) and every (address, Message-ID) exactly once.
    expect(sms.size).toBe(smsIds.length);
    expect([...sms.entries()].filter(([, n]) => n !== 1)).toEqual([]);
    expect(email.size).toBe(emailIds.length);
    expect([...email.entries()].filter(([, n]) => n !== 1)).toEqual([]);
    // …and they are these reminders: each SMS row owns the sid of its text, each e-mail carries its row's Message-ID.
    const smsBySid = new Map(ctx.fakes.sms.messages().map((m) => [m.sid, m]));
    const recipientOf = new Map<number, { phone: string; email: string }>(customerIds.map((id, i) => [id, { phone: phones[i]!, email: emails[i]! }]));
    const customerOf = new Map((await ctx.db("reminders").whereIn("id", ids).select<{ id: string; customer_id: number }[]>("id", "customer_id")).map((r) => [Number(r.id), r.customer_id]));
    for (const row of rows) {
      const to = recipientOf.get(customerOf.get(Number(row.id))!)!;
      if (row.channel === "sms") {
        expect(smsBySid.get(row.provider_id)).toMatchObject({ to: to.phone, body: row.body });
      } else {
        expect(row.provider_id).toBe(`<reminder-${row.id}@${new URL(ctx.config.PUBLIC_URL).hostname}>`);
        expect(email.get(`${to.email}|${row.provider_id}`)).toBe(1);
      }
    }
    // No fallback rows on the other channel: nothing was given up on.
    expect(await ctx.db("reminders").whereIn("customer_id", customerIds).count<{ count: string }[]>("* as count")).toEqual([{ count: String(ids.length) }]);

    // The outage was really felt: every reminder failed at least FAILED_ATTEMPTS_AT_LEAST times first
    // (its last attempt is the one that went through), and none came near the limit.
    const failedAttempts = rows.map((r) => r.attempts - 1);
    const spread = `failed attempts per reminder ${Math.min(...failedAttempts)}–${Math.max(...failedAttempts)}`;
    expect(Math.min(...failedAttempts), spread).toBeGreaterThanOrEqual(FAILED_ATTEMPTS_AT_LEAST);
    expect(Math.max(...failedAttempts), spread).toBeLessThan(scaled.REMINDER_MAX_ATTEMPTS - 1);
    await annotate([...annotations, spread].join("; "));
  }, 60_000);
});
