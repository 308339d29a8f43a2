import type { PlanContext } from "../context.ts";
import { civilFromDays, daysFromCivil, fromDayNumber, toDayNumber } from "../dates.ts";
import type { MixFacts } from "../mix.ts";
import { dateOfKey } from "../step-keys.ts";
import { coldGroundStopNote } from "./season-advice.ts";
import type { PlanInput } from "../schemas/plan-input.ts";
import {
  CARE_WINDOW,
  CLIMATE_SHIFT_RULE,
  COLD_SOIL_RULE,
  COOL_SEEDING_WINDOW,
  DEFAULT_FIRST_FROST,
  FROST_FREE_ZONES,
  SOIL_WARMS,
  WARM_NITROGEN_CUTOFF,
  WARM_SEEDING_WINDOW,
  WINTER_RYEGRASS_WINDOW,
  type MonthDay,
} from "../tables/seasons.ts";
import { SPECIES_FACTS, type Season } from "../tables/species.ts";
import type { Hemisphere } from "../tables/timing.ts";
import type { PlanStep, SeasonCheck, SeasonPeriod, SeasonVerdict, SeasonWork } from "../types.ts";

/*
 * The season check: once per plan, from the visit date, hemisphere, frost date
 * (entered, or the hemisphere's default; none in frost-free zones) and grass
 * family, which window the work falls in and which days are closed to watering
 * and feeding (cold or frozen ground). Windows are day counts from the season's
 * first frost F and from the spring day S the soil has warmed (tables/seasons.ts).
 */

/** Added to a feeding moved past the season's cut-off. */
const MOVED_TO_SPRING = " Moved to when the grass is growing again: no feeding on cold or frozen ground.";

/** Days [from, to) as offsets from the visit. */
export interface DayRange {
  readonly from: number;
  readonly to: number;
}

export interface SeasonFacts {
  readonly check: SeasonCheck;
  /** The first frost that ends the plan's growing days, as an offset from the visit (negative when it has passed). */
  readonly frostDay: number | null;
  /** Seed waits for warm soil: the germination clock starts this many days after the visit (0 otherwise). */
  readonly sowingStartDay: number;
  /** Offsets on which no watering is planned (cold or frozen ground until spring). */
  readonly wateringClosed: readonly DayRange[];
  /** Offsets on which no feeding is planned (cold ground; warm-season lawns from late summer). */
  readonly feedingClosed: readonly DayRange[];
}

interface SeasonBounds {
  /** Spring day the soil warmed, first frost, next spring's soil warming: day numbers. */
  readonly spring: number;
  readonly frost: number;
  readonly nextSpring: number;
}

const clamp = (x: number, limit: number) => Math.max(-limit, Math.min(limit, x));
const dayIn = (year: number, md: MonthDay) => daysFromCivil(year, md.month, md.day);

/** The default frost nearest a given day (same, previous or next year). */
function nearestDefaultFrost(day: number, hemisphere: Hemisphere): number {
  const { year } = civilFromDays(day);
  const md = DEFAULT_FIRST_FROST[hemisphere];
  let best = dayIn(year, md);
  for (const y of [year - 1, year + 1]) {
    const candidate = dayIn(y, md);
    if (Math.abs(candidate - day) < Math.abs(best - day)) best = candidate;
  }
  return best;
}

/**
 * Seasons around `day` for one grass family: the latest soil-warming day on or
 * before it, the frost after that, and the spring after the frost. An entered
 * frost moves every default by the same climate shift (a later frost, a milder
 * place, an earlier spring), and is itself the frost of the season it falls in.
 */
