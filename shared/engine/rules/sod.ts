import { minutesPerCycle } from "../../calculators/irrigation.ts";
import type { PlanContext } from "../context.ts";
import { localTimeFromMinutes, minutesOfLocalTime } from "../dates.ts";
import { formatInches, formatNumber } from "../format.ts";
import { dailyKey, oneOffKey } from "../step-keys.ts";
import { MOW_DOWN_RULE } from "../tables/mowing.ts";
import type { Why } from "../tables/provenance.ts";
import { SOD_ROOTING, SOD_WATERING } from "../tables/sod.ts";
import type { HoldOff, PlanStep, WarningFinding } from "../types.ts";

/*
 * Sod installation. The lawn's ordinary watering (rules/watering.ts) and mowing
 * (rules/mowing.ts) know nothing of sod; this post-pass puts the sod's own watering in
 * place of theirs for its first two weeks and turns their first mowings into the
 * sod's first mowing after the tug test. Nothing here is seed: no germination
 * watering, and the seed hold-offs never start because the visit sows nothing.
 */

const soakWhy: Why = {
  text: "New sod has no roots in your soil yet. Soaking it straight away joins it to the soil and keeps the pieces from shrinking and gapping.",
  source: SOD_WATERING.source,
  provenance: SOD_WATERING.provenance,
};
const dailyWhy: Why = {
  text: "Until its roots grow into the soil, sod can only drink the water held in it and just below it, which dries out within a day.",
  source: SOD_WATERING.source,
  provenance: SOD_WATERING.provenance,
};
const taperWhy: Why = {
  text: "As the roots grow down, watering less often but longer each time draws them deeper.",
  source: SOD_WATERING.source,
  provenance: SOD_WATERING.provenance,
};
const tugWhy: Why = {
  text: "Sod that holds when tugged has rooted into the soil and can take a mower; sod that lifts would be torn up.",
  source: SOD_ROOTING.source,
  provenance: SOD_ROOTING.provenance,
};
const firstMowWhy: Why = {
  text: "A first cut at a high setting takes only the tips, so the newly rooted sod is not set back.",
  source: SOD_ROOTING.source,
  provenance: SOD_ROOTING.provenance,
};
const keepOffWhy =
  "Feet, wheels and play shift the pieces and tear the new roots before they hold. Walk on it only to move the sprinkler.";

const TEXT = {
  soakTitle: (how: string) => `Soak the new sod as soon as it is laid${how}`,
  soakDetail:
    "Water until the soil under the sod is wet: lift a corner of a piece after watering and check that the soil beneath is damp a few inches down. Water the edges and seams well; they dry first.",
  dailyTitle: (how: string) => `Water the new sod today${how}`,
  dailyDetail: (depth: string) =>
    `Put down about ${depth} inch, early in the morning, so the sod and the soil under it stay moist. If the soil under a lifted corner is still wet from yesterday, water less; if the sod feels dry or its edges curl, water more. Stay off it except to move the sprinkler.`,
  taperTitle: (how: string) => `Water the sod today (every other day now)${how}`,
  taperDetail: (depth: string) =>
    `The roots are starting to grow down. Put down about ${depth} inch, early in the morning, and let the surface dry a little between waterings.`,
  rainTitle: "Skip watering today if the rain soaked the sod",
  rainDetail: "Lift a corner: if the soil under it is wet, the rain did the job. If it is dry, water as usual.",
  tugTitle: "Check that the sod has rooted: the tug test",
  tugDetail:
    "Gently pull up on a corner of a few pieces in different parts of the lawn. If they hold, the sod has rooted and can be mowed. If a piece lifts easily, keep watering as planned and try again in a few days before mowing.",
  firstMowTitle: (height: string) => `First mow of the new sod, once it passes the tug test: highest setting (${height})`,
  firstMowDetail:
    "Mow only when the sod is dry and firm underfoot. Use a sharp blade, walk slowly and make wide turns so the pieces do not shift.",
  stepDownTitle: (height: string) => `Mow at ${height}, one setting lower than last time`,
  stepDownDetail: "Mow when the grass is dry, and only if it has grown about a third taller than this height.",
  noSprinkler: (depth: string, days: number) =>
    `No sprinkler: new sod needs about ${depth} inch of water every day for its first ${days} days. By hose alone the middle of each piece and the seams are easily missed; suggest a hose-end sprinkler on a timer.`,
  noSprinklerReason: "Sod that dries out before it roots shrinks at the seams and browns.",
} as const;

