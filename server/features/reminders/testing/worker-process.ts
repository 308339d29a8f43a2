/**
 * The real worker process (`tsx server/worker.ts`) against a test context's database and
 * in-process fakes, for tests that kill it, restart it or run it through an outage.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { resolve } from "node:path";
import type { TestContext } from "../../../test/harness.ts";

const repoRoot = resolve(import.meta.dirname, "../../../..");

export type WorkerProcesses = {
  /** Starts a worker with these REMINDER_* settings; its output is appended to `output`. */
  start(settings: Record<string, string>, output: string[]): ChildProcess;
  /** SIGKILLs every worker still running (for afterAll). */
  killAll(): void;
};

export function workerProcesses(ctx: () => TestContext): WorkerProcesses {
  const children: ChildProcess[] = [];
  return {
    start(settings, output) {
      const { config, fakes } = ctx();
      const child = spawn(resolve(repoRoot, "node_modules/.bin/tsx"), ["server/worker.ts"], {
        cwd: repoRoot,
        env: {
          ...process.env,
          NODE_ENV: "test",
          // The tests read the worker's own lines (started, found at the provider…); tests are otherwise silent.
          LOG_LEVEL: "info",
          DATABASE_URL: config.DATABASE_URL,
          SESSION_SECRET: config.SESSION_SECRET,
          PUBLIC_URL: config.PUBLIC_URL,
          TWILIO_API_BASE_URL: fakes.smsUrl,
          SMTP_HOST: fakes.smtpHost,
          SMTP_PORT: String(fakes.smtpPort),
          REMINDER_STATUS_CALLBACKS: "false",
          // The tests' rows are not what the plans would schedule; a refresh would rightly cancel them.
          REMINDER_REFRESH_CRON: "off",
          REMINDER_REFRESH_ON_START: "false",
          ...settings,
        },
        stdio: ["ignore", "pipe", "pipe"],
        // Its own process group: tsx runs the script in a child node process, and a kill must reach that one too.
        detached: true,
      });
      child.stdout!.on("data", (d: Buffer) => output.push(d.toString()));
      child.stderr!.on("data", (d: Buffer) => output.push(d.toString()));
      children.push(child);
      return child;
    },
    killAll() {
      for (const child of children) {
        if (child.exitCode !== null || child.signalCode !== null) continue;
        try {
          process.kill(-child.pid!, "SIGKILL");
        } catch {
          // already gone
        }
      }
    },
  };
}

/** Signals the whole group (tsx and the node process running the worker), as a crash or `kill` of the service would. */
export const signalWorker = (child: ChildProcess, name: NodeJS.Signals) => process.kill(-child.pid!, name);

export const exited = (child: ChildProcess) =>
  new Promise<void>((r) => (child.exitCode !== null || child.signalCode !== null ? r() : child.once("exit", () => r())));
