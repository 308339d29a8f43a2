import type { PlanContext } from "../context.ts";
import { localTimeFromMinutes, minutesOfLocalTime, toDayNumber } from "../dates.ts";
import { dailyKey, oneOffKey } from "../step-keys.ts";
import type { Slope } from "../schemas/plan-input.ts";
import type { Why } from "../tables/provenance.ts";
import { CYCLE_AND_SOAK, EROSION_CONTROL } from "../tables/slopes.ts";
import type { CycleAndSoak, PlanStep, WarningFinding } from "../types.ts";
import { firstPlanDay } from "./plan-start.ts";

const cycleSoakWhy =
  " On a slope, water that falls faster than the soil takes it in runs downhill, taking seed and soil with it; short runs with pauses let each one soak in.";

const TEXT = {
  split: (runs: number, minutes: number) => `${runs} runs of ${minutes} minutes`,
  detail: (runs: number, minutes: number, before: number, soak: number) =>
    ` On this slope, split each watering into ${runs} runs of ${minutes} minutes with about ${soak} minutes' pause between them, instead of ${before} minutes in one go. Stop a run early if water starts to run down the slope.`,
  erosionSteepSeed:
    "Steep slope: hold the seed down with an erosion-control blanket, straw mulch or a hydroseeding tackifier, or the first heavy rain will wash it downhill.",
  erosionGentleSeed: "Slope: rake the seed in well and cover it lightly (straw or a thin top-dressing) so rain does not move it.",
  erosionSeedReason: "Seed lying loose on a slope washes off in heavy rain, leaving bare streaks above and thick piles below.",
  erosionSteepSod: "Steep slope: lay the sod across the slope with staggered joints and pin each piece with sod staples or stakes so it cannot slide.",
  erosionSodReason: "Unrooted sod on a steep slope slides when it is soaked.",
  watchTitle: "After any heavy rain, look over the slope",
  watchDetail:
    "Heavy rain can wash seed down a slope. If you see bare streaks or spots where seed has washed away, send us a photo: washed-out spots are re-seeded.",
  washoutTitle: "Check the slope for washed-out seed after the heavy rain",
  washoutDetail:
    "Walk the slope and look for bare streaks, gullies or seed piled at the bottom. Send us a photo of any you find so we can re-seed the washed-out spots. Take it from standing height, with a shoe or a ruler in the picture for scale.",
} as const;

const washoutWhy: Why = {
  text: "Seed washed off a slope leaves bare spots that weeds fill unless they are re-seeded soon.",
  source: EROSION_CONTROL.source,
  provenance: EROSION_CONTROL.provenance,
};

export function slopeOf(ctx: PlanContext): Slope {
  return ctx.input.property.slope ?? "none";
}

/** How one cycle of `minutes` is split on a slope: runs of at most the slope's run depth, never more minutes in all. */
export function splitCycle(minutes: number, rateInPerHour: number, slope: Exclude<Slope, "none">): { runs: number; runMinutes: number } {
  const maxRun = Math.max(1, Math.floor((CYCLE_AND_SOAK.maxRunIn[slope] / rateInPerHour) * 60));
  if (minutes <= maxRun) return { runs: 1, runMinutes: minutes };
  const runs = Math.min(CYCLE_AND_SOAK.maxRunsPerCycle, Math.ceil(minutes / maxRun));
  // Rounded down: a run a minute short is better on a slope than one that runs off.
  return { runs, runMinutes: Math.max(1, Math.floor(minutes / runs)) };
}

/**
 * Every run's start, each cycle's runs spaced by run + pause, kept to real times of that day and before midnight;
 * and each cycle's first run, so reminders and calendars can speak of one watering in several runs.
 */
function runStarts(ctx: PlanContext, dayNumber: number, times: readonly string[], runs: number, runMinutes: number): { times: string[]; cycleStarts: string[] } {
  const spacing = runMinutes + CYCLE_AND_SOAK.soakMinutes;
  const minutes: number[] = [];
  const firsts: number[] = [];
  for (const time of times) {
    const start = minutesOfLocalTime(time);
    for (let i = 0; i < runs; i++) {
      const m = start + i * spacing;
      if (m + runMinutes > 24 * 60) break;
      const real = ctx.clock.nearestReal(dayNumber, m);
      if (i === 0 && !firsts.includes(real)) firsts.push(real);
      if (!minutes.includes(real)) minutes.push(real);
    }
  }
  minutes.sort((a, b) => a - b);
  firsts.sort((a, b) => a - b);
  return { times: minutes.map(localTimeFromMinutes), cycleStarts: firsts.map(localTimeFromMinutes) };
}

