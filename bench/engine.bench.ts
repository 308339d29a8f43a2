/*
 * Care-plan engine throughput: 10,000 realistic, mixed visits.
 * Run: npx tsx bench/engine.bench.ts
 *
 * Baseline, measured in the same run on the same inputs: zod validation alone
 * (parsePlanInput). The engine figure is generatePlan on already-validated
 * input, which is what the server does after validating a request. Times are
 * process CPU (user + system). The first full pass is reported separately:
 * it includes JIT warm-up and filling the per-zone clock-change cache, which a
 * long-running server pays once; it also counts V8's background compiler and
 * GC threads, so it is noisy. Target: 10,000 plans in under 1 s of CPU, judged
 * on the steady-state median (meetsTarget) and reported for the cold pass too.
 */
import { generatePlan, parsePlanInput, type PlanInput, type PlanInputRaw } from "#shared/engine/index";

const PLANS = 10_000;
const MEASURED_PASSES = 5;
const TARGET_CPU_MS = 1000;

/** Small seeded PRNG (mulberry32) so every run benchmarks the same inputs. */
function rng(seed: number) {
  let a = seed >>> 0;
  const next = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    pick: <T>(items: readonly T[]): T => items[Math.floor(next() * items.length)] as T,
    int: (min: number, max: number) => min + Math.floor(next() * (max - min + 1)),
    chance: (p: number) => next() < p,
  };
}

const pad = (n: number) => String(n).padStart(2, "0");
const isoDate = (y: number, m: number, d: number) => `${y}-${pad(m)}-${pad(d)}`;

/** A mix weighted like a real season: mostly autumn cool-season overseeding, some spring work, feeding rounds, warm-season lawns. */
function makeInputs(count: number): PlanInputRaw[] {
  const r = rng(20260910);
  const coolZones = ["America/New_York", "America/Chicago", "America/Denver", "Europe/Berlin", "America/Toronto"];
  const southZones = ["Australia/Sydney", "Australia/Melbourne", "Pacific/Auckland"];
  const warmZones = ["America/Phoenix", "America/Los_Angeles", "America/Chicago"];
  const inputs: PlanInputRaw[] = [];
  for (let i = 0; i < count; i++) {
    const kind = r.pick(["cool_autumn", "cool_autumn", "cool_autumn", "cool_spring", "new_lawn", "feed_round", "aeration", "warm"] as const);
    const south = kind !== "warm" && r.chance(0.15);
    const zone = kind === "warm" ? r.pick(warmZones) : south ? r.pick(southZones) : r.pick(coolZones);
    const year = r.int(2025, 2027);
    const month = kind === "cool_spring" ? (south ? 10 : 4) : kind === "warm" ? r.int(5, 10) : south ? r.int(3, 4) : r.int(8, 10);
    const date = isoDate(year, month, r.int(1, 28));
    const seeding = kind === "cool_autumn" || kind === "cool_spring" || kind === "new_lawn" || (kind === "warm" && r.chance(0.5));
    const seedMix =
      kind === "warm"
        ? [{ species: r.pick(["bermudagrass", "zoysiagrass", "centipedegrass"] as const), percent: 100, purityPct: 95, germinationPct: 80 }]
        : r.chance(0.5)
          ? [{ species: "tall_fescue" as const, percent: 100, purityPct: 98, germinationPct: r.int(85, 95) }]
          : [
              { species: "tall_fescue" as const, percent: 80, purityPct: 98, germinationPct: 90 },
              { species: r.pick(["kentucky_bluegrass", "perennial_ryegrass", "fine_fescue"] as const), percent: 20, purityPct: 97, germinationPct: 85 },
            ];
    const services: NonNullable<PlanInputRaw["visit"]["services"]> =
      !seeding
        ? kind === "feed_round"
          ? ["fertiliser_only"]
          : ["aeration"]
        : kind === "new_lawn"
          ? ["new_seeding", "starter_fertiliser"]
          : ["aeration", r.pick(["overseeding", "slit_seeding"] as const)];
    const current = r.pick([2.5, 3, 3.5, 4]);
    const frostMonth = south ? 5 : 11;
    const frostYear = south && month > 5 ? year + 1 : year;
    inputs.push({
      visit: {
        date,
        services: [...new Set(services)],
        seedMix: seeding ? seedMix : [],
        ...(seeding ? { seedRateLbPer1000: r.pick([1, 3, 4, 5, 6, 7]) } : {}),
        areaFt2: r.int(2000, 20000),
        products: r.chance(0.6)
          ? [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 }]
          : r.chance(0.5)
            ? [{ name: "Lawn food 28-3-6", analysis: { n: 28, p: 3, k: 6 }, rateLbPer1000: 3.57, quickReleaseN: r.chance(0.3) }]
            : [],
      },
      property: {
        grassType: { species: kind === "warm" ? [seedMix[0]!.species] : ["tall_fescue"] },
        lawnCondition: kind === "new_lawn" ? "bare" : r.pick(["thin", "thin", "thick", "thick_dormant"] as const),
        irrigation: r.chance(0.6)
          ? { kind: "in_ground", zones: r.int(2, 8), ...(r.chance(0.4) ? { precipitationRateInPerHour: r.pick([0.5, 0.8, 1.5]) } : {}) }
          : { kind: r.pick(["hose_end", "none"] as const) },
        currentMowingHeightIn: current,
        mowerHighestSettingIn: Math.max(current, 4),
        ...(r.chance(0.7) ? { mowerSettingStepIn: r.pick([0.25, 0.5]) } : {}),
        timeZone: zone,
        ...(kind === "warm" ? {} : { expectedFirstFrost: isoDate(frostYear, frostMonth, r.int(1, 28)) }),
      },
      program: r.chance(0.3) ? { version: 2, germinationDays: 21, wateringCyclesPerDayGermination: 4 } : {},
      options: {
        observations: r.chance(0.2) ? [{ kind: "sprouts_seen", onDay: r.int(5, 16) }, { kind: "heavy_rain", date }] : [],
      },
    });
  }
  return inputs;
}