function seasonAround(day: number, hemisphere: Hemisphere, family: Season, given: number | null): SeasonBounds {
  const shift = given === null ? 0 : clamp(given - nearestDefaultFrost(given, hemisphere), CLIMATE_SHIFT_RULE.maxDays);
  const springMd = SOIL_WARMS[family][hemisphere];
  const frostMd = DEFAULT_FIRST_FROST[hemisphere];
  const springOf = (y: number) => dayIn(y, springMd) - shift;
  const frostOf = (y: number) => dayIn(y, frostMd) + shift;
  let springYear = civilFromDays(day).year + 1;
  while (springOf(springYear) > day) springYear--;
  const spring = springOf(springYear);
  let frostYear = springYear - 1;
  while (frostOf(frostYear) <= spring) frostYear++;
  let frost = frostOf(frostYear);
  if (given !== null && given > spring && given < springOf(springYear + 1)) frost = given;
  // An entered frost far later than the hemisphere's usual date (a mild place) still gets a short cold season.
  const shortestSpring = frost + COLD_SOIL_RULE.daysAfterFirstFrost + COLD_SOIL_RULE.shortestColdDays;
  return { spring, frost, nextSpring: Math.max(springOf(springYear + 1), shortestSpring) };
}

function periodOf(day: number, b: SeasonBounds): SeasonPeriod {
  if (day >= b.frost + COLD_SOIL_RULE.daysAfterFirstFrost) return "winter";
  if (day < b.spring + COOL_SEEDING_WINDOW.springDays) return "spring";
  return day < b.frost - COOL_SEEDING_WINDOW.fromDaysBeforeFrost ? "summer" : "fall";
}

/** Which kind of work the season check judges, and for which grass family. */
function workOf(input: PlanInput, seeding: boolean, mix: MixFacts | null, lawnSeason: Season | "mixed"): { work: SeasonWork; family: Season } {
  if (!seeding) return { work: "care", family: lawnSeason === "warm" ? "warm" : "cool" };
  const intoTurf = input.visit.services.some((s) => s === "overseeding" || s === "slit_seeding");
  const ryegrass = input.visit.seedMix.some((e) => e.species === "perennial_ryegrass");
  if (lawnSeason === "warm" && intoTurf && ryegrass) return { work: "winter_overseeding", family: "cool" };
  const warmSeed = mix !== null && input.visit.seedMix.every((e) => SPECIES_FACTS[e.species].season === "warm");
  return { work: "seeding", family: warmSeed ? "warm" : "cool" };
}

interface Verdict {
  readonly verdict: SeasonVerdict;
  readonly window: { readonly from: number; readonly to: number } | null;
  readonly waitsForSpring: boolean;
}

function verdictOf(work: SeasonWork, family: Season, day: number, b: SeasonBounds): Verdict {
  const cold = b.frost + COLD_SOIL_RULE.daysAfterFirstFrost;
  if (work === "winter_overseeding") {
    const from = b.frost - WINTER_RYEGRASS_WINDOW.fromDaysBeforeFrost;
    const to = b.frost - WINTER_RYEGRASS_WINDOW.untilDaysBeforeFrost;
    const window = { from, to };
    if (day < from) return { verdict: "early", window, waitsForSpring: false };
    return { verdict: day <= to ? "in_window" : "late", window, waitsForSpring: false };
  }
  if (work === "seeding" && family === "cool") {
    const window = { from: b.frost - COOL_SEEDING_WINDOW.fromDaysBeforeFrost, to: b.frost - COOL_SEEDING_WINDOW.untilDaysBeforeFrost };
    if (day >= cold) return { verdict: "dormant_seeding", window, waitsForSpring: true };
    if (day > window.to) return { verdict: "late", window, waitsForSpring: false };
    return { verdict: day >= window.from ? "in_window" : "early", window, waitsForSpring: false };
  }
  if (work === "seeding") {
    const window = { from: b.spring, to: b.frost - WARM_SEEDING_WINDOW.untilDaysBeforeFrost };
    if (day >= cold) {
      const early = b.nextSpring - day <= WARM_SEEDING_WINDOW.earlyWithinDays;
      return { verdict: early ? "early" : "dormant_seeding", window, waitsForSpring: true };
    }
    return { verdict: day <= window.to ? "in_window" : "late", window, waitsForSpring: false };
  }
  // Cold ground with spring close: the work is early for next season rather than late for this one.
  const springNear = day >= cold && b.nextSpring - day <= WARM_SEEDING_WINDOW.earlyWithinDays;
  if (family === "cool") {
    const fallFrom = b.frost - CARE_WINDOW.coolFallFromDaysBeforeFrost;
    if (springNear) return { verdict: "early", window: null, waitsForSpring: false };
    if (day >= cold) return { verdict: "late", window: { from: fallFrom, to: cold - 1 }, waitsForSpring: false };
    if (day >= fallFrom) return { verdict: "in_window", window: { from: fallFrom, to: cold - 1 }, waitsForSpring: false };
    const springTo = b.spring + COOL_SEEDING_WINDOW.springDays - 1;
    return day <= springTo
      ? { verdict: "in_window", window: { from: b.spring, to: springTo }, waitsForSpring: false }
      : { verdict: "early", window: { from: fallFrom, to: cold - 1 }, waitsForSpring: false };
  }
  const window = { from: b.spring, to: b.frost - WARM_NITROGEN_CUTOFF.daysBeforeFirstFrost };
  if (day > window.to) return springNear ? { verdict: "early", window: null, waitsForSpring: false } : { verdict: "late", window, waitsForSpring: false };
  return { verdict: "in_window", window, waitsForSpring: false };
}

