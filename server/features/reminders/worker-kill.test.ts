import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { daytimeZone, eventually, manyDueReminders, sendsPerText, stateCounts } from "./testing/fixtures.ts";
import { exited, signalWorker as signal, workerProcesses } from "./testing/worker-process.ts";

let ctx: TestContext;
const workers = workerProcesses(() => ctx);

beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  workers.killAll();
  await ctx.close();
});

const startWorker = (output: string[]) =>
  workers.start(
    { REMINDER_POLL_MS: "100", REMINDER_CONCURRENCY: "10", REMINDER_LEASE_SECONDS: "2", REMINDER_RETRY_BASE_MS: "50", REMINDER_IN_DOUBT_SETTLE_MS: "300" },
    output,
  );

describe("the worker process", () => {
  it("killed mid-batch and started again, loses no reminder and sends none twice (counted at the fake)", async () => {
    const zone = daytimeZone();
    const { ids, phones } = await manyDueReminders(ctx.db, 20, 10, zone, localDateAt(zone));
    // Slow answers keep ten sends in flight at any moment, so the kill lands between "accepted" and "recorded".
    ctx.fakes.sms.setFaults({ latencyMs: 150 });
    const output: string[] = [];
    try {
      const first = startWorker(output);
      // Killed only while the fake holds some of its requests: those texts are accepted but not yet answered.
      await eventually(
        async () => sendsPerText(ctx.fakes.sms.messages(), phones).size >= 40 && ctx.fakes.sms.requestsInLatency() > 0,
        30_000,
        "the first worker to get going with texts held at the fake",
      );
      signal(first, "SIGKILL");
      await exited(first);
      const atKill = await stateCounts(ctx.db, ids);
      expect(atKill.sending ?? 0).toBeGreaterThan(0);
      expect(atKill.sent ?? 0).toBeLessThan(ids.length);

      const second = startWorker(output);
      await eventually(async () => (await stateCounts(ctx.db, ids)).sent === ids.length, 40_000, "every reminder to be sent after the restart");
      signal(second, "SIGTERM");
      await exited(second);
      expect(second.exitCode).toBe(0);
    } catch (error) {
      throw new Error(`${String(error)}\nworker output:\n${output.join("")}`);
    } finally {
      ctx.fakes.sms.setFaults({ latencyMs: 0 });
    }
    const counts = sendsPerText(ctx.fakes.sms.messages(), phones);
    expect(counts.size).toBe(ids.length);
    expect([...counts.entries()].filter(([, n]) => n !== 1)).toEqual([]);
    // Some texts the killed worker had handed over were found at the provider rather than sent again.
    expect(output.join("")).toMatch(/found at the provider after an interrupted attempt/);
  }, 60_000);
});
