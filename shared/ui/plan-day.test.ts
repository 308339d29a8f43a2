import { describe, expect, it } from "vitest";
import type { StoredPlan } from "#shared/schemas/plans";
import { describePlanDay } from "./plan-day.ts";

const step = (date: string, kind: string, state: "pending" | "done" | "skipped") => ({ date, kind, state }) as StoredPlan["steps"][number];

const plan = {
  timeZone: "America/New_York",
  visitDate: "2026-11-25",
  phases: [
    { phase: "prep", start: "2026-11-17", end: "2026-11-24" },
    { phase: "germination", start: "2026-11-25", end: "2026-12-09" },
    { phase: "establishment", start: "2026-12-10", end: "2027-01-06" },
  ],
  steps: [
    step("2026-12-01", "water", "done"),
    step("2026-12-02", "water", "done"),
    step("2026-12-03", "water", "pending"),
    step("2026-11-30", "mow", "skipped"),
    step("2026-12-01", "feed", "skipped"),
  ],
};

describe("describePlanDay", () => {
  it("names the phase day, the last watering and the skipped steps on the lawn's calendar", () => {
    // 02:00 UTC on 4 Dec is still 3 Dec in New York: day 9 of germination (25 Nov is day 1).
    const day = describePlanDay(plan, new Date("2026-12-04T02:00:00Z"));
    expect(day.today).toBe("2026-12-03");
    expect(day.summary).toBe("day 9 of the germination phase, last watered yesterday, 2 steps skipped");
    expect(day.dayOfPlan).toBe(9);
  });

  it("before the visit and after the last phase", () => {
    expect(describePlanDay(plan, new Date("2026-11-20T15:00:00Z")).where).toBe("5 days before the visit");
    expect(describePlanDay(plan, new Date("2027-01-09T15:00:00Z")).where).toBe("the plan ended 3 days ago");
  });
});
