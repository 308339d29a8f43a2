import { spawn, type ChildProcess } from "node:child_process";
import { resolve } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { createTestContext, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { daytimeZone, eventually, manyDueReminders, sendsPerText, stateCounts } from "./testing/fixtures.ts";

const repoRoot = resolve(import.meta.dirname, "../../..");
let ctx: TestContext;
const children: ChildProcess[] = [];

beforeAll(async () => {
  ctx = await createTestContext();
});
afterAll(async () => {
  for (const child of children) {
    try {
      process.kill(-child.pid!, "SIGKILL");
    } catch {
      // already gone
    }
  }
  await ctx.close();
});

/** The real worker process (`tsx server/worker.ts`) against the test database and the in-process fakes. */
function startWorker(output: string[]): ChildProcess {
  const child = spawn(resolve(repoRoot, "node_modules/.bin/tsx"), ["server/worker.ts"], {
    cwd: repoRoot,
    env: {
      ...process.env,
      NODE_ENV: "test",
      DATABASE_URL: ctx.config.DATABASE_URL,
      SESSION_SECRET: ctx.config.SESSION_SECRET,
      PUBLIC_URL: ctx.config.PUBLIC_URL,
      TWILIO_API_BASE_URL: ctx.fakes.smsUrl,
      SMTP_HOST: ctx.fakes.smtpHost,
      SMTP_PORT: String(ctx.fakes.smtpPort),
      REMINDER_POLL_MS: "100",
      REMINDER_CONCURRENCY: "10",
      REMINDER_LEASE_SECONDS: "2",
      REMINDER_RETRY_BASE_MS: "50",
      REMINDER_IN_DOUBT_SETTLE_MS: "300",
      REMINDER_STATUS_CALLBACKS: "false",
      // This test's rows are not what the plans would schedule; a refresh would rightly cancel them.
      REMINDER_REFRESH_CRON: "off",
      REMINDER_REFRESH_ON_START: "false",
    },
    stdio: ["ignore", "pipe", "pipe"],
    // Its own process group: tsx runs the script in a child node process, and a SIGKILL must reach that one too.
    detached: true,
  });
  child.stdout!.on("data", (d: Buffer) => output.push(d.toString()));
  child.stderr!.on("data", (d: Buffer) => output.push(d.toString()));
  children.push(child);
  return child;
}

/** Signals the whole group (tsx and the node process running the worker), as a crash or `kill` of the service would. */
const signal = (child: ChildProcess, name: NodeJS.Signals) => process.kill(-child.pid!, name);
const exited = (child: ChildProcess) => new Promise<void>((r) => (child.exitCode !== null || child.signalCode !== null ? r() : child.once("exit", () => r())));

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
