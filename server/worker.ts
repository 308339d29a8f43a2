/**
 * The reminder worker process: `tsx server/worker.ts`, with the server's own environment.
 *
 * - A ReminderDispatcher drains due reminders from the ledger (reminders table), as many workers
 *   side by side as you like: rows are claimed with SKIP LOCKED and a lease.
 * - pg-boss (same DATABASE_URL, schema "pgboss") runs the cluster-wide clock: an hourly
 *   "reminders-refresh" job (cron, created once however many workers run) that recomputes every
 *   active plan's reminders, and one at start-up.
 * - SIGTERM/SIGINT: stop claiming, let sends in flight finish and be recorded, stop pg-boss, exit 0.
 *   A SIGKILL loses nothing either: claimed rows come back when their lease runs out.
 */
import "dotenv/config";
import PgBoss from "pg-boss";
import { configOrExit, processLogging } from "./lib/process-start.ts";
import { createDb } from "./db.ts";
import { createMessenger } from "./messaging/create-messenger.ts";
import { createSmsSender } from "./adapters/sms.ts";
import type { Messenger } from "./messaging/messenger.ts";
import { ReminderDispatcher } from "./features/reminders/dispatcher.ts";
import { refreshActivePlans } from "./features/reminders/reconcile.ts";
import { loadReminderSettings } from "./features/reminders/settings.ts";
import { createSmsLookup } from "./features/reminders/sms-lookup.ts";

const { logger, log } = processLogging("worker");
const config = configOrExit(logger);
const settings = configOrExit(logger, loadReminderSettings);

const db = createDb(config.DATABASE_URL, { min: 0, max: Math.min(50, settings.REMINDER_CONCURRENCY + 5) });

// The server's messenger, with the worker's own SMS time-out (the lease must stay well above it).
const sms = createSmsSender({
  accountSid: config.TWILIO_ACCOUNT_SID,
  authToken: config.TWILIO_AUTH_TOKEN,
  from: config.TWILIO_FROM,
  apiBaseUrl: config.TWILIO_API_BASE_URL,
  timeoutMs: settings.REMINDER_SMS_TIMEOUT_MS,
});
const messenger: Messenger = { ...createMessenger(config), sendSms: async (m) => ({ providerId: (await sms.send(m)).sid }) };

const dispatcher = new ReminderDispatcher({
  db,
  config,
  messenger,
  lookup: createSmsLookup(config),
  settings,
  log,
});

const boss = new PgBoss({ connectionString: config.DATABASE_URL, schema: "pgboss", application_name: "sproutline-worker", max: 4 });
boss.on("error", (err) => log("pg-boss error", err));

const REFRESH = "reminders-refresh";
await boss.start();
// "stately": at most one refresh queued and one running, however many workers ask.
await boss.createQueue(REFRESH, { name: REFRESH, policy: "stately", retryLimit: 3, retryDelay: 30, retryBackoff: true });
if (settings.REMINDER_REFRESH_CRON === "off") await boss.unschedule(REFRESH);
else await boss.schedule(REFRESH, settings.REMINDER_REFRESH_CRON, {}, { tz: "UTC" });
await boss.work(REFRESH, async () => {
  const count = await refreshActivePlans(db);
  log(`refreshed reminders of ${count} active plans`);
  dispatcher.wakeUp();
});
if (settings.REMINDER_REFRESH_ON_START) await boss.send(REFRESH, {});

dispatcher.start();
log(`started: concurrency ${settings.REMINDER_CONCURRENCY}, poll ${settings.REMINDER_POLL_MS} ms, lease ${settings.REMINDER_LEASE_SECONDS} s`);

let stopping = false;
async function shutdown(signal: string) {
  if (stopping) return;
  stopping = true;
  log(`${signal}: finishing sends in flight, then stopping`);
  const force = setTimeout(() => process.exit(1), 30_000);
  force.unref();
  await dispatcher.stop();
  await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
  await db.destroy();
  log(`stopped (sent ${dispatcher.counts.sent}, retried ${dispatcher.counts.retry}, failed ${dispatcher.counts.failed})`);
  process.exit(0);
}
process.on("SIGTERM", () => void shutdown("SIGTERM"));
process.on("SIGINT", () => void shutdown("SIGINT"));
