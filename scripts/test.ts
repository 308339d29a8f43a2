/**
 * `npm test`: every check, from a fresh clone. Sets up PostgreSQL and Chromium when
 * missing, then runs typecheck, lint, unit and API tests, and browser tests.
 * Exits non-zero when any step fails; later steps still run so one report shows all.
 */
import { ensurePostgres } from "./lib/postgres.ts";
import { ensureChromium } from "./lib/chromium.ts";
import { databases, postgresPort, testPorts } from "./lib/ports.ts";
import { startStack } from "./lib/stack.ts";
import { run } from "./lib/run.ts";

const results: { step: string; ok: boolean; seconds: number }[] = [];
async function step(name: string, body: () => Promise<number>) {
  process.stdout.write(`\n=== ${name}\n`);
  const started = Date.now();
  let code: number;
  try {
    code = await body();
  } catch (err) {
    process.stderr.write(`${err instanceof Error ? err.stack : String(err)}\n`);
    code = 1;
  }
  results.push({ step: name, ok: code === 0, seconds: (Date.now() - started) / 1000 });
}

const cluster = await ensurePostgres({ port: postgresPort });
ensureChromium();

await step("typecheck", () => run("tsc", ["-p", "tsconfig.json", "--noEmit"]));
await step("lint", () => run("eslint", [".", "--max-warnings=0"]));
await step("unit and API tests (vitest)", () => run("vitest", ["run"]));
await step("build", () => run("vite", ["build", "--logLevel", "warn"]));
await step("browser tests (playwright)", async () => {
  const stack = await startStack({ nodeEnv: "test", ports: testPorts, database: databases.browserTests, freshDatabase: true, apps: "built", quiet: true });
  try {
    return await run("playwright", ["test"], { E2E_BASE_URL: stack.appUrl, E2E_FAKES_URL: stack.fakesControlUrl, E2E_DATABASE_URL: stack.databaseUrl });
  } finally {
    await stack.stop();
  }
});

if (cluster.startedHere) cluster.stop();

process.stdout.write("\n=== summary\n");
for (const r of results) process.stdout.write(`${r.ok ? "ok  " : "FAIL"}  ${r.step} (${r.seconds.toFixed(1)} s)\n`);
const failed = results.filter((r) => !r.ok).length;
process.stdout.write(`\n${results.length - failed} passed, ${failed} failed\n`);
process.exit(failed ? 1 : 0);
