import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { toDayNumber } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { inFertilizerBlackout, weekdayOfDayNumber } from "./rules/place-rules.ts";
import { parsePlanInput } from "./schemas/parse.ts";
import type { PlaceRulesInput } from "./schemas/place-rules.ts";
import { TAPER_RULE } from "./tables/watering.ts";
import { planInputArb } from "./testing/arbitraries.ts";

/*
 * Over random visits (dates 2025–2028, eight zones, every service) and random place rules
 * (blackout windows anywhere in the year, across New Year too; any set of watering days): no
 * feeding inside a blackout, no established-lawn watering on a day the place does not allow.
 */
const DAYS_IN_MONTH = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31] as const;
const monthDayArb = fc
  .integer({ min: 1, max: 12 })
  .chain((month) => fc.integer({ min: 1, max: DAYS_IN_MONTH[month - 1] ?? 28 }).map((day) => `${String(month).padStart(2, "0")}-${String(day).padStart(2, "0")}`));

const placeRulesArb: fc.Arbitrary<PlaceRulesInput> = fc.record({
  name: fc.constant("Example Place"),
  fertilizerBlackouts: fc.array(fc.record({ from: monthDayArb, to: monthDayArb }), { maxLength: 3 }),
  phosphorus: fc.constantFrom("allowed", "needs_reason") as fc.Arbitrary<"allowed" | "needs_reason">,
  watering: fc.option(
    fc.record({
      allowedWeekdays: fc.uniqueArray(fc.integer({ min: 0, max: 6 }), { minLength: 1, maxLength: 7 }),
      newLawnExemptDays: fc.integer({ min: 0, max: 60 }),
    }),
    { nil: undefined },
  ),
});

const inputArb = fc.tuple(planInputArb, placeRulesArb).map(([raw, placeRules]) => {
  const parsed = parsePlanInput({ ...raw, placeRules });
  if (!parsed.ok) throw new Error(`arbitrary built an invalid input: ${JSON.stringify(parsed.fields)}`);
  return parsed.value;
});

describe("place rules (property-based)", { timeout: 60_000 }, () => {
  it("never schedules a feeding inside a blackout window, nor established watering on a disallowed day", () => {
    fc.assert(
      fc.property(inputArb, (input) => {
        const plan = generatePlan(input);
        const rules = input.placeRules!;
        for (const step of plan.steps) {
          if (step.kind === "feed") expect(inFertilizerBlackout(rules.fertilizerBlackouts, step.date)).toBe(false);
        }
        const allowed = rules.watering?.allowedWeekdays;
        if (!allowed) return;
        const visitDay = toDayNumber(input.visit.date);
        const germinationEnds = plan.meta.germinationWateringEnds;
        const newLawnLast = germinationEnds === null ? -1 : toDayNumber(germinationEnds) - visitDay + TAPER_RULE.onceADayDays + TAPER_RULE.everyOtherDayDays;
        const waterDates = new Set<string>();
        for (const step of plan.steps) {
          if (step.kind !== "water") continue;
          expect(waterDates.has(step.date)).toBe(false);
          waterDates.add(step.date);
          const day = toDayNumber(step.date);
          if (day - visitDay > newLawnLast) expect(allowed).toContain(weekdayOfDayNumber(day));
        }
      }),
      { numRuns: 200 },
    );
  });
});
