import { spawn } from "node:child_process";
import { resolve } from "node:path";
import { describe, expect, it } from "vitest";
import { readFakesEnv } from "./main-config.ts";

const repoRoot = resolve(import.meta.dirname, "../..");
const tsx = resolve(repoRoot, "node_modules/.bin/tsx");

/** Runs main.ts as `npm run dev` would, collecting its output until it exits or `until` matches. */
function runMain(env: NodeJS.ProcessEnv, until?: RegExp): Promise<{ code: number | null; stdout: string; stderr: string; stop(): Promise<number | null> }> {
  const child = spawn(tsx, ["server/fakes/main.ts"], { cwd: repoRoot, env: { ...process.env, ...env }, stdio: ["ignore", "pipe", "pipe"] });
  let stdout = "";
  let stderr = "";
  const exited = new Promise<number | null>((done) => child.once("exit", (code) => done(code)));
  return new Promise((done, fail) => {
    const stop = async () => {
      child.kill("SIGTERM");
      return exited;
    };
    child.stdout.on("data", (chunk: Buffer) => {
      stdout += chunk.toString();
      if (until?.test(stdout)) done({ code: null, stdout, stderr, stop });
    });
    child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
    child.once("error", fail);
    void exited.then((code) => done({ code, stdout, stderr, stop }));
  });
}

describe("server/fakes/main.ts", () => {
  it("refuses to start when NODE_ENV=production", async () => {
    const result = await runMain({ NODE_ENV: "production", FAKE_SMS_PORT: "0", FAKE_SMTP_PORT: "0", FAKE_OAUTH_PORT: "0" });
    expect(result.code).toBe(1);
    expect(result.stderr).toMatch(/Refusing to start the local fakes: NODE_ENV is 'production'/);
    expect(result.stdout).toBe("");
  });

  it("starts with FAKE_* settings, prints where everything is, and stops on SIGTERM", async () => {
    const running = await runMain(
      { NODE_ENV: "development", FAKE_SMS_PORT: "0", FAKE_SMTP_PORT: "0", FAKE_OAUTH_PORT: "0", FAKE_OAUTH_ACCOUNTS: '[{"email":"a@b.example","name":"A B"}]' },
      /Outbox\s+http:\/\/127\.0\.0\.1:\d+\/__outbox/,
    );
    expect(running.code).toBeNull();
    const controlUrl = /Outbox\s+(http:\/\/127\.0\.0\.1:\d+)\/__outbox/.exec(running.stdout)![1]!;
    expect((await fetch(`${controlUrl}/__messages`)).status).toBe(200);
    expect(await running.stop()).toBe(0);
  });

  it("explains bad settings and exits 1", async () => {
    const result = await runMain({ NODE_ENV: "development", FAKE_SMS_PORT: "0", FAKE_SMTP_PORT: "0", FAKE_OAUTH_PORT: "0", FAKE_OAUTH_ACCOUNTS: "not json" });
    expect(result.code).toBe(1);
    expect(result.stderr).toContain("FAKE_OAUTH_ACCOUNTS");
  });
});

describe("readFakesEnv", () => {
  it("has defaults that match the app's own defaults", () => {
    const options = readFakesEnv({});
    expect(options.sms).toMatchObject({ port: 5181, accountSid: "AC00000000000000000000000000000000", authToken: "local-fake-auth-token", inboundWebhookUrl: null });
    expect(options.smtp).toEqual({ port: 5183 });
    expect(options.oauth).toMatchObject({ port: 5182, clientId: "sproutline-local-client", clientSecret: "sproutline-local-secret" });
    expect(options.oauth?.accounts?.length).toBeGreaterThan(1);
  });
});
