import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { overseedingVisit, valid, withChanges } from "./testing/fixtures.ts";
import { isRealLocalTime } from "./zone-time.ts";

// Spring-forward dates per the zones' rules in Node's ICU data (US: second
// Sunday of March; EU: last Sunday of March; New South Wales: first Sunday of October).
const SPRING_FORWARD = [
  { zone: "America/New_York", dates: ["2025-03-09", "2026-03-08", "2027-03-14"] },
  { zone: "Europe/Berlin", dates: ["2025-03-30", "2026-03-29", "2027-03-28"] },
  { zone: "Australia/Sydney", dates: ["2025-10-05", "2026-10-04", "2027-10-03"] },
] as const;

/*
 * Seed sown in late winter in a cold climate lies dormant until spring (rules/season.ts), so these
 * lawns are in a mild climate: a first frost in late December (late June in the south) makes the
 * soil warm enough by late winter for the light waterings these tests look at.
 */
const mildFrost = (visit: string, zone: string) =>
  zone.startsWith("Australia/") ? `${Number(visit.slice(0, 4)) + 1}-06-20` : `${visit.slice(0, 4)}-12-20`;

const caseArb = fc
  .constantFrom(...SPRING_FORWARD)
  .chain(({ zone, dates }) =>
    fc.record({
      zone: fc.constant(zone),
      changeDate: fc.constantFrom(...dates),
      daysBefore: fc.integer({ min: 1, max: 13 }),
      gapTime: fc.constantFrom("02:00", "02:15", "02:30", "02:45"),
    }),
  );

describe("watering times across spring-forward days (America/New_York, Europe/Berlin, Australia/Sydney)", () => {
  it("a 02:xx start never lands in the gap: it moves to the first real quarter-hour that day, and only that day", () => {
    fc.assert(
      fc.property(caseArb, ({ zone, changeDate, daysBefore, gapTime }) => {
        const visit = addDays(changeDate, -daysBefore);
        const raw = withChanges(
          {
            visit: { date: visit },
            property: { timeZone: zone, expectedFirstFrost: mildFrost(visit, zone) },
            program: { wateringCyclesPerDayGermination: 3, germinationWateringTimes: [gapTime, "12:00", "16:00"] },
          },
          overseedingVisit(),
        );
        const plan = generatePlan(valid(raw));
        const onChange = plan.steps.find((s) => s.kind === "water" && s.date === changeDate);
        const dayBefore = plan.steps.find((s) => s.kind === "water" && s.date === addDays(changeDate, -1) && (s.times?.length ?? 0) > 1);
        expect(onChange?.times?.[0]).toBe("03:00");
        expect(isRealLocalTime(changeDate, onChange?.times?.[0] ?? "", zone)).toBe(true);
        if (dayBefore) expect(dayBefore.times?.[0]).toBe(gapTime);
      }),
      { numRuns: 60 },
    );
  });

  it("a 02:30 deep-watering start is moved on the change day in the establishment phase too", () => {
    // Visit on 2026-02-14: light watering runs through the first mowing on day 21 (03-07), so the first
    // once-a-day watering of the taper, at the deep-watering time, is on the change day.
    const plan = generatePlan(
      valid(withChanges({ visit: { date: "2026-02-14" }, property: { expectedFirstFrost: mildFrost("2026-02-14", "America/New_York") }, program: { deepWateringTime: "02:30", establishmentWateringsPerWeek: 3 } })),
    );
    const deep = plan.steps.filter((s) => s.kind === "water" && s.phase !== "germination");
    expect(deep.some((s) => s.date === "2026-03-08")).toBe(true);
    for (const s of deep) {
      expect(s.times).toEqual([s.date === "2026-03-08" ? "03:00" : "02:30"]);
    }
  });
});