const FROST_FREE_CHECK = (work: SeasonWork, family: Season): SeasonCheck => ({
  verdict: "in_window",
  work,
  family,
  period: null,
  firstFrost: null,
  firstFrostAssumed: false,
  window: null,
  soilWarms: null,
  sowingStarts: null,
  noWatering: [],
  noFeeding: [],
});

/** Closed days `[start, end)` as visit offsets; overlapping ones (an entered frost far from the usual date) merged. */
function closedRanges(starts: readonly number[], ends: readonly number[], visitDay: number): DayRange[] {
  const ranges = starts
    .map((from, i) => ({ from: from - visitDay, to: (ends[i] ?? from) - visitDay }))
    .filter((r) => r.to > r.from)
    .sort((a, b) => a.from - b.from);
  const merged: DayRange[] = [];
  for (const r of ranges) {
    const last = merged[merged.length - 1];
    if (last && r.from <= last.to) merged[merged.length - 1] = { from: last.from, to: Math.max(last.to, r.to) };
    else merged.push(r);
  }
  return merged;
}

const datesOf = (r: DayRange, visitDay: number) => ({ start: fromDayNumber(visitDay + r.from), end: fromDayNumber(visitDay + r.to - 1) });

export function seasonOf(
  input: PlanInput,
  visitDay: number,
  hemisphere: Hemisphere,
  lawnSeason: Season | "mixed",
  seeding: boolean,
  mix: MixFacts | null,
): SeasonFacts {
  const { work, family } = workOf(input, seeding, mix, lawnSeason);
  const given = input.property.expectedFirstFrost ? toDayNumber(input.property.expectedFirstFrost) : null;
  if (given === null && FROST_FREE_ZONES.has(input.property.timeZone)) {
    return { check: FROST_FREE_CHECK(work, family), frostDay: null, sowingStartDay: 0, wateringClosed: [], feedingClosed: [] };
  }
  const bounds = seasonAround(visitDay, hemisphere, family, given);
  const verdict = verdictOf(work, family, visitDay, bounds);
  const sowingStartDay = verdict.waitsForSpring ? bounds.nextSpring - visitDay : 0;
  // The frost that ends the growing days the plan works in: next season's when the seed waits for spring.
  const growing = verdict.waitsForSpring ? seasonAround(bounds.nextSpring, hemisphere, family, given) : bounds;

  // Closed days this winter and next, for the family judged: the new grass's when seeding (a
  // ryegrass-overseeded warm lawn grows in winter: cool rules), the lawn's otherwise.
  const now = bounds;
  const next = seasonAround(now.nextSpring, hemisphere, family, given);
  const coldFrom = (b: SeasonBounds) => b.frost + COLD_SOIL_RULE.daysAfterFirstFrost;
  const feedFrom = (b: SeasonBounds) =>
    family === "warm" ? b.frost - WARM_NITROGEN_CUTOFF.daysBeforeFirstFrost : coldFrom(b);
  const wateringClosed = closedRanges([coldFrom(now), coldFrom(next)], [now.nextSpring, next.nextSpring], visitDay);
  const feedingClosed = closedRanges([feedFrom(now), feedFrom(next)], [now.nextSpring, next.nextSpring], visitDay);

  return {
    check: {
      verdict: verdict.verdict,
      work,
      family,
      period: periodOf(visitDay, bounds),
      firstFrost: fromDayNumber(bounds.frost),
      firstFrostAssumed: given === null || given !== bounds.frost,
      window: verdict.window ? { start: fromDayNumber(verdict.window.from), end: fromDayNumber(verdict.window.to) } : null,
      soilWarms: fromDayNumber(bounds.nextSpring),
      sowingStarts: verdict.waitsForSpring ? fromDayNumber(bounds.nextSpring) : null,
      noWatering: wateringClosed.map((r) => datesOf(r, visitDay)),
      noFeeding: feedingClosed.map((r) => datesOf(r, visitDay)),
    },
    frostDay: growing.frost - visitDay,
    sowingStartDay,
    wateringClosed,
    feedingClosed,
  };
}

