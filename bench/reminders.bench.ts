/*
 * The morning burst: 20,000 reminders due at the same minute, drained by the reminder worker
 * (ReminderDispatcher: claim with SKIP LOCKED, freeze texts, send through the real twilio SDK, record
 * each outcome) into the fake SMS gateway running in its own process with no rate limit and no faults.
 * Run: npx tsx bench/reminders.bench.ts   (or npm run bench reminders)
 *
 * Baseline, measured in the same run against the same fake: the same number of plain HTTP POSTs to
 * the fake's Messages endpoint from a loop with the same concurrency (fetch, no database, no SDK).
 * The ratio is what the ledger (three or four statements per message, batched where possible) and
 * the SDK cost on top of the raw HTTP. Also reported: peak RSS of this process while draining, and an
 * exactly-once check counted at the fake.
 *
 * Database: BENCH_DATABASE_URL when set (it is migrated, and its reminders are replaced), otherwise a
 * fresh `sproutline_bench` on the project's own PostgreSQL cluster (created, migrated and seeded here).
 */
import { spawn, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { resolve } from "node:path";
import { ensurePostgres } from "../scripts/lib/postgres.ts";
import { prepareDatabase } from "../scripts/lib/stack.ts";
import { postgresPort } from "../scripts/lib/ports.ts";
import { createDb, type Db } from "../server/db.ts";
import { loadConfig } from "../server/config.ts";
import { createMessenger } from "../server/messaging/create-messenger.ts";
import { ReminderDispatcher } from "../server/features/reminders/dispatcher.ts";
import { loadReminderSettings } from "../server/features/reminders/settings.ts";
import { createSmsLookup } from "../server/features/reminders/sms-lookup.ts";
import { localDateAt } from "../server/lib/local-date.ts";

const REMINDERS = 20_000;
const CUSTOMERS = 200;
const CONCURRENCY = 50;
const ACCOUNT_SID = "AC00000000000000000000000000000000";
const AUTH_TOKEN = "local-fake-auth-token";
const repoRoot = resolve(import.meta.dirname, "..");

const say = (line: string) => process.stdout.write(`${line}\n`);
const cpuSeconds = (u: NodeJS.CpuUsage) => (u.user + u.system) / 1e6;

async function freePort(): Promise<number> {
  const server = createServer();
  await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
  const { port } = server.address() as { port: number };
  await new Promise((r) => server.close(r));
  return port;
}

/** The fakes in a process of their own, as in `npm start`, so their CPU is not ours. */
async function startFakes(): Promise<{ smsUrl: string; smtpPort: number; child: ChildProcess }> {
  const [sms, smtp, oauth] = [await freePort(), await freePort(), await freePort()];
  const child = spawn(resolve(repoRoot, "node_modules/.bin/tsx"), ["server/fakes/main.ts"], {
    cwd: repoRoot,
    env: { ...process.env, NODE_ENV: "development", FAKE_SMS_PORT: String(sms), FAKE_SMTP_PORT: String(smtp), FAKE_OAUTH_PORT: String(oauth) },
    stdio: ["ignore", "ignore", "inherit"],
    detached: true,
  });
  const smsUrl = `http://127.0.0.1:${sms}`;
  for (let i = 0; i < 200; i++) {
    if (await fetch(`${smsUrl}/__messages`).then((r) => r.ok, () => false)) return { smsUrl, smtpPort: smtp, child };
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error("the fake SMS gateway did not start");
}

/** A fixed-offset zone where it is early afternoon, so quiet hours let everything through. */
function daytimeZone(): string {
  let offset = 13 - new Date().getUTCHours();
  if (offset > 14) offset -= 24;
  if (offset < -12) offset += 24;
  return offset === 0 ? "Etc/UTC" : offset > 0 ? `Etc/GMT-${offset}` : `Etc/GMT+${-offset}`;
}

async function seedBurst(db: Db): Promise<string[]> {
  await db("reminders").delete();
  await db("sms_intros").delete();
  const zone = daytimeZone();
  const today = localDateAt(zone);
  const company = await db("companies").where({ slug: "cobblefield" }).first<{ id: number }>("id");
  const days = REMINDERS / CUSTOMERS;
  const dates = Array.from({ length: days }, (_, d) => {
    const t = new Date(`${today}T00:00:00Z`);
    t.setUTCDate(t.getUTCDate() + d);
    return t.toISOString().slice(0, 10);
  });
  const run = Date.now().toString(36);
  const phones: string[] = [];
  for (let i = 0; i < CUSTOMERS; i++) {
    const phone = `+1332${String(5_000_000 + ((Date.now() + i * 7919) % 4_000_000)).padStart(7, "0")}`;
    if (phone.endsWith("0000") || phone.endsWith("1111")) continue;
    const [user] = await db("users").insert({ company_id: company!.id, role: "customer", name: `Bench ${i}`, email: null, phone }).onConflict("phone").merge().returning<{ id: number }[]>("id");
    let customer = await db("customers").where({ user_id: user!.id }).first<{ id: number } | undefined>("id");
    if (!customer) [customer] = await db("customers").insert({ company_id: company!.id, user_id: user!.id, first_name: "Bench", last_name: String(i) }).returning<{ id: number }[]>("id");
    const [property] = await db("properties").insert({ customer_id: customer!.id, label: `Bench ${run}`, street: "1 Bench Way", town: "Wrenmoor", region: "OH", postal_code: "44990", time_zone: zone }).returning<{ id: number }[]>("id");
    const [visit] = await db("service_visits").insert({ property_id: property!.id, visit_date: today, services: ["overseeding"], details: "{}" }).returning<{ id: number }[]>("id");
    const [plan] = await db("care_plans").insert({ property_id: property!.id, visit_id: visit!.id, program_version: 1, input: "{}" }).returning<{ id: number }[]>("id");
    await db("plan_steps").insert(
      dates.flatMap((date) => [
        { plan_id: plan!.id, key: `bench:${date}:water`, date, phase: "germination", kind: "water", title: "Water the seeded areas lightly, 3 times", content: JSON.stringify({ detail: "Keep the top inch damp.", times: ["09:00", "12:00", "16:00"], minutesPerCycle: 6 }) },
        { plan_id: plan!.id, key: `bench:${date}:mow`, date, phase: "germination", kind: "mow", title: "Mow to 3.5 in if the grass is dry", content: JSON.stringify({ detail: "Sharp blade." }) },
      ]),
    );
    await db("reminders").insert(
      dates.map((date) => ({ customer_id: customer!.id, plan_id: plan!.id, kind: "daily_summary", local_date: date, local_time: "08:00", time_zone: zone, channel: "sms", due_at: db.fn.now(), next_attempt_at: db.fn.now() })),
    );
    phones.push(phone);
  }
  return phones;
}

/** The baseline: the same number of POSTs, same concurrency, straight at the fake's Messages endpoint. */
async function plainLoop(smsUrl: string, count: number): Promise<number> {
  const url = `${smsUrl}/2010-04-01/Accounts/${ACCOUNT_SID}/Messages.json`;
  const authorization = "Basic " + Buffer.from(`${ACCOUNT_SID}:${AUTH_TOKEN}`).toString("base64");
  let next = 0;
  const started = performance.now();
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      while (next < count) {
        const i = next++;
        // Numbers ending 0000 or 1111 are the fake's invalid and unreachable numbers.
        const n = 1_000_000 + i;
        const to = `+1333${/(0000|1111)$/.test(String(n)) ? n + 5 : n}`;
        const res = await fetch(url, {
          method: "POST",
          headers: { Authorization: authorization, "Content-Type": "application/x-www-form-urlencoded" },
          body: new URLSearchParams({ To: to, From: "+15005550006", Body: `Cobblefield Turf: Your lawn today, Tue, Dec 1: Water the seeded areas lightly, 3 times; Mow to 3.5 in if the grass is dry. Plan: http://localhost:5180/portal/plan/${i}` }),
        });
        if (res.status !== 201) throw new Error(`baseline POST answered ${res.status}`);
        await res.arrayBuffer();
      }
    }),
  );
  return (performance.now() - started) / 1000;
}