export function isSodInstallation(ctx: PlanContext): boolean {
  return ctx.services.has("sod_installation");
}

function wholeMinutes(depthIn: number, rate: number): number {
  return Math.max(1, Math.round(minutesPerCycle(depthIn, rate)));
}

function howLong(ctx: PlanContext, minutes: number): string {
  const kind = ctx.input.property.irrigation.kind;
  if (kind === "none") return "";
  return `, ${minutes} minutes ${kind === "in_ground" ? "per zone" : "in each spot you move the sprinkler to"}`;
}

/** The sod's own watering, days 0..SOD_WATERING.lastDay, never on or after the expected first frost. */
function sodWateringSteps(ctx: PlanContext): PlanStep[] {
  const rate = ctx.precipitationRate;
  const lastDay = Math.min(SOD_WATERING.lastDay, ctx.frostDay === null ? Infinity : ctx.frostDay - 1, ctx.timeline.planEnd);
  const soakMinutes = wholeMinutes(SOD_WATERING.soakDepthIn, rate);
  const dailyMinutes = wholeMinutes(SOD_WATERING.dailyDepthIn, rate);
  const taperMinutes = wholeMinutes(SOD_WATERING.everyOtherDayDepthIn, rate);
  const dailyTitle = TEXT.dailyTitle(howLong(ctx, dailyMinutes));
  const dailyDetail = TEXT.dailyDetail(formatNumber(SOD_WATERING.dailyDepthIn, 2));
  const taperTitle = TEXT.taperTitle(howLong(ctx, taperMinutes));
  const taperDetail = TEXT.taperDetail(formatNumber(SOD_WATERING.everyOtherDayDepthIn, 2));
  const time = [ctx.program.deepWateringTime];
  const steps: PlanStep[] = [];

  const water = (day: number, title: string, detail: string, minutes: number, why: Why, times: readonly string[]) => {
    const date = ctx.dateOf(day);
    if (day > 0 && ctx.rainDays.has(ctx.visitDay + day)) {
      steps.push({ key: dailyKey("note", date, "rain"), date, phase: ctx.phaseOf(day), kind: "note", title: TEXT.rainTitle, detail: TEXT.rainDetail, why: dailyWhy, cautions: [] });
      return;
    }
    steps.push({ key: dailyKey("water", date, 1), date, phase: ctx.phaseOf(day), kind: "water", title, detail, times, minutesPerCycle: minutes, why, cautions: ["watering_restrictions"] });
  };

  if (lastDay >= 0) water(0, TEXT.soakTitle(howLong(ctx, soakMinutes)), TEXT.soakDetail, soakMinutes, soakWhy, []);
  for (let day = 1; day <= Math.min(SOD_WATERING.dailyUntilDay, lastDay); day++) {
    water(day, dailyTitle, dailyDetail, dailyMinutes, dailyWhy, realTimes(ctx, day, time));
  }
  for (let day = SOD_WATERING.dailyUntilDay + 2; day <= lastDay; day += 2) {
    water(day, taperTitle, taperDetail, taperMinutes, taperWhy, realTimes(ctx, day, time));
  }
  return steps;
}

/** Start times that really occur that day (a start inside a spring-forward gap moves past it). */
function realTimes(ctx: PlanContext, day: number, times: readonly string[]): string[] {
  return times.map((t) => {
    const minute = minutesOfLocalTime(t);
    const real = ctx.clock.nearestReal(ctx.visitDay + day, minute);
    return real === minute ? t : localTimeFromMinutes(real);
  });
}

