import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import { winterRyegrassVisit } from "../testing/warm-fixtures.ts";
import { mowDownStages } from "./prep.ts";

describe("mowDownStages (one-third rule: University of Minnesota Extension #764665; staging: common practice)", () => {
  it("4 in with ½-inch settings goes 4 → 3 → 2 (2.67 in is the one-third limit, so the next setting up, 3 in)", () => {
    expect(mowDownStages(4, 2, 0.5)).toEqual([3, 2]);
  });

  it("3 in goes straight to 2 in (exactly one third)", () => {
    expect(mowDownStages(3, 2, 0.5)).toEqual([2]);
  });

  it("with ¼-inch settings 4 in can go to 2.75 in first", () => {
    expect(mowDownStages(4, 2, 0.25)).toEqual([2.75, 2]);
  });

  it("does nothing when the lawn is already at or below the target", () => {
    expect(mowDownStages(2, 2, 0.5)).toEqual([]);
    expect(mowDownStages(1.5, 2, 0.5)).toEqual([]);
  });

  it("never removes more than a third in one cut and always goes down, for any height, target and step", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 6, noNaN: true }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.constantFrom(0.125, 0.25, 0.5, 1),
        (current, target, step) => {
          let previous = current;
          for (const height of mowDownStages(current, target, step)) {
            expect(height).toBeLessThan(previous);
            expect(height).toBeGreaterThanOrEqual(target - 1e-9);
            expect(height).toBeGreaterThanOrEqual(previous * (2 / 3) - 1e-9);
            previous = height;
          }
        },
      ),
    );
  });
});

describe("prep steps in a plan", () => {
  it("mows down a week apart, the last cut the day before the visit (4 in → 3 in for about a week → 2 in, common practice)", () => {
    const plan = generatePlan(valid(withChanges({})));
    const mows = plan.prepSteps.filter((s) => s.kind === "prep_mow");
    expect(mows.map((s) => [s.date, s.heightIn])).toEqual([
      ["2026-09-02", 3],
      ["2026-09-09", 2],
    ]);
  });

  it("assumes ½-inch mower settings when the step is unknown", () => {
    const raw = withChanges({ property: { mowerSettingStepIn: undefined } });
    const heights = generatePlan(valid(raw)).prepSteps.filter((s) => s.kind === "prep_mow").map((s) => s.heightIn);
    expect(heights).toEqual([3, 2]);
  });

  it("flags sprinkler heads and pet-fence wires before aeration, but not for a feeding-only visit", () => {
    const aeration = generatePlan(valid(withChanges({})));
    expect(aeration.prepSteps.find((s) => s.kind === "flag_hazards")?.detail).toMatch(/sprinkler heads.*pet-fence/);
    const feedOnly = generatePlan(
      valid(withChanges({ visit: { services: ["fertiliser_only"], seedMix: [], seedRateLbPer1000: undefined } })),
    );
    expect(feedOnly.prepSteps).toEqual([]);
  });

  it("does not mow down a bare lawn for new seeding", () => {
    const raw = withChanges({ visit: { services: ["new_seeding"] }, property: { lawnCondition: "bare" } });
    expect(generatePlan(valid(raw)).prepSteps.filter((s) => s.kind === "prep_mow")).toEqual([]);
  });

  it("after dethatching without seed, adds a rake-up-the-thatch step on the visit day", () => {
    const raw = withChanges({ visit: { services: ["dethatching"], seedMix: [], seedRateLbPer1000: undefined } });
    const thatch = generatePlan(valid(raw)).steps.find((s) => s.kind === "clear_debris");
    expect(thatch?.date).toBe("2026-09-10");
  });
});

describe("aeration prep and after-care (common practice)", () => {
  const aeration = withChanges({ visit: { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined, products: [] } });

  it("asks to water the day before the visit if the soil is dry, about ½ inch, not on the morning itself", () => {
    const plan = generatePlan(valid(aeration));
    const step = plan.prepSteps.find((s) => s.key === "note:2026-09-09:water_before_aeration");
    expect(step?.date).toBe("2026-09-09");
    expect(step?.title).toBe("If the soil is dry, water the lawn the day before the visit");
    expect(step?.detail).toMatch(/about 0\.5 inch of water/);
    expect(step?.why.provenance).toBe("common practice");
  });

  it("tells the homeowner on the visit day to leave the cores on the lawn", () => {
    const plan = generatePlan(valid(aeration));
    const step = plan.steps.find((s) => s.key === "note:2026-09-10:leave_cores");
    expect(step?.title).toBe("Leave the soil cores on the lawn");
    expect(step?.detail).toMatch(/Do not rake them up/);
  });

  it("adds neither to a visit without core aeration", () => {
    const plan = generatePlan(valid(withChanges({ visit: { services: ["overseeding", "starter_fertiliser"] } })));
    expect([...plan.prepSteps, ...plan.steps].some((s) => /water_before_aeration|leave_cores/.test(s.key))).toBe(false);
  });
});

describe("low cut before winter ryegrass", () => {
  const prepMows = (raw: Parameters<typeof valid>[0]) =>
    generatePlan(valid(raw)).prepSteps.filter((s) => s.kind === "prep_mow").map((s) => s.heightIn);

  it("bermudagrass at 1.5 in is scalped to 1 in the day before (Kansas City Star column: 1–1.5 in before verticutting), below the 2 in of a cool-season overseeding", () => {
    const plan = generatePlan(valid(winterRyegrassVisit()));
    const [cut] = plan.prepSteps.filter((s) => s.kind === "prep_mow");
    expect(cut).toMatchObject({ date: "2026-09-30", heightIn: 1 });
    expect(cut?.detail).toMatch(/ryegrass seed reach the soil/);
    expect(cut?.why.source).toMatch(/Kansas City Star/);
  });

  it("bermudagrass kept at 2 in comes down in stages within the one-third rule: 2 → 1.5 → 1 (University of Minnesota Extension #764665)", () => {
    expect(prepMows(withChanges({ property: { currentMowingHeightIn: 2 } }, winterRyegrassVisit()))).toEqual([1.5, 1]);
  });

  it("zoysiagrass can't be scalped: one mower setting lower than usual, 2 → 1.5 in (Augusta Chronicle column, 2006)", () => {
    const raw = withChanges({ property: { grassType: { species: ["zoysiagrass"] }, currentMowingHeightIn: 2 } }, winterRyegrassVisit());
    const cuts = generatePlan(valid(raw)).prepSteps.filter((s) => s.kind === "prep_mow");
    expect(cuts.map((s) => s.heightIn)).toEqual([1.5]);
    expect(cuts[0]?.why.source).toMatch(/Augusta Chronicle/);
  });

  it("bermudagrass recorded with last winter's ryegrass is scalped too", () => {
    const raw = withChanges({ property: { grassType: { species: ["bermudagrass", "perennial_ryegrass"] } } }, winterRyegrassVisit());
    expect(prepMows(raw)).toEqual([1]);
  });

  it("a lawn given only as warm-season is taken one setting lower too, since it may not be bermudagrass", () => {
    const raw = withChanges({ property: { grassType: { species: [], season: "warm" }, currentMowingHeightIn: 2.5 } }, winterRyegrassVisit());
    expect(prepMows(raw)).toEqual([2]);
  });
});
