/**
 * API under load at the size of a busy company (50,000 homeowners, 3 million plan steps):
 * the homeowner's "today" request (spread over a thousand signed-in homeowners) and the
 * technician's question queue, signed in, against a
 * bare Express "hello" route in the same server process (ahead of all the app's middleware),
 * with autocannon on loopback.
 * Also prints EXPLAIN summaries of the hot queries at that size.
 */
import autocannon from "autocannon";
import { spawn } from "node:child_process";
import { resolve } from "node:path";
import { ensureDatabase, ensurePostgres } from "../scripts/lib/postgres.ts";
import { postgresPort } from "../scripts/lib/ports.ts";
import { createDb } from "../server/db.ts";
import { startFakes, fakeDefaults } from "../server/fakes/index.ts";
import { fakeOAuthAccounts } from "../scripts/lib/stack.ts";
import { benchSize, generateBenchData } from "./api/generate-data.ts";
import { benchHomeowners, sessionIdOf, staffCookie } from "./api/sign-in.ts";
import { explainSummary } from "./api/explain.ts";

const repoRoot = resolve(import.meta.dirname, "..");
const port = 5770;
const appUrl = `http://localhost:${port}`;
const connections = 100;
const durationSeconds = Number(process.env.BENCH_SECONDS ?? 10);
const spreadOver = 1000;
const sessionSecret = "bench-session-secret-0123456789abcdef";

const cluster = await ensurePostgres({ port: postgresPort });
await ensureDatabase(cluster, "sproutline_bench_api");
const databaseUrl = cluster.url("sproutline_bench_api");
let db = createDb(databaseUrl);

/** Generating 3M rows takes minutes: reuse the data of an earlier run when the schema is unchanged. */
async function reusableData(): Promise<boolean> {
  const [, pending] = (await db.migrate.list()) as [unknown[], unknown[]];
  if (pending.length > 0 || !(await db.schema.hasTable("plan_steps"))) return false;
  const count = Number((await db("plan_steps").count<{ count: string }[]>("* as count"))[0]!.count);
  return count >= benchSize.customers * benchSize.stepsPerPlan;
}

let started = Date.now();
let generationSeconds = 0;
if (process.env.BENCH_FRESH_DATA === "1" || !(await reusableData())) {
  await db.destroy();
  await ensureDatabase(cluster, "sproutline_bench_api", { fresh: true });
  db = createDb(databaseUrl);
  await db.migrate.latest();
  await db.seed.run();
  const seededCompany = await db("companies").orderBy("id").first<{ id: number }>("id");
  await generateBenchData(db, seededCompany!.id);
  generationSeconds = (Date.now() - started) / 1000;
} else {
  console.log("reusing the data of an earlier run (BENCH_FRESH_DATA=1 to regenerate)");
}
const company = await db("companies").orderBy("id").first<{ id: number }>("id");
const stepCount = Number((await db("plan_steps").count<{ count: string }[]>("* as count"))[0]!.count);
console.log(`data: ${benchSize.customers} homeowners, ${stepCount} plan steps${generationSeconds ? `, generated in ${generationSeconds.toFixed(0)} s` : ""}`);

const fakes = await startFakes({ oauth: { accounts: fakeOAuthAccounts } });
// BENCH_PROFILE_DIR=/some/dir writes a CPU profile of the server under load there, to see where the time goes.
const profile = process.env.BENCH_PROFILE_DIR ? ["--cpu-prof", `--cpu-prof-dir=${process.env.BENCH_PROFILE_DIR}`] : [];
const server = spawn(process.execPath, ["--import", "tsx", ...profile, "bench/api/server.ts"], {
  cwd: repoRoot,
  stdio: ["ignore", "pipe", "inherit"],
  env: {
    ...process.env,
    NODE_ENV: "test",
    PORT: String(port),
    PUBLIC_URL: appUrl,
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: sessionSecret,
    SMTP_HOST: fakes.smtpHost,
    SMTP_PORT: String(fakes.smtpPort),
    TWILIO_API_BASE_URL: fakes.smsUrl,
    TWILIO_ACCOUNT_SID: fakeDefaults.smsAccountSid,
    GOOGLE_AUTH_BASE_URL: fakes.oauthUrl,
    FAKES_CONTROL_URL: fakes.controlUrl,
    TRUST_PROXY: "1",
  },
});
await new Promise<void>((ready) => server.stdout!.on("data", (d: Buffer) => d.toString().includes("ready") && ready()));

