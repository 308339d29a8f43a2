import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { daysBetween } from "../dates.ts";
import { generatePlan } from "../generate.ts";
import { SPECIES } from "../tables/species.ts";
import { valid, withChanges, overseedingVisit } from "../testing/fixtures.ts";
import { bermudaSeedingVisit, winterRyegrassVisit } from "../testing/warm-fixtures.ts";
import type { PlanStep } from "../types.ts";

type Raw = Parameters<typeof valid>[0];
const mows = (raw: Raw): PlanStep[] => generatePlan(valid(raw)).steps.filter((s) => s.kind === "mow");
const heights = (raw: Raw) => mows(raw).map((s) => s.heightIn);

describe("first mowing height that suits the species", () => {
  it("cool-season seed keeps the highest-setting rule (common practice)", () => {
    expect(mows(overseedingVisit())[0]?.title).toBe("First mow of the new grass: highest setting (4 in)");
  });

  it("new bermudagrass is first cut at 1.5 in, the top of its 1–1.5 in range (southern extension guides, from memory), not at the mower's 3 in", () => {
    const [first, second] = mows(bermudaSeedingVisit());
    expect(first?.heightIn).toBe(1.5);
    expect(first?.title).toBe("First mow of the new grass: 1.5 in, the top of the usual height for bermudagrass");
    expect(first?.why.provenance).toBe("from memory");
    // The lawn's usual 1 in is inside the range, so it steps down one ½-inch setting to it.
    expect(second?.heightIn).toBe(1);
  });

  it("a usual height above the species' range settles at the top of the range, never back up at the usual height", () => {
    expect(new Set(heights(withChanges({ property: { currentMowingHeightIn: 3 } }, bermudaSeedingVisit())))).toEqual(new Set([1.5]));
  });

  it("St. Augustinegrass (2.5–4 in, from memory) is capped by the mower's highest setting", () => {
    const raw = withChanges(
      {
        visit: { seedMix: [{ species: "st_augustinegrass", percent: 100, purityPct: 90, germinationPct: 80 }], seedRateLbPer1000: 0.5 },
        property: { grassType: { species: ["st_augustinegrass"] }, currentMowingHeightIn: 3, mowerHighestSettingIn: 3.5 },
      },
      bermudaSeedingVisit(),
    );
    expect(heights(raw).slice(0, 2)).toEqual([3.5, 3]);
  });

  it("bermudagrass seed patched into a tall fescue lawn keeps the highest-setting rule: a 1.5-inch cut would scalp the fescue", () => {
    const raw = withChanges({ property: { grassType: { species: ["tall_fescue"] }, lawnCondition: "thin", currentMowingHeightIn: 3 } }, bermudaSeedingVisit());
    const overseeded = withChanges({ visit: { services: ["overseeding"] } }, raw);
    expect(mows(overseeded)[0]?.heightIn).toBe(3);
  });

  it("a mix of cool- and warm-season seed keeps the highest-setting rule", () => {
    const raw = withChanges(
      {
        visit: {
          seedMix: [
            { species: "bermudagrass", percent: 50, purityPct: 95, germinationPct: 85 },
            { species: "tall_fescue", percent: 50, purityPct: 95, germinationPct: 85 },
          ],
          seedRateLbPer1000: 3,
        },
      },
      bermudaSeedingVisit(),
    );
    expect(mows(raw)[0]?.heightIn).toBe(3);
  });
});

describe("winter ryegrass on bermudagrass is mowed lower than a cool-season lawn (about 2–2.5 in, Texas A&M AgriLife specialists)", () => {
  it("first cut at 2.5 in, then kept at 2 in: the lawn's 1.5-inch bermuda height is below the ryegrass range", () => {
    const all = heights(winterRyegrassVisit());
    expect(all[0]).toBe(2.5);
    expect(new Set(all.slice(1))).toEqual(new Set([2]));
    expect(mows(winterRyegrassVisit())[0]?.title).toBe("First mow of the winter ryegrass: 2.5 in");
  });

  it("keeps mowing through the winter: ryegrass grows past the frost, where a summer lawn's mowing stops 3 weeks after it (common practice)", () => {
    const frost = "2026-11-10";
    const ryegrass = mows(withChanges({ property: { expectedFirstFrost: frost } }, winterRyegrassVisit()));
    const plan = generatePlan(valid(withChanges({ property: { expectedFirstFrost: frost } }, winterRyegrassVisit())));
    expect(ryegrass.length).toBeGreaterThan(0);
    expect(daysBetween(frost, ryegrass.at(-1)?.date ?? frost)).toBeGreaterThan(21);
    expect(daysBetween(ryegrass.at(-1)?.date ?? frost, plan.meta.planEnds)).toBeLessThan(7);
    const bermuda = mows(withChanges({ property: { expectedFirstFrost: "2026-09-01" } }, bermudaSeedingVisit()));
    expect(daysBetween("2026-09-01", bermuda.at(-1)?.date ?? "2026-09-01")).toBeLessThanOrEqual(21);
  });
});

describe("mowing heights of new grass, any species", () => {
  it("never above the mower's highest setting, never more than one setting lower from one mowing to the next", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...SPECIES),
        fc.constantFrom(...SPECIES),
        fc.constantFrom(1, 1.5, 2, 2.5, 3, 3.5, 4),
        fc.constantFrom(0, 0.5, 1, 2),
        fc.boolean(),
        (lawn, sown, highest, below, bare) => {
          const raw = withChanges(
            {
              visit: { services: [bare ? "new_seeding" : "overseeding"], seedMix: [{ species: sown, percent: 100, purityPct: 95, germinationPct: 85 }] },
              property: {
                grassType: { species: [lawn] },
                lawnCondition: bare ? "bare" : "thin",
                mowerHighestSettingIn: highest,
                currentMowingHeightIn: Math.max(0.5, highest - below),
              },
            },
            bermudaSeedingVisit(),
          );
          let previous: number | null = null;
          for (const h of heights(raw)) {
            expect(h).toBeDefined();
            expect(h).toBeLessThanOrEqual(highest + 1e-9);
            // One ½-inch setting (the fixture's mower) at a time after the first cut.
            if (previous !== null) expect(h).toBeGreaterThanOrEqual(previous - 0.5 - 1e-9);
            previous = h ?? null;
          }
        },
      ),
      { numRuns: 60 },
    );
  });
});
