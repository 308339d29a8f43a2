/**
 * First-load JavaScript of the portal and staff apps, gzipped, against a bare
 * React + React Router + TanStack Query app built in the same run.
 * "First load" = the entry script plus every chunk the HTML preloads.
 */
import { build } from "vite";
import react from "@vitejs/plugin-react";
import { gzipSync } from "node:zlib";
import { mkdtempSync, readFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";

const repoRoot = resolve(import.meta.dirname, "..");

function firstLoadGzipBytes(distDir: string, htmlPath: string): { files: number; gzipBytes: number; rawBytes: number } {
  const html = readFileSync(htmlPath, "utf8");
  const refs = [...html.matchAll(/<(?:script[^>]+src|link[^>]+rel="modulepreload"[^>]+href)="([^"]+\.js)"/g)].map((m) => m[1]!);
  let gzipBytes = 0;
  let rawBytes = 0;
  for (const ref of new Set(refs)) {
    const content = readFileSync(join(distDir, ref.replace(/^\//, "")));
    rawBytes += content.length;
    gzipBytes += gzipSync(content, { level: 9 }).length;
  }
  return { files: new Set(refs).size, gzipBytes, rawBytes };
}

const appsOut = mkdtempSync(join(tmpdir(), "sproutline-bench-apps-"));
await build({ root: repoRoot, logLevel: "warn", build: { outDir: appsOut, emptyOutDir: true } });
const baselineOut = mkdtempSync(join(tmpdir(), "sproutline-bench-baseline-"));
await build({
  root: resolve(repoRoot, "bench/baseline-app"),
  configFile: false,
  logLevel: "warn",
  plugins: [react()],
  build: { outDir: baselineOut, emptyOutDir: true },
});

const baseline = firstLoadGzipBytes(baselineOut, join(baselineOut, "index.html"));
const portal = firstLoadGzipBytes(appsOut, join(appsOut, "portal/index.html"));
const staff = firstLoadGzipBytes(appsOut, join(appsOut, "staff/index.html"));
const kb = (b: number) => Number((b / 1024).toFixed(1));
console.log(`baseline (React + Router + Query): ${kb(baseline.gzipBytes)} KiB gzip in ${baseline.files} file(s)`);
console.log(`portal first load: ${kb(portal.gzipBytes)} KiB gzip in ${portal.files} file(s) → ${(portal.gzipBytes / baseline.gzipBytes).toFixed(2)}× baseline`);
console.log(`staff first load:  ${kb(staff.gzipBytes)} KiB gzip in ${staff.files} file(s) → ${(staff.gzipBytes / baseline.gzipBytes).toFixed(2)}× baseline`);
console.log(
  JSON.stringify({
    name: "frontend",
    baselineGzipKiB: kb(baseline.gzipBytes),
    portalGzipKiB: kb(portal.gzipBytes),
    staffGzipKiB: kb(staff.gzipBytes),
    portalToBaselineRatio: Number((portal.gzipBytes / baseline.gzipBytes).toFixed(2)),
    staffToBaselineRatio: Number((staff.gzipBytes / baseline.gzipBytes).toFixed(2)),
  }),
);
