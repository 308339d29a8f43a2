import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, daysBetween, isValidIsoDate, isValidLocalTime } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { recomputePlan } from "./recompute.ts";
import { violatesHoldOff } from "./rules/hold-offs.ts";
import { parsePlanInput } from "./schemas/parse.ts";
import type { PlanInput } from "./schemas/plan-input.ts";
import { CAUTIONS } from "./tables/cautions.ts";
import { SPECIES_FACTS } from "./tables/species.ts";
import { planInputArb } from "./testing/arbitraries.ts";
import type { Plan, PlanStep } from "./types.ts";
import { isRealLocalTime } from "./zone-time.ts";

/*
 * Invariants that must hold for every valid input, not just the examples.
 * The arbitraries cover eight zones (incl. New York, Berlin, Sydney and the
 * half-hour Lord Howe change), 2025–2028 dates, custom watering times in
 * the small hours, rain, sprouts and every service combination.
 */
const validInputArb = planInputArb.map((raw) => {
  const parsed = parsePlanInput(raw);
  if (!parsed.ok) throw new Error(`arbitrary built an invalid input: ${JSON.stringify(parsed.fields)}`);
  return parsed.value;
});

const RUNS = { numRuns: Number(process.env.PROPERTY_RUNS ?? 150) };

const inDateRanges = (date: string, ranges: readonly { start: string; end: string }[]) => ranges.some((r) => date >= r.start && date <= r.end);

/** Month-day spans ("MM-DD", inclusive; the first may run over New Year). */
type MonthDays = readonly [string, string];
const inMonthDays = (date: string, [from, to]: MonthDays) => {
  const md = date.slice(5);
  return from <= to ? md >= from && md <= to : md >= from || md <= to;
};
const COLD_MONTH_DAYS: Record<"north" | "south", Record<"cool" | "warm", MonthDays>> = {
  north: { cool: ["10-29", "03-31"], warm: ["10-29", "04-30"] },
  south: { cool: ["04-29", "09-30"], warm: ["04-29", "10-31"] },
};
const WARM_FEED_MONTH_DAYS: Record<"north" | "south", MonthDays> = { north: ["09-03", "04-30"], south: ["03-04", "10-31"] };
const allSteps = (plan: Plan): PlanStep[] => [...plan.prepSteps, ...plan.steps];