/** Minutes of water a watering step asks for in one day (what cycle-and-soak may never exceed). */
export function minutesPerDay(step: PlanStep): number {
  const minutes = step.minutesPerCycle ?? 0;
  const times = step.times ?? [];
  if (times.length > 0) return times.length * minutes;
  return (step.cycleAndSoak?.runsPerCycle ?? 1) * minutes;
}

/**
 * Post-pass over watering steps on a sloped lawn: each cycle becomes short runs with a
 * pause between (cycle-and-soak), never more minutes in the day than before. Steps are
 * rewritten, not re-planned, so it works on whatever the watering rules produced.
 */
export function applyCycleAndSoak(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  const slope = slopeOf(ctx);
  if (slope === "none") return steps as PlanStep[];
  const rate = ctx.precipitationRate;
  return steps.map((step) => {
    if (step.kind !== "water" || step.minutesPerCycle === undefined || step.cycleAndSoak) return step;
    const before = step.minutesPerCycle;
    const { runs, runMinutes } = splitCycle(before, rate, slope);
    if (runs <= 1) return step;
    const split = step.times && step.times.length > 0 ? runStarts(ctx, toDayNumber(step.date), step.times, runs, runMinutes) : undefined;
    const times = split ? split.times : step.times;
    const cycleAndSoak: CycleAndSoak = { runsPerCycle: runs, soakMinutes: CYCLE_AND_SOAK.soakMinutes, minutesBefore: before, cycleStarts: split?.cycleStarts ?? [] };
    const oldAmount = `${before} minutes`;
    return {
      ...step,
      title: step.title.includes(oldAmount) ? step.title.replace(oldAmount, TEXT.split(runs, runMinutes)) : step.title,
      detail: step.detail + TEXT.detail(runs, runMinutes, before, CYCLE_AND_SOAK.soakMinutes),
      ...(times ? { times } : {}),
      minutesPerCycle: runMinutes,
      cycleAndSoak,
      why: {
        text: step.why.text + cycleSoakWhy,
        source: `${step.why.source}; cycle-and-soak: ${CYCLE_AND_SOAK.source}`,
        provenance: step.why.provenance === "from memory" ? "from memory" : CYCLE_AND_SOAK.provenance,
      },
    };
  });
}

/** Erosion control for the crew: how to hold seed or sod on the slope. */
export function slopeWarnings(ctx: PlanContext): WarningFinding[] {
  const slope = slopeOf(ctx);
  if (slope === "none") return [];
  const out: WarningFinding[] = [];
  if (ctx.seeding) {
    out.push({
      code: "slope_erosion_control",
      severity: slope === "steep" ? "caution" : "info",
      message: slope === "steep" ? TEXT.erosionSteepSeed : TEXT.erosionGentleSeed,
      reason: TEXT.erosionSeedReason,
      source: EROSION_CONTROL.source,
      provenance: EROSION_CONTROL.provenance,
    });
  }
  if (slope === "steep" && ctx.services.has("sod_installation")) {
    out.push({
      code: "slope_sod_pinning",
      severity: "caution",
      message: TEXT.erosionSteepSod,
      reason: TEXT.erosionSodReason,
      source: EROSION_CONTROL.source,
      provenance: EROSION_CONTROL.provenance,
    });
  }
  return out;
}

/**
 * For the homeowner of a seeded slope: a reminder to look after heavy rain, and a photo
 * check-in the day after each heavy rain reported while the seedlings can still wash out.
 */
export function slopeSteps(ctx: PlanContext): PlanStep[] {
  if (slopeOf(ctx) === "none" || !ctx.seeding) return [];
  const steps: PlanStep[] = [];
  const watchDay = Math.max(1, firstPlanDay(ctx));
  if (watchDay <= ctx.timeline.planEnd) {
    steps.push({
      key: oneOffKey("note", "slope_washout_watch"),
      date: ctx.dateOf(watchDay),
      phase: ctx.phaseOf(watchDay),
      kind: "note",
      title: TEXT.watchTitle,
      detail: TEXT.watchDetail,
      why: washoutWhy,
      cautions: [],
    });
  }
  const lastDay = ctx.timeline.establishmentEnd;
  const days = [...ctx.rainDays].map((d) => d - ctx.visitDay + EROSION_CONTROL.washoutCheckDaysAfterRain).sort((a, b) => a - b);
  for (const day of days) {
    if (day < 1 || day > lastDay || day > ctx.timeline.planEnd) continue;
    const date = ctx.dateOf(day);
    steps.push({
      key: dailyKey("check_in_photo", date, "washout"),
      date,
      phase: ctx.phaseOf(day),
      kind: "check_in_photo",
      title: TEXT.washoutTitle,
      detail: TEXT.washoutDetail,
      why: washoutWhy,
      cautions: [],
    });
  }
  return steps;
}
