/**
 * Runs the real server as its own process against a PostgreSQL cluster of its own,
 * for fault tests that stop the database or signal the process.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { resolve } from "node:path";
import { ensureDatabase, ensurePostgres, type PostgresCluster } from "../../scripts/lib/postgres.ts";
import { createDb } from "../db.ts";
import { startFakes, type RunningFakes } from "../fakes/index.ts";

const repoRoot = resolve(import.meta.dirname, "../..");

export type ServerUnderTest = {
  url: string;
  cluster: PostgresCluster;
  fakes: RunningFakes;
  process: ChildProcess;
  exited: Promise<number | null>;
  /** What the server wrote to stderr so far, to explain a failure. */
  stderr(): string;
  stop(): Promise<void>;
};

export async function startServerProcess(options: { clusterName: string; pgPort: number; appPort: number }): Promise<ServerUnderTest> {
  const cluster = await ensurePostgres({ name: options.clusterName, port: options.pgPort });
  await ensureDatabase(cluster, "sproutline_faults", { fresh: true });
  const databaseUrl = cluster.url("sproutline_faults");
  const db = createDb(databaseUrl);
  await db.migrate.latest();
  await db.seed.run();
  await db.destroy();

  const fakes = await startFakes();
  const url = `http://127.0.0.1:${options.appPort}`;
  // Node itself with tsx as a loader (not the tsx wrapper), so signals reach the server directly.
  const child = spawn(process.execPath, ["--import", "tsx", "server/main.ts"], {
    cwd: repoRoot,
    stdio: ["ignore", "ignore", "pipe"],
    env: {
      ...process.env,
      NODE_ENV: "test",
      PORT: String(options.appPort),
      PUBLIC_URL: url,
      DATABASE_URL: databaseUrl,
      SESSION_SECRET: "fault-tests-session-secret-0123456789",
      SMTP_HOST: fakes.smtpHost,
      SMTP_PORT: String(fakes.smtpPort),
      TWILIO_API_BASE_URL: fakes.smsUrl,
      GOOGLE_AUTH_BASE_URL: fakes.oauthUrl,
      FAKES_CONTROL_URL: fakes.controlUrl,
      SERVE_APPS: "none",
      // Failures only (the test's default is silent): they explain a failing fault test.
      LOG_LEVEL: "error",
    },
  });
  let stderr = "";
  child.stderr!.on("data", (d: Buffer) => (stderr += d.toString()));
  const exited = new Promise<number | null>((done) => child.on("exit", (code) => done(code)));
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (Date.now() > deadline) throw new Error(`server did not start:\n${stderr}`);
    const ok = await fetch(`${url}/api/health`).then((r) => r.ok, () => false);
    if (ok) break;
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    cluster,
    fakes,
    process: child,
    exited,
    stderr: () => stderr,
    stop: async () => {
      if (child.exitCode === null) {
        child.kill("SIGKILL");
        await exited;
      }
      await fakes.stop();
      cluster.stop();
    },
  };
}

/** Signs a homeowner in over HTTP and returns the session cookie. */
export async function signInOverHttp(server: ServerUnderTest, email: string): Promise<string> {
  const headers = { "content-type": "application/json", origin: server.url };
  const requested = await fetch(`${server.url}/api/auth/link`, { method: "POST", headers, body: JSON.stringify({ contact: email }) });
  if (requested.status !== 202) throw new Error(`sign-in link request answered ${requested.status}: ${await requested.text()}`);
  let link: string | undefined;
  for (let i = 0; i < 100 && !link; i++) {
    link = (await server.fakes.listOutbox()).find((m) => m.to === email)?.links[0];
    if (!link) await new Promise((r) => setTimeout(r, 50));
  }
  if (!link) throw new Error(`no sign-in link reached ${email}`);
  const token = new URL(link).searchParams.get("token");
  const res = await fetch(`${server.url}/api/auth/link/consume`, { method: "POST", headers, body: JSON.stringify({ token }) });
  return res.headers.get("set-cookie")!.split(";")[0]!;
}
