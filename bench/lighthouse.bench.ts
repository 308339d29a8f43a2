/**
 * Lighthouse (v12) performance and accessibility scores of the portal's Today screen on
 * mobile emulation, signed in, with Debian's Chromium; the bare-stack baseline app
 * (bench/baseline-app) is scored in the same run for comparison.
 */
import lighthouse from "lighthouse";
import * as chromeLauncher from "chrome-launcher";
import compression from "compression";
import express from "express";
import { createServer } from "node:http";
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { build } from "vite";
import react from "@vitejs/plugin-react";
import { startStack } from "../scripts/lib/stack.ts";
import { run } from "../scripts/lib/run.ts";
import { homeownerCookie } from "./api/sign-in.ts";
import { startFakes } from "../server/fakes/index.ts";

const repoRoot = resolve(import.meta.dirname, "..");
const ports = { app: 5790, sms: 5791, oauth: 5792, smtp: 5793, inboundSmtp: 5794 };

if ((await run("vite", ["build", "--logLevel", "warn"])) !== 0) process.exit(1);
const stack = await startStack({ nodeEnv: "test", ports, database: "sproutline_bench_lighthouse", freshDatabase: true, apps: "built", quiet: true });

const baselineOut = mkdtempSync(join(tmpdir(), "sproutline-lh-baseline-"));
await build({ root: resolve(repoRoot, "bench/baseline-app"), configFile: false, logLevel: "warn", plugins: [react()], build: { outDir: baselineOut, emptyOutDir: true } });
// Served compressed, as the product is, so both are scored under the same conditions.
const baselineApp = express().use(compression()).use(express.static(baselineOut));
const baselineServer = createServer(baselineApp).listen(5799, "127.0.0.1");

const chrome = await chromeLauncher.launch({
  chromePath: "/usr/bin/chromium",
  chromeFlags: ["--headless=new", "--no-sandbox", "--disable-gpu", "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run"],
});

async function score(url: string, cookie?: string) {
  const result = await lighthouse(url, {
    port: chrome.port,
    output: "json",
    logLevel: "error",
    onlyCategories: ["performance", "accessibility"],
    formFactor: "mobile",
    ...(cookie ? { extraHeaders: { Cookie: cookie } } : {}),
  });
  const lhr = result!.lhr;
  if (lhr.runtimeError) throw new Error(`Lighthouse could not score ${url}: ${lhr.runtimeError.code} ${lhr.runtimeError.message}`);
  const metric = (id: string) => Math.round(Number(lhr.audits[id]?.numericValue ?? NaN));
  return {
    performance: Math.round((lhr.categories.performance?.score ?? 0) * 100),
    accessibility: Math.round((lhr.categories.accessibility?.score ?? 0) * 100),
    firstContentfulPaintMs: metric("first-contentful-paint"),
    largestContentfulPaintMs: metric("largest-contentful-paint"),
    totalBlockingTimeMs: metric("total-blocking-time"),
  };
}

try {
  // The stack's own fakes hold the sign-in link; read them through its control URL.
  const fakesView = { listOutbox: async () => (await (await fetch(`${stack.fakesControlUrl}/__outbox`)).json()).messages } as Awaited<ReturnType<typeof startFakes>>;
  const cookie = await homeownerCookie(stack.appUrl, fakesView, "ruth.okonkwo@mail.example");
  const baseline = await score("http://127.0.0.1:5799/");
  const today = await score(`${stack.appUrl}/portal/`, cookie);
  console.log(`baseline app: performance ${baseline.performance}, accessibility ${baseline.accessibility}`);
  console.log(`portal Today: performance ${today.performance}, accessibility ${today.accessibility} (LCP ${today.largestContentfulPaintMs} ms, TBT ${today.totalBlockingTimeMs} ms)`);
  console.log(JSON.stringify({ name: "lighthouse", mobile: true, baseline, portalToday: today, performanceRatioToBaseline: Number((today.performance / Math.max(1, baseline.performance)).toFixed(2)) }));
} finally {
  await chrome.kill();
  baselineServer.close();
  await stack.stop();
}
