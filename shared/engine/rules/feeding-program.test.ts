import { describe, expect, it } from "vitest";
import { generatePlan, visitWarnings } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import type { PlanInputRaw } from "../schemas/plan-input.ts";
import type { PlanStep } from "../types.ts";

/** A thick tall-fescue lawn in New Jersey, fed only: no seed. Its plan ends 42 days after the visit. */
const thickLawn = (visit: Partial<PlanInputRaw["visit"]> = {}, property: Partial<PlanInputRaw["property"]> = {}) =>
  withChanges({
    visit: { services: ["fertiliser_only"], seedMix: [], seedRateLbPer1000: undefined, products: [], ...visit },
    property: { lawnCondition: "thick", ...property },
  });
const programOf = (raw: PlanInputRaw): PlanStep[] => generatePlan(valid(raw)).steps.filter((s) => s.key.startsWith("feed:fall_program_"));
const fallFeed = (n: number, p = 0, k = 10) => [{ name: `Fall ${n}-${p}-${k}`, analysis: { n, p, k }, rateLbPer1000: 4 }];
const nOf = (steps: readonly PlanStep[]) => steps.map((s) => s.feed?.nitrogenLbPer1000 ?? 0);
const sum = (xs: readonly number[]) => xs.reduce((a, b) => a + b, 0);

