import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { ConfigError, KNOWN_EXAMPLE_SECRETS, loadConfig } from "./config.ts";

const repo = new URL("../", import.meta.url);
const production = (secret: string) => ({
  NODE_ENV: "production",
  DATABASE_URL: "postgres://x",
  SESSION_SECRET: secret,
  TWILIO_AUTH_TOKEN: "real",
  GOOGLE_CLIENT_SECRET: "real",
});
// Made up for this test, as `openssl rand -base64 36` would make one.
const strong = "q8W3zR1vN6tK0yB5mJ2xH9cL4pF7dS0aG3eU";

/**
 * Every SESSION_SECRET written anywhere in the repository: found in the files themselves, so a
 * development or test stack given a new secret is checked without anyone listing it here.
 */
function secretsWrittenInRepo(): string[] {
  const files = [".env.example", "scripts/lib/stack.ts", "server/test/harness.ts", "server/faults/server-process.ts", "bench/reminders.bench.ts", "bench/api.bench.ts"];
  const found = new Set<string>();
  for (const file of files) {
    const text = readFileSync(new URL(file, repo), "utf8");
    // `SESSION_SECRET: "…"` in code, `SESSION_SECRET=…` in env files.
    for (const m of text.matchAll(/SESSION_SECRET\s*(?::\s*"([^"]+)"|=(\S+))/g)) found.add((m[1] ?? m[2])!);
    for (const m of text.matchAll(/sessionSecret\s*=\s*"([^"]+)"/g)) found.add(m[1]!);
  }
  return [...found];
}

describe("production session secret", () => {
  it("accepts a long random secret", () => {
    expect(loadConfig(production(strong)).SESSION_SECRET).toBe(strong);
  });

  it("finds the secrets the repository's stacks use", () => {
    // The example file and the development stack at least; an empty list would make the next test pass on nothing.
    expect(secretsWrittenInRepo()).toEqual(expect.arrayContaining(["change-me-to-a-long-random-string", "sproutline-local-session-secret-not-for-production"]));
  });

  it.each([...new Set([...KNOWN_EXAMPLE_SECRETS, ...secretsWrittenInRepo()])])("refuses %s", (secret) => {
    expect(() => loadConfig(production(secret))).toThrow(ConfigError);
    expect(() => loadConfig(production(secret))).toThrow(/SESSION_SECRET/);
    // The same values stay fine outside production, where the stacks use them.
    expect(() => loadConfig({ ...production(secret), NODE_ENV: "test" })).not.toThrow();
  });

  it("refuses short, placeholder and repetitive secrets", () => {
    expect(() => loadConfig(production(strong.slice(0, 31)))).toThrow(/at least 32 characters/);
    expect(() => loadConfig(production("my-example-secret-for-the-readme-2026"))).toThrow(/placeholder/);
    expect(() => loadConfig(production("ab".repeat(20)))).toThrow(/too few different characters/);
  });
});
