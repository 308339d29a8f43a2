import { describe, expect, it } from "vitest";
import { addDays, daysBetween } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { recomputePlan } from "./recompute.ts";
import { overseedingVisit, valid, withChanges } from "./testing/fixtures.ts";
import type { PlanStep } from "./types.ts";

const markDone = (steps: readonly PlanStep[], keys: readonly string[]): PlanStep[] =>
  steps.map((s) => (keys.includes(s.key) ? { ...s, state: "done" as const } : s));

describe("recomputePlan", () => {
  const original = generatePlan(valid(overseedingVisit()));

  it("keeps ticked-off steps exactly as they were and regenerates from today on", () => {
    const done = ["water:2026-09-11:1", "water:2026-09-12:1"];
    const previous = { steps: markDone(original.steps, done), prepSteps: original.prepSteps };
    const again = recomputePlan(previous, valid(overseedingVisit()), "2026-09-13");
    for (const key of done) {
      expect(again.steps.find((s) => s.key === key)).toEqual(previous.steps.find((s) => s.key === key));
    }
    expect(again.meta.recomputedOn).toBe("2026-09-13");
    expect(again.steps.map((s) => s.key)).toEqual(original.steps.map((s) => s.key));
  });

  it("moving the visit two days later shifts future steps and keeps the done past ones", () => {
    const previous = { steps: markDone(original.steps, ["water:2026-09-10:1"]) };
    const moved = recomputePlan(previous, valid(withChanges({ visit: { date: "2026-09-12" } })), "2026-09-11");
    expect(moved.steps.find((s) => s.key === "water:2026-09-10:1")?.state).toBe("done");
    expect(moved.meta.firstMowDate).toBe(addDays(original.meta.firstMowDate ?? "", 2));
    // No step from the old schedule survives in the future unless the new one has it too.
    expect(moved.steps.filter((s) => s.date >= "2026-09-11").every((s) => s.state === undefined)).toBe(true);
  });

  it("a one-off done early (starter feed) is not scheduled again after the visit moves", () => {
    const withoutStarter = withChanges({ visit: { services: ["aeration", "overseeding"], products: [] } });
    const first = generatePlan(valid(withoutStarter));
    const previous = { steps: markDone(first.steps, ["feed:starter"]) };
    const moved = recomputePlan(previous, valid(withChanges({ visit: { date: "2026-09-14" } }, withoutStarter)), "2026-09-12");
    const starters = moved.steps.filter((s) => s.key === "feed:starter");
    expect(starters).toHaveLength(1);
    expect(starters[0]?.state).toBe("done");
  });

  it("early sprouts in a tall fescue + bluegrass mix shorten light watering, but not below 14 days, the bluegrass estimate or the first mowing", () => {
    const mixed = withChanges({
      visit: {
        seedMix: [
          { species: "tall_fescue", percent: 85, purityPct: 98, germinationPct: 90 },
          { species: "kentucky_bluegrass", percent: 15, purityPct: 97, germinationPct: 85 },
        ],
      },
    });
    const before = generatePlan(valid(mixed));
    const sprouts = withChanges({ options: { observations: [{ kind: "sprouts_seen", onDay: 7 }] } }, mixed);
    const after = recomputePlan(before, valid(sprouts), "2026-09-17");
    const daysBefore = daysBetween("2026-09-10", before.meta.germinationWateringEnds ?? "");
    const daysAfter = daysBetween("2026-09-10", after.meta.germinationWateringEnds ?? "");
    // Bluegrass up by day 30 at the latest, mowable a week later.
    expect(daysBefore).toBe(37);
    // Tall fescue showing on day 7 = the start of its 7–14 range, so bluegrass is expected near day 14 of its 14–30,
    // mowable a week later: light watering through day 21.
    expect(daysAfter).toBe(21);
    expect(after.meta.germinationWateringEnds).toBe(after.meta.firstMowDate);
    expect(daysBetween("2026-09-10", after.meta.firstMowDate ?? "")).toBeGreaterThanOrEqual(14);
    expect(daysBetween("2026-09-10", after.meta.firstMowDate ?? "")).toBeLessThan(daysBetween("2026-09-10", before.meta.firstMowDate ?? ""));
  });

  it("late sprouts lengthen light watering to a week past the sprouts (common practice)", () => {
    const late = valid(withChanges({ options: { observations: [{ kind: "sprouts_seen", onDay: 18 }] } }));
    expect(daysBetween("2026-09-10", generatePlan(late).meta.germinationWateringEnds ?? "")).toBe(25);
  });

  it("each skipped day of light watering is made up at the end of germination", () => {
    const skipped = valid(
      withChanges({
        options: {
          observations: [
            { kind: "step_skipped", stepKey: "water:2026-09-12:1" },
            { kind: "step_skipped", stepKey: "water:2026-09-13:1" },
          ],
        },
      }),
    );
    const plan = generatePlan(skipped);
    expect(plan.meta.germinationWateringEnds).toBe(addDays("2026-10-01", 2));
    expect(plan.steps.find((s) => s.key === "water:2026-09-12:1")?.state).toBe("skipped");
  });

  it("a past step nobody ticked stays as history, but an untouched one-off still to do takes its new date", () => {
    const withoutStarter = withChanges({ visit: { services: ["aeration", "overseeding"], products: [] } });
    const first = generatePlan(valid(withoutStarter)); // starter on 2026-09-11
    const again = recomputePlan(first, valid(withoutStarter), "2026-09-12");
    expect(again.steps.find((s) => s.key === "water:2026-09-11:1")).toEqual(first.steps.find((s) => s.key === "water:2026-09-11:1"));
    const later = recomputePlan(first, valid(withChanges({ visit: { date: "2026-09-13" } }, withoutStarter)), "2026-09-12");
    expect(later.steps.find((s) => s.key === "feed:starter")?.date).toBe("2026-09-14");
  });

  it("refuses to run without a real 'today'", () => {
    expect(() => recomputePlan(original, valid(overseedingVisit()), "2026-02-30")).toThrow(RangeError);
  });
});
