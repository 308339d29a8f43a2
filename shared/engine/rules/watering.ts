import { minutesPerCycle } from "../../calculators/irrigation.ts";
import type { PlanContext } from "../context.ts";
import { plural } from "../format.ts";
import { dailyKey } from "../step-keys.ts";
import { SOURCES } from "../tables/sources.ts";
import {
  DEEP_WATERING_DAY_OFFSETS,
  ESTABLISHMENT_WATERING_RULE,
  GERMINATION_TIMES_BY_CYCLES,
  GERMINATION_WATERING_RULE,
} from "../tables/watering.ts";
import type { Why } from "../tables/provenance.ts";
import type { PlanStep } from "../types.ts";
import { wateringNotes } from "./watering-notes.ts";
import { localTimeFromMinutes, minutesOfLocalTime } from "../dates.ts";

const WATER_CAUTIONS = ["watering_restrictions"] as const;

const germinationWhy: Why = {
  text: "New seed dies if it dries out even once. Short, frequent waterings keep the seed and the top ½–1 inch of soil damp without washing seed away.",
  source: GERMINATION_WATERING_RULE.source,
  provenance: GERMINATION_WATERING_RULE.provenance,
};
const deepWhy: Why = {
  text: "Once the grass is up, fewer but longer waterings send roots deeper, which makes the lawn tougher in heat and drought.",
  source: ESTABLISHMENT_WATERING_RULE.source,
  provenance: ESTABLISHMENT_WATERING_RULE.provenance,
};
const rainWhy: Why = {
  text: "Heavy rain wet the soil deeply enough for today; extra water now would only puddle.",
  source: SOURCES.tradePractice,
  provenance: "common practice",
};

/** Whole minutes, at least one: controllers and people both work in whole minutes. */
function wholeMinutes(depthIn: number, rateInPerHour: number): number {
  return Math.max(1, Math.round(minutesPerCycle(depthIn, rateInPerHour)));
}

function wherePhrase(ctx: PlanContext): string {
  return ctx.input.property.irrigation.kind === "in_ground" ? "per zone" : "in each spot you move the sprinkler to";
}

function zonesSentence(ctx: PlanContext, minutes: number): string {
  const zones = ctx.input.property.irrigation.zones;
  return zones && ctx.input.property.irrigation.kind === "in_ground"
    ? ` Run each of your ${zones} ${plural(zones, "zone", "zones")} for ${minutes} minutes.`
    : "";
}

/** A start time parsed once per plan rather than once per step. */
interface StartTime {
  readonly text: string;
  readonly minute: number;
}

const parseStarts = (times: readonly string[]): StartTime[] => times.map((text) => ({ text, minute: minutesOfLocalTime(text) }));

/** Wall-clock starts that really occur that day (a 02:30 start moves past a spring-forward gap). */
function realTimes(ctx: PlanContext, day: number, starts: readonly StartTime[]): string[] {
  const out: string[] = [];
  for (const start of starts) {
    const real = ctx.clock.nearestReal(ctx.visitDay + day, start.minute);
    const text = real === start.minute ? start.text : localTimeFromMinutes(real);
    if (!out.includes(text)) out.push(text);
  }
  return out;
}

function rainNote(ctx: PlanContext, day: number): PlanStep {
  const date = ctx.dateOf(day);
  return {
    key: dailyKey("note", date, "rain"),
    date,
    phase: ctx.phaseOf(day),
    kind: "note",
    title: "Skip watering today: the rain did the job",
    detail: "If the surface of the seeded areas dries out by late afternoon, give them one light watering.",
    why: rainWhy,
    cautions: [],
  };
}

function germinationStep(ctx: PlanContext, day: number, minutes: number, starts: readonly StartTime[]): PlanStep {
  const date = ctx.dateOf(day);
  const byHand = ctx.input.property.irrigation.kind === "none";
  const realStarts = realTimes(ctx, day, starts);
  const cycles = realStarts.length;
  return {
    key: dailyKey("water", date, 1),
    date,
    phase: ctx.phaseOf(day),
    kind: "water",
    title: byHand
      ? `Water the seeded areas lightly ${cycles} times today`
      : `Water ${cycles} times today, ${minutes} minutes ${wherePhrase(ctx)}`,
    detail:
      `Start at about ${realStarts.join(", ")}. Keep the seed and the top half inch of soil damp, not soaked; stop if water puddles or runs off.` +
      (byHand ? " Use a hose with a gentle spray until the surface is evenly damp." : zonesSentence(ctx, minutes)),
    times: realStarts,
    minutesPerCycle: minutes,
    why: germinationWhy,
    cautions: WATER_CAUTIONS,
  };
}