describe("the fall feeding program for a thick lawn", () => {
  it("nothing fed at the visit: two feedings of 1 lb N (about 2 lb over the fall, common practice; at most 1 lb each, UMN #764665), the next day and 41 days later to fit the plan", () => {
    const steps = programOf(thickLawn());
    expect(steps.map((s) => [s.key, s.date, s.title])).toEqual([
      ["feed:fall_program_1", "2026-09-11", "Feed the lawn (fall feeding 1 of 2)"],
      ["feed:fall_program_2", "2026-10-22", "Feed the lawn (fall feeding 2 of 2)"],
    ]);
    expect(nOf(steps)).toEqual([1, 1]);
    expect(steps[0]?.detail).toMatch(/^Spread a lawn fertilizer that gives about 1 lb of nitrogen per 1,000 ft² \(6 lb of nitrogen for your 6,000 ft²\)/);
    expect(steps.every((s) => s.kind === "feed" && s.feed?.product === "slow_release_n" && s.feed.highNQuickRelease === false)).toBe(true);
    expect(steps[0]?.why.provenance).toBe("common practice");
    expect(steps[0]?.cautions).toEqual(["label_is_law", "children_pets", "phosphorus_rules"]);
  });

  it("the visit's own feeding counts as the first: 4 lb of 24-0-10 is 0.96 lb N, so one more of 1 lb, six weeks later", () => {
    // 4 lb × 24 % = 0.96 lb N (Nebraska Backyard Farmer, "Lawn Fertilizer Calculations"); 2 − 0.96 = 1.04 → one feeding, capped at 1 lb.
    const steps = programOf(thickLawn({ products: fallFeed(24) }));
    expect(steps.map((s) => [s.key, s.date, s.title])).toEqual([["feed:fall_program_2", "2026-10-22", "Feed the lawn (fall feeding 2 of 2)"]]);
    expect(nOf(steps)).toEqual([1]);
  });

  it("never more than 1 lb N in a feeding nor under ½ lb; with the visit's feeding it comes to about 2 lb, short only where every feeding is already at the 1 lb cap", () => {
    for (const n of [0, 5, 10, 12, 15, 18, 20, 24, 28, 32, 40]) {
      const applied = n === 0 ? 0 : (4 * n) / 100;
      const amounts = nOf(programOf(thickLawn({ products: n === 0 ? [] : fallFeed(n) })));
      for (const each of amounts) {
        expect(each).toBeLessThanOrEqual(1);
        expect(each).toBeGreaterThanOrEqual(0.5);
      }
      // Rounding to the quarter pound moves each feeding by at most ⅛ lb.
      const total = applied + sum(amounts);
      expect(total).toBeLessThanOrEqual(2 + 0.125 * amounts.length + 1e-9);
      if (amounts.length === 0) expect(applied).toBeGreaterThan(1.5);
      else if (total < 2 - 0.125 * amounts.length - 1e-9) expect(amounts.every((a) => a === 1)).toBe(true);
    }
  });

  it("feeds a thick lawn that is brown after summer (dormant) the same way", () => {
    expect(nOf(programOf(thickLawn({}, { lawnCondition: "thick_dormant" })))).toEqual([1, 1]);
  });

  it("stays within the fall: a visit on 2026-11-20 gets only the next day's feeding, none in December", () => {
    // A late first frost (December 15) keeps the ground open; the fall ends with November all the same.
    const steps = programOf(thickLawn({ date: "2026-11-20" }, { expectedFirstFrost: "2026-12-15" }));
    expect(steps.map((s) => s.date)).toEqual(["2026-11-21"]);
    // With no frost entered the hemisphere's default (October 15) applies: cold ground from October 29, so no feeding at all.
    expect(programOf(thickLawn({ date: "2026-11-20" }, { expectedFirstFrost: undefined }))).toEqual([]);
  });

  it("plans its feedings before the ground turns cold rather than after it, where they would be dropped", () => {
    // Frost October 10 (entered): cold ground from October 24 (frost + 14 days, common practice; tables/seasons.ts).
    // Both feedings fit before it, 32 days apart (at least 4 weeks, common practice), instead of the second falling on November 1.
    const steps = programOf(thickLawn({ date: "2026-09-20" }, { expectedFirstFrost: "2026-10-10" }));
    expect(steps.map((s) => s.date)).toEqual(["2026-09-21", "2026-10-23"]);
  });

  it("follows the southern fall (March to May) in the southern hemisphere", () => {
    // A first frost in late June (a mild coast) leaves the whole southern fall open to feeding.
    const raw = thickLawn({ date: "2026-04-01" }, { timeZone: "Australia/Sydney", expectedFirstFrost: "2026-06-25" });
    expect(programOf(raw).map((s) => s.date)).toEqual(["2026-04-02", "2026-05-13"]);
    expect(programOf(thickLawn({ date: "2026-09-10" }, { timeZone: "Australia/Sydney", expectedFirstFrost: undefined }))).toEqual([]);
  });

  it("is not offered to thin lawns, warm-season lawns, in spring, or on a visit that sowed seed", () => {
    expect(programOf(thickLawn({}, { lawnCondition: "thin" }))).toEqual([]);
    expect(programOf(thickLawn({}, { grassType: { species: ["bermudagrass"] } }))).toEqual([]);
    expect(programOf(thickLawn({ date: "2026-04-15" }, { expectedFirstFrost: undefined }))).toEqual([]);
    expect(programOf(withChanges({ property: { lawnCondition: "thick" } }))).toEqual([]);
  });

  it("seed logged on a thick lawn: the crew is told seed isn't needed and the feeding program is offered (crew only)", () => {
    const warnings = generatePlan(valid(withChanges({ property: { lawnCondition: "thick" } }))).warnings;
    const crew = warnings.find((w) => w.code === "thick_lawn_feeding_program");
    expect(crew?.audience).toBe("crew");
    expect(crew?.severity).toBe("caution");
    expect(crew?.message).toMatch(/seed isn't needed\. Offer the fall feeding program instead: about 2 lb N per 1,000 ft²/);
    expect(warnings.some((w) => w.code === "thick_lawn_feeding_program" && w.audience === "homeowner")).toBe(false);
    // The form checks the figures as typed with the same rules.
    expect(visitWarnings(valid(withChanges({ property: { lawnCondition: "thick" } }))).some((w) => w.code === "thick_lawn_feeding_program")).toBe(true);
    // A dormant (brown) lawn keeps its own finding; it needs water, not a different feeding message.
    expect(generatePlan(valid(withChanges({ property: { lawnCondition: "thick_dormant" } }))).warnings.some((w) => w.code === "thick_lawn_feeding_program")).toBe(false);
  });
});
