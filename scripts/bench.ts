/**
 * `npm run bench`: runs every bench/*.bench.ts in turn (never part of npm test) and writes
 * their figures to bench/results/latest.json and latest.md. Each bench prints its figures,
 * ending with one JSON line; every figure is compared with a baseline measured in the same run,
 * because this machine is shared and absolute numbers drift.
 */
import { spawn } from "node:child_process";
import { mkdirSync, readdirSync, writeFileSync } from "node:fs";
import { resolve } from "node:path";
import { cpus, totalmem } from "node:os";

const repoRoot = resolve(import.meta.dirname, "..");
const only = process.argv.slice(2);
const benches = readdirSync(resolve(repoRoot, "bench"))
  .filter((f) => f.endsWith(".bench.ts"))
  .filter((f) => only.length === 0 || only.some((o) => f.startsWith(o)))
  .sort();

function runBench(file: string): Promise<{ output: string; code: number; seconds: number }> {
  const started = Date.now();
  return new Promise((done) => {
    const child = spawn(resolve(repoRoot, "node_modules/.bin/tsx"), [resolve(repoRoot, "bench", file)], { cwd: repoRoot, stdio: ["ignore", "pipe", "inherit"] });
    let output = "";
    child.stdout.on("data", (chunk: Buffer) => {
      output += chunk;
      process.stdout.write(chunk);
    });
    child.on("exit", (code) => done({ output, code: code ?? 1, seconds: (Date.now() - started) / 1000 }));
  });
}

const results: Record<string, unknown>[] = [];
let failed = 0;
for (const file of benches) {
  process.stdout.write(`\n=== ${file}\n`);
  const { output, code, seconds } = await runBench(file);
  const lastJson = output.trim().split("\n").reverse().find((l) => l.startsWith("{"));
  if (code !== 0 || !lastJson) {
    failed += 1;
    results.push({ name: file, error: `exited ${code}` });
    continue;
  }
  results.push({ ...JSON.parse(lastJson), seconds: Number(seconds.toFixed(1)) });
}

const machine = { cpus: cpus().length, memoryGiB: Math.round(totalmem() / 2 ** 30), node: process.version };
const dir = resolve(repoRoot, "bench/results");
mkdirSync(dir, { recursive: true });
writeFileSync(resolve(dir, "latest.json"), JSON.stringify({ at: new Date().toISOString(), machine, results }, null, 2) + "\n");
const md = [
  `# Benchmark results (${new Date().toISOString()})`,
  "",
  `Machine: ${machine.cpus} cores, ${machine.memoryGiB} GiB, Node ${machine.node}. Ratios compare with a baseline measured in the same run.`,
  "",
  ...results.map((r) => `## ${String(r.name)}\n\n\`\`\`json\n${JSON.stringify(r, null, 2)}\n\`\`\`\n`),
].join("\n");
writeFileSync(resolve(dir, "latest.md"), md);
process.stdout.write(`\nwrote bench/results/latest.json and latest.md (${results.length} benchmarks, ${failed} failed)\n`);
process.exit(failed ? 1 : 0);