/** True for the ordinary watering steps (and their rain notes) the sod's own watering replaces. */
function replacedBySod(ctx: PlanContext, step: PlanStep, lastDate: string): boolean {
  if (step.date > lastDate) return false;
  return step.kind === "water" || step.key === dailyKey("note", step.date, "rain");
}

/**
 * Mowing of the new sod: nothing before it can have rooted, then the first mowing at the
 * mower's highest setting and one setting lower each time until the lawn's usual height
 * (the height the ordinary mowing rule chose for that date is the floor).
 */
function sodMowing(ctx: PlanContext, mows: readonly PlanStep[]): PlanStep[] {
  const { property } = ctx.input;
  const firstDate = ctx.dateOf(SOD_ROOTING.firstMowFromDay);
  const settingStep = property.mowerSettingStepIn ?? MOW_DOWN_RULE.assumedSettingStepIn;
  let height = property.mowerHighestSettingIn;
  const out: PlanStep[] = [];
  for (const mow of mows) {
    if (mow.date < firstDate) continue;
    const floor = mow.heightIn ?? height;
    if (out.length === 0) {
      out.push({ ...mow, title: TEXT.firstMowTitle(formatInches(height)), detail: TEXT.firstMowDetail, heightIn: height, why: firstMowWhy });
      continue;
    }
    if (height > floor + 1e-9) {
      height = Math.max(floor, Math.round((height - settingStep) * 1000) / 1000);
      out.push({ ...mow, title: TEXT.stepDownTitle(formatInches(height)), detail: TEXT.stepDownDetail, heightIn: height });
    } else {
      out.push(mow);
    }
  }
  return out;
}

/** Post-pass: the sod's own watering and mowing replace the ordinary ones, and the tug test goes in. */
export function applySod(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  const lastDate = ctx.dateOf(SOD_WATERING.lastDay);
  const kept: PlanStep[] = [];
  const mows: PlanStep[] = [];
  for (const step of steps) {
    if (step.kind === "mow") mows.push(step);
    else if (!replacedBySod(ctx, step, lastDate)) kept.push(step);
  }
  kept.push(...sodWateringSteps(ctx), ...sodMowing(ctx, mows));
  if (SOD_ROOTING.tugTestDay <= ctx.timeline.planEnd) {
    const date = ctx.dateOf(SOD_ROOTING.tugTestDay);
    kept.push({ key: oneOffKey("note", "sod_tug_test"), date, phase: ctx.phaseOf(SOD_ROOTING.tugTestDay), kind: "note", title: TEXT.tugTitle, detail: TEXT.tugDetail, why: tugWhy, cautions: [] });
  }
  return kept;
}

/** Keep off the new sod until it has rooted (the tug test). */
export function sodHoldOffs(ctx: PlanContext): HoldOff[] {
  if (!isSodInstallation(ctx)) return [];
  return [
    {
      kind: "heavy_traffic",
      start: ctx.dateOf(0),
      end: ctx.dateOf(SOD_ROOTING.tugTestDay),
      why: keepOffWhy,
      source: SOD_ROOTING.source,
      provenance: SOD_ROOTING.provenance,
      cautions: [],
    },
  ];
}

/** For the crew: sod on a lawn with no sprinkler is hard to keep wet by hose. */
export function sodWarnings(ctx: PlanContext): WarningFinding[] {
  if (!isSodInstallation(ctx) || ctx.input.property.irrigation.kind !== "none") return [];
  return [
    {
      code: "no_sprinkler_for_sod",
      severity: "caution",
      message: TEXT.noSprinkler(formatNumber(SOD_WATERING.dailyDepthIn, 2), SOD_WATERING.dailyUntilDay),
      reason: TEXT.noSprinklerReason,
      source: SOD_WATERING.source,
      provenance: SOD_WATERING.provenance,
    },
  ];
}