try {
  // A thousand homeowners, each opening their own plan, as a busy morning looks.
  const homeowners = await benchHomeowners(db, sessionSecret, spreadOver);
  const todayOf = (h: (typeof homeowners)[number]) => ({ path: `/api/plans/${h.planId}/today`, cookie: h.cookie });
  const first = todayOf(homeowners[0]!);
  const firstAnswer = await fetch(`${appUrl}${first.path}`, { headers: { cookie: first.cookie } });
  if (firstAnswer.status !== 200) throw new Error(`a bench homeowner's Today answered ${firstAnswer.status}`);
  const technician = await staffCookie(appUrl, fakes, "marco@cobblefield.example");
  const queuePath = "/api/questions/open";
  const queueOk = (await fetch(`${appUrl}${queuePath}`, { headers: { cookie: technician } })).status === 200;

  type Target = { path: string; cookie?: string };
  // As a browser asks, so the server's compression decisions cost what they cost for real visitors.
  const browserHeaders = { "accept-encoding": "gzip, deflate, br, zstd", accept: "application/json" };
  /** Each request goes to the next target in turn; the baseline goes through the same per-request set-up. */
  const load = async (name: string, targets: Target[], atOnce = connections) => {
    let turn = 0;
    const requests = [
      {
        setupRequest: (req: autocannon.Request) => {
          const { path, cookie } = targets[turn++ % targets.length]!;
          return { ...req, path, headers: { ...req.headers, ...browserHeaders, ...(cookie ? { cookie } : {}) } };
        },
      },
    ];
    // Warm up, then measure.
    await autocannon({ url: appUrl, connections: 10, duration: 2, requests });
    const r = await autocannon({ url: appUrl, connections: atOnce, duration: durationSeconds, requests });
    const path = targets.length === 1 ? targets[0]!.path : `${targets[0]!.path} and ${targets.length - 1} more`;
    const result = { name, path, connections: atOnce, requestsPerSecond: Math.round(r.requests.average), p50Ms: r.latency.p50, p99Ms: r.latency.p99, non2xx: r.non2xx, errors: r.errors };
    console.log(`${name}: ${result.requestsPerSecond} req/s, p50 ${result.p50Ms} ms, p99 ${result.p99Ms} ms, non-2xx ${result.non2xx}, errors ${result.errors}`);
    return result;
  };
  started = Date.now();
  const hello = await load("bare Express hello (baseline)", homeowners.map((h) => ({ path: "/bench/hello", cookie: h.cookie })));
  const today = await load(`homeowner today, ${homeowners.length} homeowners`, homeowners.map(todayOf));
  // BENCH_TODAY_ONLY=1 skips the queue, e.g. to profile the Today request alone.
  const withQueue = queueOk && process.env.BENCH_TODAY_ONLY !== "1";
  const queue = withQueue ? await load("technician question queue", [{ path: queuePath, cookie: technician }]) : null;
  // A busy company has tens of technicians, not a hundred at once: the queue at a size it meets.
  const queueTen = withQueue ? await load("technician question queue, 10 at once", [{ path: queuePath, cookie: technician }], 10) : null;

  const planId = homeowners[0]!.planId;
  const customer = await db("care_plans").join("properties", "properties.id", "care_plans.property_id").where("care_plans.id", planId).first<{ customer_id: number }>("properties.customer_id");
  const explains = await explainSummary(db, { planId, companyId: company!.id, customerId: customer!.customer_id, sessionId: sessionIdOf(first.cookie) });
  for (const e of explains) console.log(`EXPLAIN ${e.name}: ${e.summary}`);

  const ratio = (x: number) => Number((x / hello.requestsPerSecond).toFixed(2));
  console.log(
    JSON.stringify({
      name: "api",
      homeowners: benchSize.customers,
      planSteps: stepCount,
      connections,
      durationSeconds,
      dataGenerationSeconds: Math.round(generationSeconds),
      baseline: hello,
      today: { ...today, throughputRatioToBaseline: ratio(today.requestsPerSecond), meetsThroughputTarget: ratio(today.requestsPerSecond) >= 0.35, meetsP99Target: today.p99Ms < 50 },
      queue: queue ? { ...queue, throughputRatioToBaseline: ratio(queue.requestsPerSecond) } : queueOk ? "not measured" : "queue endpoint not available",
      queueTenConnections: queueTen ?? (queueOk ? "not measured" : "queue endpoint not available"),
      explain: explains,
    }),
  );
} finally {
  server.kill("SIGTERM");
  await fakes.stop();
  await db.destroy();
}
