import { describe, expect, it } from "vitest";
import { addDays } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { recomputePlan } from "./recompute.ts";
import { valid, withChanges } from "./testing/fixtures.ts";

// The fixture's visit is 2026-09-10 (with core aeration): mow-down cuts on 09-02 and 09-09, hazards flagged,
// debris cleared and a "water the day before if dry" note on 09-09.
describe("no step is born missed", () => {
  it("a plan made on the visit day has no 'before the visit' steps and nothing dated earlier", () => {
    const plan = generatePlan(valid(withChanges({ options: { today: "2026-09-10" } })));
    expect(plan.prepSteps).toEqual([]);
    expect(plan.steps.every((s) => s.date >= "2026-09-10")).toBe(true);
    expect(plan.meta.phases.map((p) => p.phase)).not.toContain("prep");
    // The visit day's own steps are still there.
    expect(plan.steps.some((s) => s.date === "2026-09-10" && s.kind === "water")).toBe(true);
  });

  it("an imported visit from two weeks ago starts the plan today, with the rest of it unchanged", () => {
    const today = addDays("2026-09-10", 14);
    const full = generatePlan(valid(withChanges({})));
    const made = generatePlan(valid(withChanges({ options: { today } })));
    expect(made.steps).toEqual(full.steps.filter((s) => s.date >= today));
    expect(made.steps.length).toBeGreaterThan(0);
  });

  it("a visit booked ahead keeps the prep steps still to come", () => {
    const plan = generatePlan(valid(withChanges({ options: { today: "2026-09-05" } })));
    // The first mow-down cut (09-02) is already past; the last cut and the day-before chores
    // (including aeration's "water the day before if dry" note) are not.
    expect(plan.prepSteps.map((s) => `${s.kind} ${s.date}`).sort()).toEqual([
      "clear_debris 2026-09-09",
      "flag_hazards 2026-09-09",
      "note 2026-09-09",
      "prep_mow 2026-09-09",
    ]);
  });

  it("recomputing such a plan the same day gives the same steps (recompute only redoes from today on)", () => {
    const input = valid(withChanges({ options: { today: "2026-09-10" } }));
    const made = generatePlan(input);
    const again = recomputePlan({ steps: made.steps, prepSteps: made.prepSteps }, input, "2026-09-10");
    expect(again.steps).toEqual(made.steps);
    expect(again.prepSteps).toEqual([]);
  });
});