function cpuMs(run: () => void): { cpu: number; wall: number } {
  const cpu0 = process.cpuUsage();
  const wall0 = performance.now();
  run();
  const cpu = process.cpuUsage(cpu0);
  return { cpu: (cpu.user + cpu.system) / 1000, wall: performance.now() - wall0 };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)] ?? Number.NaN;

const raws = makeInputs(PLANS);
const validated: PlanInput[] = raws.map((raw, i) => {
  const parsed = parsePlanInput(raw);
  if (!parsed.ok) throw new Error(`bench input ${i} is invalid: ${JSON.stringify(parsed.fields)}`);
  return parsed.value;
});

let checksum = 0; // consumed below so no work can be optimised away
const generateAll = () => {
  for (const input of validated) checksum += generatePlan(input).steps.length;
};
const validateAll = () => {
  for (const raw of raws) checksum += parsePlanInput(raw).ok ? 1 : 0;
};
const validateAndGenerateAll = () => {
  for (const raw of raws) {
    const parsed = parsePlanInput(raw);
    if (parsed.ok) checksum += generatePlan(parsed.value).steps.length;
  }
};

const cold = cpuMs(generateAll);
const baseline: number[] = [];
const engine: number[] = [];
const combined: number[] = [];
for (let pass = 0; pass < MEASURED_PASSES; pass++) {
  baseline.push(cpuMs(validateAll).cpu);
  engine.push(cpuMs(generateAll).cpu);
  combined.push(cpuMs(validateAndGenerateAll).cpu);
}

const sample = validated.slice(0, 1000).map(generatePlan);
const stepsPerPlan = sample.reduce((s, p) => s + p.steps.length + p.prepSteps.length, 0) / sample.length;
const engineCpuMs = median(engine);
const baselineCpuMs = median(baseline);
const combinedCpuMs = median(combined);
const round = (x: number, d = 1) => Number(x.toFixed(d));

console.log(`inputs: ${PLANS} mixed visits, ~${round(stepsPerPlan)} steps per plan (checksum ${checksum})`);
console.log(`zod validation only (baseline): ${round(baselineCpuMs)} ms CPU → ${Math.round((PLANS * 1000) / baselineCpuMs)} inputs/s`);
console.log(`generatePlan on validated input: ${round(engineCpuMs)} ms CPU → ${Math.round((PLANS * 1000) / engineCpuMs)} plans/s (first cold pass ${round(cold.cpu)} ms)`);
console.log(`validate + generate: ${round(combinedCpuMs)} ms CPU → ${Math.round((PLANS * 1000) / combinedCpuMs)} plans/s`);
console.log(
  JSON.stringify({
    name: "engine",
    plans: PLANS,
    passes: MEASURED_PASSES,
    stepsPerPlan: round(stepsPerPlan),
    engineCpuMs: round(engineCpuMs),
    plansPerSecond: Math.round((PLANS * 1000) / engineCpuMs),
    baseline: "zod-validate-only",
    baselineCpuMs: round(baselineCpuMs),
    baselinePerSecond: Math.round((PLANS * 1000) / baselineCpuMs),
    engineToBaselineRatio: round(engineCpuMs / baselineCpuMs, 2),
    validateAndGenerateCpuMs: round(combinedCpuMs),
    coldFirstPassCpuMs: round(cold.cpu),
    targetCpuMs: TARGET_CPU_MS,
    meetsTarget: engineCpuMs < TARGET_CPU_MS,
    coldMeetsTarget: cold.cpu < TARGET_CPU_MS,
  }),
);