// Each property generates hundreds of plans; on a busy shared machine that can pass the 5 s default.
describe("care plan invariants (property-based)", { timeout: 30_000 }, () => {
  it("every generated arbitrary input is valid (guards the generators themselves)", () => {
    fc.assert(
      fc.property(planInputArb, (raw) => {
        expect(parsePlanInput(raw).ok).toBe(true);
      }),
      RUNS,
    );
  });

  it("steps are in date order; prep steps fall before the visit and daily steps on or after it", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        for (const list of [plan.prepSteps, plan.steps]) {
          for (let i = 1; i < list.length; i++) expect(list[i - 1]!.date <= list[i]!.date).toBe(true);
        }
        for (const s of plan.prepSteps) expect(s.date < input.visit.date).toBe(true);
        for (const s of plan.steps) expect(s.date >= input.visit.date).toBe(true);
      }),
      RUNS,
    );
  });

  it("no step falls inside a hold-off it is restricted by, and no feed step recommends high-N quick-release inside that hold-off", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const highN = plan.holdOffs.find((h) => h.kind === "high_n_quick_release");
        for (const step of allSteps(plan)) {
          expect(violatesHoldOff(step, plan.holdOffs)).toBe(false);
          if (step.kind === "feed" && highN && step.date >= highN.start && step.date <= highN.end) {
            expect(step.feed?.highNQuickRelease).toBe(false);
          }
        }
      }),
      RUNS,
    );
  });

  it("no mowing of new grass before the program minimum, nor before the slowest species can be up", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        if (!plan.meta.seeding) return;
        const sproutsReported = input.options.observations.some((o) => o.kind === "sprouts_seen");
        const slowest = Math.max(...input.visit.seedMix.map((e) => SPECIES_FACTS[e.species].emergenceDays.max));
        for (const mow of plan.steps.filter((s) => s.kind === "mow")) {
          const day = daysBetween(input.visit.date, mow.date);
          expect(day).toBeGreaterThanOrEqual(input.program.firstMowMinDays);
          if (!sproutsReported) expect(day).toBeGreaterThan(slowest);
          expect(mow.date >= (plan.meta.firstMowDate ?? "")).toBe(true);
        }
      }),
      RUNS,
    );
  });

  it("light watering lasts at least the program's germination days (never under 14)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        if (!plan.meta.seeding) return;
        const lastDay = daysBetween(input.visit.date, plan.meta.germinationWateringEnds ?? input.visit.date);
        expect(lastDay).toBeGreaterThanOrEqual(Math.max(14, input.program.germinationDays));
      }),
      RUNS,
    );
  });

  it("light watering never ends before the first mowing, except on cold ground (Nebraska Extension 2021; cold soil common practice)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        if (!plan.meta.seeding) return;
        const { firstMowDate, germinationWateringEnds, season } = plan.meta;
        expect(firstMowDate).not.toBeNull();
        expect(germinationWateringEnds! >= firstMowDate!).toBe(true);
        // Light watering starts the day after the visit, or when sprouts are due once dormant seed wakes in spring.
        const fastest = Math.min(...input.visit.seedMix.map((e) => SPECIES_FACTS[e.species].emergenceDays.min));
        const from = season?.sowingStarts ? addDays(season.sowingStarts, fastest) : addDays(input.visit.date, 1);
        const first = input.options.today !== undefined && input.options.today > from ? input.options.today : from;
        // Every day up to the first mowing has its light cycles (or a rain note standing in for them), but on cold
        // ground. Counted by phase, not by start times: two small-hours starts can merge on a spring-forward day.
        const lightOrRain = new Set(
          plan.steps.filter((s) => (s.kind === "water" && s.phase === "germination") || s.key.endsWith(":rain")).map((s) => s.date),
        );
        for (let date = first; date <= firstMowDate!; date = addDays(date, 1)) {
          if (inDateRanges(date, season?.noWatering ?? [])) continue;
          expect(lightOrRain.has(date), date).toBe(true);
        }
      }),
      RUNS,
    );
  });

  it("no watering after the season's first frost but germination's light cycles, until the soil warms (common practice)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const { firstFrost, soilWarms } = plan.meta.season!;
        if (firstFrost === null || soilWarms === null) return;
        for (const s of plan.steps) {
          if (s.kind === "water" && s.date >= firstFrost && s.date < soilWarms) expect(s.phase, s.key).toBe("germination");
        }
      }),
      RUNS,
    );
  });

  it("never a watering on cold or frozen ground: from two weeks after the first frost until the soil warms (common practice)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const season = plan.meta.season!;
        if (season.firstFrost !== null) {
          // The cut-off is tied to the season's frost: its first closed range starts two weeks after it.
          expect(season.noWatering[0]?.start).toBe(addDays(season.firstFrost, 14));
        }
        for (const s of allSteps(plan)) {
          if (s.kind === "water") expect(inDateRanges(s.date, season.noWatering), s.key).toBe(false);
        }
        // Without an entered frost the closed days are the hemisphere's defaults (tables/seasons.ts, from memory):
        // frost Oct 15 / Apr 15 + 14 days, soil warm Apr 1 / Oct 1 (cool) or May 1 / Nov 1 (warm).
        if (input.property.expectedFirstFrost !== undefined || input.property.timeZone === "Pacific/Honolulu") return;
        const winter = COLD_MONTH_DAYS[plan.meta.hemisphere][season.family];
        for (const s of plan.steps) if (s.kind === "water") expect(inMonthDays(s.date, winter), s.key).toBe(false);
      }),
      RUNS,
    );
  });

  it("never a feeding after the season's cut-off: cold ground, and warm-season lawns from six weeks before the frost (common practice; from memory)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const season = plan.meta.season!;
        for (const s of allSteps(plan)) {
          if (s.kind === "feed") expect(inDateRanges(s.date, season.noFeeding), s.key).toBe(false);
        }
        if (input.property.expectedFirstFrost !== undefined || input.property.timeZone === "Pacific/Honolulu") return;
        // Defaults: cool as for watering; warm from Oct 15 − 42 days = Sep 3 (Apr 15 − 42 = Mar 4) until May 1 (Nov 1).
        const cutOff = season.family === "warm" ? WARM_FEED_MONTH_DAYS[plan.meta.hemisphere] : COLD_MONTH_DAYS[plan.meta.hemisphere].cool;
        for (const s of plan.steps) if (s.kind === "feed") expect(inMonthDays(s.date, cutOff), s.key).toBe(false);
      }),
      RUNS,
    );
  });

  it("dormant seed gets no watering, mowing or feeding before the soil warms, and the plan says when that is", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const { season } = plan.meta;
        if (season?.verdict !== "dormant_seeding") return;
        expect(season.sowingStarts).not.toBeNull();
        for (const s of plan.steps) {
          if (s.kind === "water" || s.kind === "mow" || s.kind === "feed") expect(s.date >= season.sowingStarts!, s.key).toBe(true);
        }
        const wakeUp = plan.steps.find((s) => s.key === "note:spring_wake_up");
        const today = input.options.today;
        if (today === undefined || today <= season.sowingStarts!) expect(wakeUp?.date).toBe(season.sowingStarts);
        expect(plan.warnings.some((w) => w.code === "dormant_seeding" && w.audience === "homeowner")).toBe(true);
      }),
      RUNS,
    );
  });

  it("no step before the plan's creation day, so none is born missed", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const today = input.options.today;
        if (today === undefined) return;
        const plan = generatePlan(input);
        for (const s of allSteps(plan)) {
          expect(s.date >= today, s.key).toBe(true);
          expect(s.state).toBeUndefined();
        }
      }),
      RUNS,
    );
  });

  it("every date is a real calendar date and every watering time a real local time in the property's zone", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        const zone = input.property.timeZone;
        for (const step of allSteps(plan)) {
          expect(isValidIsoDate(step.date)).toBe(true);
          for (const time of step.times ?? []) {
            expect(isValidLocalTime(time)).toBe(true);
            expect(isRealLocalTime(step.date, time, zone), `${step.date} ${time} ${zone}`).toBe(true);
          }
        }
        for (const h of plan.holdOffs) expect(isValidIsoDate(h.start) && isValidIsoDate(h.end)).toBe(true);
      }),
      RUNS,
    );
  });

  it("every step explains itself: a plain title, a why with source and provenance, and known cautions", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        for (const step of allSteps(plan)) {
          expect(step.title).not.toMatch(/_|undefined|NaN|Infinity/);
          expect(step.detail).not.toMatch(/undefined|NaN|Infinity/);
          expect(step.why.text.length).toBeGreaterThan(0);
          expect(step.why.source.length).toBeGreaterThan(0);
          expect(["published", "common practice", "from memory"]).toContain(step.why.provenance);
          for (const id of step.cautions) expect(CAUTIONS[id]).toBeDefined();
          if (step.kind === "water" && step.minutesPerCycle !== undefined) {
            expect(Number.isInteger(step.minutesPerCycle) && step.minutesPerCycle >= 1).toBe(true);
          }
        }
      }),
      RUNS,
    );
  });

  it("step keys are unique, so a tick-off always finds exactly one step", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const keys = allSteps(generatePlan(input)).map((s) => s.key);
        expect(new Set(keys).size).toBe(keys.length);
      }),
      RUNS,
    );
  });

  it("the same input gives a deep-equal plan (and generating does not mutate the input)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const copy: PlanInput = structuredClone(input);
        expect(generatePlan(input)).toEqual(generatePlan(copy));
        expect(input).toEqual(copy);
      }),
      RUNS,
    );
  });

  it("recompute keeps every completed step unchanged, whatever 'today' and the new input are", () => {
    fc.assert(
      fc.property(
        validInputArb,
        validInputArb,
        fc.integer({ min: -10, max: 90 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (input, newInput, todayOffset, doneShare) => {
          const plan = generatePlan(input);
          const steps = plan.steps.map((s, i) => (i % 10 < doneShare * 10 ? { ...s, state: "done" as const } : s));
          const today = addDays(input.visit.date, todayOffset);
          const again = recomputePlan({ steps, prepSteps: plan.prepSteps }, newInput, today);
          for (const done of steps.filter((s) => s.state === "done")) {
            expect(again.steps.filter((s) => s.key === done.key)).toEqual([done]);
          }
          const keys = again.steps.map((s) => s.key);
          expect(new Set(keys).size).toBe(keys.length);
        },
      ),
      { numRuns: 100 },
    );
  });
});
