/**
 * `npm run e2e -- [playwright args]`: builds the apps, starts the stack on the test ports with a fresh
 * browser-test database, and runs the given browser tests (all of them without arguments). For working
 * on one spec without the whole `npm test`.
 */
import { ensurePostgres } from "./lib/postgres.ts";
import { ensureChromium } from "./lib/chromium.ts";
import { databases, postgresPort, testPorts } from "./lib/ports.ts";
import { startStack } from "./lib/stack.ts";
import { run } from "./lib/run.ts";

const cluster = await ensurePostgres({ port: postgresPort });
ensureChromium();
let code = await run("vite", ["build", "--logLevel", "warn"]);
if (code === 0) {
  const stack = await startStack({ nodeEnv: "test", ports: testPorts, database: databases.browserTests, freshDatabase: true, apps: "built", quiet: true });
  try {
    code = await run("playwright", ["test", ...process.argv.slice(2)], { E2E_BASE_URL: stack.appUrl, E2E_FAKES_URL: stack.fakesControlUrl, E2E_DATABASE_URL: stack.databaseUrl });
  } finally {
    await stack.stop();
  }
}
if (cluster.startedHere) cluster.stop();
process.exit(code);
