import { minutesPerCycle } from "../../calculators/irrigation.ts";
import type { PlanContext } from "../context.ts";
import { formatNumber, plural } from "../format.ts";
import { dailyKey } from "../step-keys.ts";
import { SOURCES } from "../tables/sources.ts";
import {
  DEEP_WATERING_DAY_OFFSETS,
  ESTABLISHMENT_WATERING_RULE,
  GERMINATION_TIMES_BY_CYCLES,
  GERMINATION_WATERING_RULE,
  TAPER_RULE,
  WEEKLY_WATER_NEED,
} from "../tables/watering.ts";
import type { Why } from "../tables/provenance.ts";
import type { PlanStep } from "../types.ts";
import { wateringNotes } from "./watering-notes.ts";
import { SUMMER_SEEDING_RULE } from "../tables/seasons.ts";
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
const taperWhy: Why = {
  text: "The new grass is tall enough to mow, so its roots can reach a little deeper. Watering less often but longer each time trains them down before deep, weekly watering.",
  source: TAPER_RULE.source,
  provenance: TAPER_RULE.provenance,
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

/** Start times parsed once per plan, with their distinct texts (what a day without a clock change gets). */
interface Starts {
  readonly list: readonly StartTime[];
  readonly texts: readonly string[];
}

const parseStarts = (times: readonly string[]): Starts => ({
  list: times.map((text) => ({ text, minute: minutesOfLocalTime(text) })),
  texts: times.filter((text, i) => times.indexOf(text) === i),
});

/** Wall-clock starts that really occur that day (a 02:30 start moves past a spring-forward gap). */
function realTimes(ctx: PlanContext, day: number, starts: Starts): string[] {
  // Most plans see no spring-forward gap at all: every start is real as written.
  if (ctx.clock.gapFree) return starts.texts.slice();
  const out: string[] = [];
  for (const start of starts.list) {
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

/** Light watering's texts for a day with these start times. */
function germinationTexts(ctx: PlanContext, minutes: number, realStarts: readonly string[]): { title: string; detail: string } {
  const byHand = ctx.input.property.irrigation.kind === "none";
  const cycles = realStarts.length;
  return {
    title: byHand
      ? `Water the seeded areas lightly ${cycles} times today`
      : `Water ${cycles} times today, ${minutes} minutes ${wherePhrase(ctx)}`,
    detail:
      `Start at about ${realStarts.join(", ")}. Keep the seed and the top half inch of soil damp, not soaked; stop if water puddles or runs off.` +
      (byHand ? " Use a hose with a gentle spray until the surface is evenly damp." : zonesSentence(ctx, minutes)),
  };
}

/** The germination days' light watering; a day without a clock change gets texts composed once per plan. */
interface LightWatering {
  readonly minutes: number;
  readonly starts: Starts;
  readonly usual: { readonly title: string; readonly detail: string };
}

function germinationStep(ctx: PlanContext, day: number, light: LightWatering): PlanStep {
  const date = ctx.dateOf(day);
  const realStarts = realTimes(ctx, day, light.starts);
  const texts = ctx.clock.gapFree ? light.usual : germinationTexts(ctx, light.minutes, realStarts);
  return {
    key: dailyKey("water", date, 1),
    date,
    phase: ctx.phaseOf(day),
    kind: "water",
    title: texts.title,
    detail: texts.detail,
    times: realStarts,
    minutesPerCycle: light.minutes,
    why: germinationWhy,
    cautions: WATER_CAUTIONS,
  };
}

/** Light waterings a day: the program's, one more for cool-season seed sown in summer heat. */
function cyclesPerDay(ctx: PlanContext): number {
  const cycles = ctx.program.wateringCyclesPerDayGermination;
  const { check } = ctx.season;
  const summerSeeding = check.work === "seeding" && check.family === "cool" && check.period === "summer" && check.verdict === "early";
  return summerSeeding ? Math.min(SUMMER_SEEDING_RULE.maxCyclesPerDay, cycles + SUMMER_SEEDING_RULE.extraCyclesPerDay) : cycles;
}

/** One watering's depth: the week's "about 1 inch" shared by the week's waterings, never more than the program's deepest. */
export function depthPerWatering(ctx: PlanContext, perWeek: number): number {
  return Math.min(ctx.program.deepWateringDepthIn, WEEKLY_WATER_NEED.inches / perWeek);
}

/** One kind of watering, its texts composed once per plan rather than once per step. */
interface DeepWatering {
  readonly depthIn: number;
  readonly minutes: number;
  readonly depthText: string;
  /** How to water it: by hose, or how long each zone runs. */
  readonly howText: string;
  /** A deep watering's usual title and detail, and a taper watering's amount (": 12 minutes per zone") and detail. */
  readonly title: string;
  readonly detail: string;
  readonly taperAmount: string;
  readonly taperDetail: string;
}

function deepWatering(ctx: PlanContext, perWeek: number): DeepWatering {
  const depthIn = depthPerWatering(ctx, perWeek);
  const minutes = wholeMinutes(depthIn, ctx.precipitationRate);
  const byHand = ctx.input.property.irrigation.kind === "none";
  const depthText = formatNumber(depthIn, 2);
  const howText = byHand ? " A hose-end sprinkler moved around the lawn does this more evenly than hand watering." : zonesSentence(ctx, minutes);
  return {
    depthIn,
    minutes,
    depthText,
    howText,
    title: byHand ? "Water deeply today" : `Water deeply today, ${minutes} minutes ${wherePhrase(ctx)}`,
    detail: `Put down about ${depthText} inch of water, early in the morning: about ${WEEKLY_WATER_NEED.inches} inch a week in all, rain included. Skip it if it rained that much since the last watering.${howText}`,
    taperAmount: byHand ? "" : `: ${minutes} minutes ${wherePhrase(ctx)}`,
    taperDetail: `Put down about ${depthText} inch, early in the morning, so the soil stays damp below the surface between waterings. Skip it if it rained that much since the last watering.${howText}`,
  };
}

function deepStep(ctx: PlanContext, day: number, deep: DeepWatering, deepStart: Starts, title?: string): PlanStep {
  const date = ctx.dateOf(day);
  return {
    key: dailyKey("water", date, 1),
    date,
    phase: ctx.phaseOf(day),
    kind: "water",
    title: title ?? deep.title,
    detail: deep.detail,
    times: realTimes(ctx, day, deepStart),
    minutesPerCycle: deep.minutes,
    why: deepWhy,
    cautions: WATER_CAUTIONS,
  };
}

type TaperStage = "once_a_day" | "every_other_day";

function taperStep(ctx: PlanContext, day: number, stage: TaperStage, first: boolean, deep: DeepWatering, deepStart: Starts): PlanStep {
  const date = ctx.dateOf(day);
  const amount = deep.taperAmount;
  const title =
    stage === "once_a_day"
      ? first
        ? `From today, water once a day${amount}`
        : `Water once today${amount}`
      : first
        ? `From today, water every other day${amount}`
        : `Water today (every other day)${amount}`;
  return {
    key: dailyKey("water", date, 1),
    date,
    phase: ctx.phaseOf(day),
    kind: "water",
    title,
    detail: deep.taperDetail,
    times: realTimes(ctx, day, deepStart),
    minutesPerCycle: deep.minutes,
    why: taperWhy,
    cautions: WATER_CAUTIONS,
  };
}

/** Heavy rain was reported for that day (a function of its own: no closure made per plan). */
function rained(ctx: PlanContext, day: number): boolean {
  return ctx.rainDays.has(ctx.visitDay + day);
}

/** The day's step, or the rain note in its place. */
function push(steps: PlanStep[], ctx: PlanContext, day: number, make: () => PlanStep): void {
  steps.push(rained(ctx, day) ? rainNote(ctx, day) : make());
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
  // No watering after the expected first frost except germination's light
  // cycles: those are not cut, because the frost warning already flags that
  // timing as a risk and seed left dry dies at once.
  const stopDay = ctx.frostDay !== null ? Math.min(ctx.frostDay - 1, timeline.planEnd) : timeline.planEnd;
  const deepStart = parseStarts([program.deepWateringTime]);
  const maturing = deepWatering(ctx, program.maturingWateringsPerWeek);
  let maturingFrom = timeline.establishmentEnd + 1;

  if (timeline.germinationEnd !== null) {
    const lightMinutes = wholeMinutes(program.waterDepthPerCycleIn, ctx.precipitationRate);
    const starts = parseStarts(program.germinationWateringTimes ?? GERMINATION_TIMES_BY_CYCLES[cyclesPerDay(ctx)] ?? []);
    // Seed lying dormant gets no watering until sprouts are due in spring (rules/season-advice.ts says so).
    const sowingStart = ctx.season.sowingStartDay;
    const firstLightDay = sowingStart > 0 && ctx.mix ? sowingStart + ctx.mix.fastest.emergenceDays.min : 1;
    if (sowingStart === 0) push(steps, ctx, 0, () => {
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
    const light: LightWatering = { minutes: lightMinutes, starts, usual: germinationTexts(ctx, lightMinutes, starts.texts) };
    // The busiest loops push directly rather than through `push`: no closure per day.
    for (let day = firstLightDay; day <= timeline.germinationEnd; day++) steps.push(rained(ctx, day) ? rainNote(ctx, day) : germinationStep(ctx, day, light));

    // Taper after the first mowing: once a day, then every other day, then deep.
    const establishmentLast = Math.min(timeline.establishmentEnd, stopDay);
    const onceFrom = timeline.germinationEnd + 1;
    const everyOtherFrom = onceFrom + TAPER_RULE.onceADayDays;
    const deepFrom = everyOtherFrom + TAPER_RULE.everyOtherDayDays;
    const daily = deepWatering(ctx, 7);
    const everyOther = deepWatering(ctx, 3.5);
    for (let day = onceFrom; day < everyOtherFrom && day <= establishmentLast; day++) {
      steps.push(rained(ctx, day) ? rainNote(ctx, day) : taperStep(ctx, day, "once_a_day", day === onceFrom, daily, deepStart));
    }
    for (let day = everyOtherFrom; day < deepFrom && day <= establishmentLast; day += 2) {
      steps.push(rained(ctx, day) ? rainNote(ctx, day) : taperStep(ctx, day, "every_other_day", day === everyOtherFrom, everyOther, deepStart));
    }
    const establishment = deepWatering(ctx, program.establishmentWateringsPerWeek);
    for (const day of deepWateringDays(deepFrom, establishmentLast, program.establishmentWateringsPerWeek)) {
      push(steps, ctx, day, () =>
        deepStep(ctx, day, establishment, deepStart, day === deepFrom && ctx.input.property.irrigation.kind !== "none"
          ? `Switch to deep watering: ${establishment.minutes} minutes ${wherePhrase(ctx)} today`
          : undefined),
      );
    }
    // Establishment may be shorter than the taper; deep watering picks up after it.
    maturingFrom = Math.max(maturingFrom, deepFrom);
  } else {
    const feeding = ctx.services.has("fertiliser_only") || ctx.services.has("starter_fertiliser");
    const amount = ctx.input.property.irrigation.kind === "none" ? "" : `, ${maturing.minutes} minutes ${wherePhrase(ctx)}`;
    // Not once the frost has come: the lawn has stopped using water, and rain or snow does the job.
    if (stopDay >= 0) {
      push(steps, ctx, 0, () =>
        deepStep(ctx, 0, maturing, deepStart, `${feeding ? "Water the fertilizer in today" : "Water the lawn deeply today"}${amount}`),
      );
    }
    for (const day of deepWateringDays(3, Math.min(timeline.establishmentEnd, stopDay), program.maturingWateringsPerWeek)) {
      steps.push(rained(ctx, day) ? rainNote(ctx, day) : deepStep(ctx, day, maturing, deepStart));
    }
  }

  for (const day of deepWateringDays(maturingFrom, stopDay, program.maturingWateringsPerWeek)) {
    steps.push(rained(ctx, day) ? rainNote(ctx, day) : deepStep(ctx, day, maturing, deepStart));
  }
  steps.push(...wateringNotes(ctx));
  return steps;
}
