/**
 * Runs the whole product locally: PostgreSQL, the fakes of hosted services, the server,
 * the reminder worker and the inbound e-mail listener, each started here and stopped
 * again on Ctrl-C. Used by `npm start`, `npm run dev` and the browser tests.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { connect } from "node:net";
import { resolve } from "node:path";
import { createDb } from "../../server/db.ts";
import { demoStaff } from "../../seeds/data/demo-company.ts";
import { ensureDatabase, ensurePostgres, type PostgresCluster } from "./postgres.ts";
import { postgresPort, type StackPorts } from "./ports.ts";

const repoRoot = resolve(import.meta.dirname, "../..");

export type StackOptions = {
  nodeEnv: "development" | "test";
  ports: StackPorts;
  database: string;
  freshDatabase: boolean;
  apps: "built" | "vite";
  quiet?: boolean;
};

export type RunningStack = {
  appUrl: string;
  fakesControlUrl: string;
  databaseUrl: string;
  /** Where e-mail replies are delivered (SMTP on 127.0.0.1). */
  inboundSmtpPort: number;
  stop(): Promise<void>;
};

export const fakeOAuthAccounts = [
  ...demoStaff.map((s) => ({ email: s.email, name: s.name })),
  { email: "visitor@elsewhere.example", name: "Sam Outsider (not on staff)" },
];

function startChild(name: string, script: string, env: NodeJS.ProcessEnv, quiet: boolean): ChildProcess {
  // Node itself with tsx as a loader (not the tsx wrapper), so a signal or a kill reaches the process itself.
  const child = spawn(process.execPath, ["--import", "tsx", script], {
    cwd: repoRoot,
    env: { ...process.env, ...env },
    stdio: ["ignore", quiet ? "ignore" : "inherit", "inherit"],
  });
  child.on("exit", (code, signal) => {
    if (code !== 0 && signal === null && !stopping) process.stderr.write(`[${name}] exited with code ${code}\n`);
  });
  return child;
}

let stopping = false;

async function waitFor(url: string, what: string, timeoutMs = 60_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      const res = await fetch(url);
      if (res.status < 500) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${what} did not come up at ${url} within ${timeoutMs / 1000} s`);
}

async function waitForPort(port: number, what: string, timeoutMs = 30_000) {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const open = await new Promise<boolean>((done) => {
      const socket = connect(port, "127.0.0.1", () => {
        socket.destroy();
        done(true);
      });
      socket.on("error", () => done(false));
    });
    if (open) return;
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`${what} did not come up on port ${port} within ${timeoutMs / 1000} s`);
}

function stopChild(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
  return new Promise((done) => {
    const timer = setTimeout(() => child.kill("SIGKILL"), 8_000);
    child.once("exit", () => {
      clearTimeout(timer);
      done();
    });
    child.kill("SIGTERM");
  });
}

export async function prepareDatabase(cluster: PostgresCluster, database: string, fresh: boolean): Promise<string> {
  await ensureDatabase(cluster, database, { fresh });
  const url = cluster.url(database);
  const db = createDb(url);
  try {
    await db.migrate.latest();
    await db.seed.run();
  } finally {
    await db.destroy();
  }
  return url;
}

export async function startStack(options: StackOptions): Promise<RunningStack> {
  const { ports, quiet = false } = options;
  const cluster = await ensurePostgres({ port: postgresPort });
  const databaseUrl = await prepareDatabase(cluster, options.database, options.freshDatabase);

  const appUrl = `http://localhost:${ports.app}`;
  const fakesControlUrl = `http://127.0.0.1:${ports.sms}`;
  const shared = {
    NODE_ENV: options.nodeEnv,
    // Test stacks log only failures (silent would hide a server error behind a failing browser test).
    ...(options.nodeEnv === "test" ? { LOG_LEVEL: process.env.LOG_LEVEL ?? "error" } : {}),
    TWILIO_ACCOUNT_SID: "AC5f0a11ce5f0a11ce5f0a11ce5f0a11ce",
    TWILIO_AUTH_TOKEN: "local-fake-auth-token",
    GOOGLE_CLIENT_ID: "sproutline-local-client",
    GOOGLE_CLIENT_SECRET: "sproutline-local-secret",
  };
  const fakes = startChild("fakes", "server/fakes/main.ts", {
    ...shared,
    FAKE_SMS_PORT: String(ports.sms),
    FAKE_SMTP_PORT: String(ports.smtp),
    FAKE_OAUTH_PORT: String(ports.oauth),
    FAKE_SMS_ACCOUNT_SID: shared.TWILIO_ACCOUNT_SID,
    FAKE_SMS_AUTH_TOKEN: shared.TWILIO_AUTH_TOKEN,
    FAKE_SMS_INBOUND_WEBHOOK_URL: `${appUrl}/api/webhooks/sms/inbound`,
    FAKE_OAUTH_CLIENT_ID: shared.GOOGLE_CLIENT_ID,
    FAKE_OAUTH_CLIENT_SECRET: shared.GOOGLE_CLIENT_SECRET,
    FAKE_OAUTH_ACCOUNTS: JSON.stringify(fakeOAuthAccounts),
  }, quiet);
  await waitFor(`${fakesControlUrl}/__messages`, "the local fakes");

  const serverEnv = {
    ...shared,
    PORT: String(ports.app),
    PUBLIC_URL: appUrl,
    DATABASE_URL: databaseUrl,
    SESSION_SECRET: "sproutline-local-session-secret-not-for-production",
    SMTP_HOST: "127.0.0.1",
    SMTP_PORT: String(ports.smtp),
    TWILIO_API_BASE_URL: `http://127.0.0.1:${ports.sms}`,
    GOOGLE_AUTH_BASE_URL: `http://127.0.0.1:${ports.oauth}`,
    FAKES_CONTROL_URL: fakesControlUrl,
    INBOUND_SMTP_HOST: "127.0.0.1",
    INBOUND_SMTP_PORT: String(ports.inboundSmtp),
    SERVE_APPS: options.apps,
    // Browser tests follow a notice from the action to the outbox: gather for seconds, not minutes, and poll often.
    ...(options.nodeEnv === "test" && { NOTICE_GATHER_SECONDS: "1", REMINDER_POLL_MS: "500" }),
  };
  const server = startChild("server", "server/main.ts", serverEnv, quiet);
  await waitFor(`http://127.0.0.1:${ports.app}/api/health`, "the Sproutline server");
  // The reminder worker (server/worker.ts) runs beside the server with the same settings.
  const worker = startChild("worker", "server/worker.ts", serverEnv, quiet);
  // The inbound SMTP listener for e-mail replies (server/inbound-email.ts), also with the same settings.
  const inboundEmail = startChild("inbound-email", "server/inbound-email.ts", serverEnv, quiet);
  await waitForPort(ports.inboundSmtp, "the inbound e-mail listener");

  return {
    appUrl,
    fakesControlUrl,
    databaseUrl,
    inboundSmtpPort: ports.inboundSmtp,
    stop: async () => {
      stopping = true;
      await stopChild(inboundEmail);
      await stopChild(worker);
      await stopChild(server);
      await stopChild(fakes);
      if (cluster.startedHere) cluster.stop();
    },
  };
}
