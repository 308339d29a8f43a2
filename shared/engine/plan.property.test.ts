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

const RUNS = { numRuns: 150 };
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

  it("light watering never ends before the first mowing, whatever the date, zone, mix or observations (Nebraska Extension 2021)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const plan = generatePlan(input);
        if (!plan.meta.seeding) return;
        const { firstMowDate, germinationWateringEnds } = plan.meta;
        expect(firstMowDate).not.toBeNull();
        expect(germinationWateringEnds! >= firstMowDate!).toBe(true);
        // Every day up to the first mowing has its light cycles (or a rain note standing in for them). Counted by
        // phase, not by start times: two small-hours starts can merge into one on a spring-forward day.
        const lightOrRain = new Set(
          plan.steps.filter((s) => (s.kind === "water" && s.phase === "germination") || s.key.endsWith(":rain")).map((s) => s.date),
        );
        for (let day = 1; addDays(input.visit.date, day) <= firstMowDate!; day++) {
          expect(lightOrRain.has(addDays(input.visit.date, day)), addDays(input.visit.date, day)).toBe(true);
        }
      }),
      RUNS,
    );
  });

  it("no watering after the expected first frost but germination's light cycles (common practice)", () => {
    fc.assert(
      fc.property(validInputArb, (input) => {
        const frost = input.property.expectedFirstFrost;
        if (frost === undefined) return;
        const plan = generatePlan(input);
        for (const s of plan.steps) {
          if (s.kind === "water" && s.date >= frost) expect(s.phase, s.key).toBe("germination");
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
