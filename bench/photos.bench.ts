/**
 * A 12-megapixel JPEG through the photo pipeline (type check from the bytes, header check,
 * upright re-encode to 2048 px and a 400 px thumbnail with no metadata) against sharp alone
 * doing the bare resize of the same file. Each variant runs in a child process of its own so
 * its peak memory (max RSS) is its own.
 */
import { spawnSync } from "node:child_process";
import { readFileSync, writeFileSync, mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import sharp from "sharp";

const ROUNDS = 6;
const variant = process.argv[2];

async function child(name: string, file: string) {
  const input = readFileSync(file);
  const run =
    name === "pipeline"
      ? (await import("../server/features/photos/image-pipeline.ts")).processPhoto
      : (buf: Buffer) => sharp(buf).rotate().resize(2048, 2048, { fit: "inside" }).jpeg().toBuffer();
  await run(input); // warm-up
  const times: number[] = [];
  for (let i = 0; i < ROUNDS; i++) {
    const started = performance.now();
    await run(input);
    times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  const medianMs = times[Math.floor(times.length / 2)]!;
  process.stdout.write(JSON.stringify({ medianMs: Number(medianMs.toFixed(1)), maxRssMiB: Math.round(process.resourceUsage().maxRSS / 1024) }) + "\n");
}

if (variant) {
  await child(variant, process.argv[3]!);
} else {
  const dir = mkdtempSync(join(tmpdir(), "sproutline-photo-bench-"));
  const file = join(dir, "12mp.jpg");
  // Noise keeps the JPEG realistic in size (a flat colour would compress to almost nothing).
  const jpeg = await sharp({ create: { width: 4000, height: 3000, channels: 3, background: "#4a7a3a", noise: { type: "gaussian", mean: 110, sigma: 40 } } })
    .jpeg({ quality: 90 })
    .withMetadata({ orientation: 6 })
    .toBuffer();
  writeFileSync(file, jpeg);
  const measure = (name: string) => {
    const out = spawnSync(process.execPath, ["--import", "tsx", import.meta.filename, name, file], { encoding: "utf8" });
    if (out.status !== 0) throw new Error(out.stderr);
    return JSON.parse(out.stdout.trim().split("\n").at(-1)!) as { medianMs: number; maxRssMiB: number };
  };
  const baseline = measure("sharp-only");
  const pipeline = measure("pipeline");
  console.log(`input: 4000×3000 JPEG, ${(jpeg.length / 2 ** 20).toFixed(1)} MiB`);
  console.log(`sharp alone (baseline): ${baseline.medianMs} ms, peak RSS ${baseline.maxRssMiB} MiB`);
  console.log(`upload pipeline: ${pipeline.medianMs} ms, peak RSS ${pipeline.maxRssMiB} MiB`);
  console.log(
    JSON.stringify({
      name: "photos",
      inputMiB: Number((jpeg.length / 2 ** 20).toFixed(1)),
      baseline: { what: "sharp rotate+resize to 2048 px only", ...baseline },
      pipeline,
      timeRatioToBaseline: Number((pipeline.medianMs / baseline.medianMs).toFixed(2)),
      memoryRatioToBaseline: Number((pipeline.maxRssMiB / baseline.maxRssMiB).toFixed(2)),
    }),
  );
}