function deepStep(ctx: PlanContext, day: number, minutes: number, deepStart: readonly StartTime[], title?: string): PlanStep {
  const date = ctx.dateOf(day);
  const byHand = ctx.input.property.irrigation.kind === "none";
  return {
    key: dailyKey("water", date, 1),
    date,
    phase: ctx.phaseOf(day),
    kind: "water",
    title: title ?? (byHand ? "Water deeply today" : `Water deeply today, ${minutes} minutes ${wherePhrase(ctx)}`),
    detail:
      `Put down about ${ctx.program.deepWateringDepthIn} inch of water, early in the morning. Skip it if it rained that much since the last watering.` +
      (byHand ? " A hose-end sprinkler moved around the lawn does this more evenly than hand watering." : zonesSentence(ctx, minutes)),
    times: realTimes(ctx, day, deepStart),
    minutesPerCycle: minutes,
    why: deepWhy,
    cautions: WATER_CAUTIONS,
  };
}

/** Deep-watering days from `from` to `to` inclusive, `perWeek` of them in each 7-day block. */
function deepWateringDays(from: number, to: number, perWeek: number): number[] {
  const offsets = DEEP_WATERING_DAY_OFFSETS[perWeek] ?? [0];
  const days: number[] = [];
  for (let blockStart = from; blockStart <= to; blockStart += 7) {
    for (const offset of offsets) if (blockStart + offset <= to) days.push(blockStart + offset);
  }
  return days;
}

export function wateringSteps(ctx: PlanContext): PlanStep[] {
  const { program, timeline } = ctx;
  const steps: PlanStep[] = [];
  const push = (day: number, make: () => PlanStep) => {
    steps.push(ctx.rainDays.has(ctx.visitDay + day) ? rainNote(ctx, day) : make());
  };
  const deepMinutes = wholeMinutes(program.deepWateringDepthIn, ctx.precipitationRate);
  const deepStart = parseStarts([program.deepWateringTime]);

  if (timeline.germinationEnd !== null) {
    const lightMinutes = wholeMinutes(program.waterDepthPerCycleIn, ctx.precipitationRate);
    const starts = parseStarts(
      program.germinationWateringTimes ?? GERMINATION_TIMES_BY_CYCLES[program.wateringCyclesPerDayGermination] ?? [],
    );
    push(0, () => {
      const date = ctx.dateOf(0);
      const byHand = ctx.input.property.irrigation.kind === "none";
      return {
        key: dailyKey("water", date, 1),
        date,
        phase: ctx.phaseOf(0),
        kind: "water",
        title: byHand
          ? "Water the seeded areas lightly once the crew has finished"
          : `Water once the crew has finished, ${lightMinutes} minutes ${wherePhrase(ctx)}`,
        detail: "This first watering settles the seed into the soil. From tomorrow, water several times a day.",
        times: [],
        minutesPerCycle: lightMinutes,
        why: germinationWhy,
        cautions: WATER_CAUTIONS,
      };
    });
    for (let day = 1; day <= timeline.germinationEnd; day++) push(day, () => germinationStep(ctx, day, lightMinutes, starts));
    for (const day of deepWateringDays(timeline.germinationEnd + 1, timeline.establishmentEnd, program.establishmentWateringsPerWeek)) {
      push(day, () =>
        deepStep(ctx, day, deepMinutes, deepStart, day === timeline.germinationEnd! + 1 && ctx.input.property.irrigation.kind !== "none"
          ? `Switch to deep watering: ${deepMinutes} minutes ${wherePhrase(ctx)} today`
          : undefined),
      );
    }
  } else {
    const feeding = ctx.services.has("fertiliser_only") || ctx.services.has("starter_fertiliser");
    const amount = ctx.input.property.irrigation.kind === "none" ? "" : `, ${deepMinutes} minutes ${wherePhrase(ctx)}`;
    push(0, () =>
      deepStep(ctx, 0, deepMinutes, deepStart, `${feeding ? "Water the fertiliser in today" : "Water the lawn deeply today"}${amount}`),
    );
    for (const day of deepWateringDays(3, timeline.establishmentEnd, program.maturingWateringsPerWeek)) push(day, () => deepStep(ctx, day, deepMinutes, deepStart));
  }

  // Watering stops at the expected first frost: the grass stops using water
  // and lines can freeze. Germination and establishment water is not cut,
  // because the frost warning already flags that timing as a risk.
  const stopDay = ctx.frostDay !== null ? Math.min(ctx.frostDay - 1, timeline.planEnd) : timeline.planEnd;
  for (const day of deepWateringDays(timeline.establishmentEnd + 1, stopDay, program.maturingWateringsPerWeek)) {
    push(day, () => deepStep(ctx, day, deepMinutes, deepStart));
  }
  steps.push(...wateringNotes(ctx));
  return steps;
}
