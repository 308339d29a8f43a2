import { describe, expect, it } from "vitest";
import { generatePlan } from "./generate.ts";
import { valid, withChanges } from "./testing/fixtures.ts";
import { wateringsOf, wateringStarts } from "./waterings.ts";

describe("waterings of a step", () => {
  it("gives a flat lawn's times one run each", () => {
    expect(wateringsOf({ times: ["07:00", "12:00"] })).toEqual([
      { start: "07:00", runs: ["07:00"] },
      { start: "12:00", runs: ["12:00"] },
    ]);
    expect(wateringsOf({})).toEqual([]);
  });

  it("groups a slope's runs under the watering they belong to", () => {
    const step = {
      times: ["12:00", "07:00", "07:32", "08:04", "12:32", "13:04"],
      cycleAndSoak: { runsPerCycle: 3, cycleStarts: ["07:00", "12:00"] },
    };
    expect(wateringsOf(step)).toEqual([
      { start: "07:00", runs: ["07:00", "07:32", "08:04"] },
      { start: "12:00", runs: ["12:00", "12:32", "13:04"] },
    ]);
    expect(wateringStarts(step)).toEqual(["07:00", "12:00"]);
  });

  it("matches what the engine writes for germination watering on a steep slope", () => {
    const plan = generatePlan(valid(withChanges({ property: { slope: "steep" } })));
    const split = plan.steps.filter((s) => s.kind === "water" && s.cycleAndSoak && (s.times?.length ?? 0) > 0);
    expect(split.length).toBeGreaterThan(0);
    for (const step of split) {
      const waterings = wateringsOf(step);
      expect(waterings.map((w) => w.start)).toEqual(step.cycleAndSoak!.cycleStarts);
      // Every run listed once, under one watering, and no watering has more runs than the split made.
      expect(waterings.flatMap((w) => w.runs).sort()).toEqual([...step.times!].sort());
      for (const w of waterings) expect(w.runs.length).toBeLessThanOrEqual(step.cycleAndSoak!.runsPerCycle);
    }
  });
});