export const inRanges = (day: number, ranges: readonly DayRange[]): DayRange | null => {
  for (const r of ranges) if (day >= r.from && day < r.to) return r;
  return null;
};

/** Index of the closed range (inclusive ISO dates) holding `date`, or -1: ISO dates compare as text, no parsing per step. */
function closedIndex(date: string, ranges: SeasonCheck["noWatering"]): number {
  for (let i = 0; i < ranges.length; i++) {
    const r = ranges[i]!;
    if (date >= r.start && date <= r.end) return i;
  }
  return -1;
}

/**
 * Post-pass over every water step (and the rain notes standing in for them): none on cold or
 * frozen ground, whatever rule made it. Chain after any rule that adds watering.
 */
export function frozenGroundWatering(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  const closed = ctx.season.check.noWatering;
  if (closed.length === 0) return steps;
  const out: PlanStep[] = [];
  let firstCut: number | null = null;
  for (const s of steps) {
    const i = s.kind === "water" || (s.kind === "note" && s.key.endsWith(":rain")) ? closedIndex(s.date, closed) : -1;
    if (i === -1) out.push(s);
    else if (s.kind === "water" && firstCut === null) firstCut = Math.max(0, ctx.season.wateringClosed[i]!.from);
  }
  if (firstCut !== null) out.push(coldGroundStopNote(ctx, firstCut));
  return out;
}

/**
 * Post-pass over every feed step: none from the season's cut-off until spring (cold or frozen
 * ground; warm-season lawns from late summer). A one-off feeding moves to the day the season
 * reopens when the plan still runs then; a dated one is dropped. Chain after every rule that
 * adds feeding (fall program, blackout dates…).
 */
export function seasonFeedCutoff(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  const closed = ctx.season.check.noFeeding;
  if (closed.length === 0) return steps;
  const out: PlanStep[] = [];
  for (const s of steps) {
    const i = s.kind === "feed" ? closedIndex(s.date, closed) : -1;
    if (i === -1) {
      out.push(s);
      continue;
    }
    const reopen = ctx.season.feedingClosed[i]!.to;
    if (dateOfKey(s.key) === null && reopen <= ctx.timeline.planEnd) {
      out.push({ ...s, date: ctx.dateOf(reopen), phase: ctx.phaseOf(reopen), detail: s.detail + MOVED_TO_SPRING });
    }
  }
  return out;
}