const bench = await (async () => {
  let databaseUrl = process.env.BENCH_DATABASE_URL;
  let cluster: Awaited<ReturnType<typeof ensurePostgres>> | undefined;
  if (!databaseUrl) {
    cluster = await ensurePostgres({ port: postgresPort });
    const suffix = (process.env.SPROUTLINE_DB_SUFFIX ?? "").replace(/[^a-z0-9_]/g, "");
    databaseUrl = await prepareDatabase(cluster, `sproutline_bench${suffix}`, true);
  }
  const db = createDb(databaseUrl, { min: 0, max: CONCURRENCY + 5 });
  await db.migrate.latest();
  const fakes = await startFakes();
  try {
    say(`seeding ${REMINDERS} reminders due now for ${CUSTOMERS} customers…`);
    const phones = await seedBurst(db);
    const expected = phones.length * (REMINDERS / CUSTOMERS);

    // Warm both sides (JIT, connections) before timing anything.
    await plainLoop(fakes.smsUrl, 1000);
    await fetch(`${fakes.smsUrl}/__messages`, { method: "DELETE" });
    const cpuBaseline = process.cpuUsage();
    const baselineSeconds = await plainLoop(fakes.smsUrl, expected);
    const baselineCpu = cpuSeconds(process.cpuUsage(cpuBaseline));
    await fetch(`${fakes.smsUrl}/__messages`, { method: "DELETE" });
    say(`baseline: ${expected} plain POSTs in ${baselineSeconds.toFixed(2)} s (${Math.round(expected / baselineSeconds)}/s)`);

    const config = loadConfig({ NODE_ENV: "test", DATABASE_URL: databaseUrl, SESSION_SECRET: "bench-session-secret-0123456789", TWILIO_API_BASE_URL: fakes.smsUrl, SMTP_PORT: String(fakes.smtpPort) });
    const settings = loadReminderSettings({ REMINDER_CONCURRENCY: String(CONCURRENCY), REMINDER_POLL_MS: "50", REMINDER_STATUS_CALLBACKS: "false" });
    const dispatcher = new ReminderDispatcher({ db, config, messenger: createMessenger(config), lookup: createSmsLookup(config), settings, log: (m, e) => say(`[worker] ${m} ${e ? String(e) : ""}`) });
    const rssBefore = process.memoryUsage().rss;
    let peakRss = rssBefore;
    const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 25);
    const cpuWorker = process.cpuUsage();
    const started = performance.now();
    const claimed = await dispatcher.drain();
    const workerCpu = cpuSeconds(process.cpuUsage(cpuWorker));
    const drainSeconds = (performance.now() - started) / 1000;
    clearInterval(sampler);
    peakRss = Math.max(peakRss, process.memoryUsage().rss);

    const { messages } = (await (await fetch(`${fakes.smsUrl}/__messages`)).json()) as { messages: { to: string; body: string; direction: string }[] };
    const perText = new Map<string, number>();
    for (const m of messages) if (m.direction === "outbound-api") perText.set(`${m.to}|${m.body}`, (perText.get(`${m.to}|${m.body}`) ?? 0) + 1);
    const exactlyOnce = perText.size === expected && [...perText.values()].every((n) => n === 1);
    const states = await db("reminders").groupBy("state").select("state", db.raw("count(*)::int as count"));
    say(`CPU of this process: worker ${workerCpu.toFixed(1)} s, baseline loop ${baselineCpu.toFixed(1)} s`);
    say(`worker: ${claimed} claimed, ${dispatcher.counts.sent} sent in ${drainSeconds.toFixed(2)} s (${Math.round(dispatcher.counts.sent / drainSeconds)}/s); states ${JSON.stringify(states)}`);
    say(`peak RSS while draining: ${(peakRss / 2 ** 20).toFixed(0)} MiB (before: ${(rssBefore / 2 ** 20).toFixed(0)} MiB); exactly once at the fake: ${exactlyOnce}`);

    return {
      name: "reminders",
      reminders: expected,
      concurrency: CONCURRENCY,
      drainSeconds: Number(drainSeconds.toFixed(2)),
      messagesPerSecond: Math.round(dispatcher.counts.sent / drainSeconds),
      baselineSeconds: Number(baselineSeconds.toFixed(2)),
      baselinePerSecond: Math.round(expected / baselineSeconds),
      ratio: Number((drainSeconds / baselineSeconds).toFixed(2)),
      // CPU of this process only (the fake runs in its own): what each side costs, whoever is the bottleneck.
      cpuSeconds: Number(workerCpu.toFixed(2)),
      baselineCpuSeconds: Number(baselineCpu.toFixed(2)),
      cpuRatio: Number((workerCpu / baselineCpu).toFixed(2)),
      peakRssMiB: Math.round(peakRss / 2 ** 20),
      rssGrowthMiB: Math.round((peakRss - rssBefore) / 2 ** 20),
      exactlyOnce,
    };
  } finally {
    try {
      process.kill(-fakes.child.pid!, "SIGTERM");
    } catch {
      // already gone
    }
    await db.destroy();
    if (cluster?.startedHere) cluster.stop();
  }
})();

say(JSON.stringify(bench));
process.exit(bench.exactlyOnce ? 0 : 1);
