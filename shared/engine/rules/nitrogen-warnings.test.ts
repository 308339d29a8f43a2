import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import type { PlanInputRaw } from "../schemas/plan-input.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import { isHighNQuickRelease, nitrogenLbPer1000 } from "./feeding.ts";

type Product = NonNullable<PlanInputRaw["visit"]["products"]>[number];
const product = (name: string, n: number, p: number, k: number, rateLbPer1000: number, quickReleaseN?: boolean): Product => ({
  name,
  analysis: { n, p, k },
  rateLbPer1000,
  ...(quickReleaseN === undefined ? {} : { quickReleaseN }),
});
const feedingVisit = (products: Product[]) =>
  withChanges({ visit: { services: ["fertiliser_only"], seedMix: [], seedRateLbPer1000: undefined, products } });
const seedingVisit = (products: Product[]) => withChanges({ visit: { products } });
const warningOf = (raw: PlanInputRaw, code: string) => generatePlan(valid(raw)).warnings.find((w) => w.code === code);

describe("nitrogen per application", () => {
  it("rate × N %: 3.57 lb of 28-3-6 is 1.0 lb N (Nebraska Backyard Farmer); 5 lb of a 20 % N product is 1 lb N (Country Gardener)", () => {
    expect(nitrogenLbPer1000(product("28-3-6", 28, 3, 6, 3.57))).toBeCloseTo(1.0, 2);
    expect(nitrogenLbPer1000(product("20-0-0", 20, 0, 0, 5))).toBeCloseTo(1, 12);
  });

  it("up to 1 lb N per 1,000 ft² in one application is the usual amount: no warning (Minnesota Extension #764665: ¾–1 lb)", () => {
    expect(warningOf(feedingVisit([product("28-3-6", 28, 3, 6, 3.57)]), "nitrogen_above_single_application")).toBeUndefined();
    expect(warningOf(feedingVisit([product("20-0-0", 20, 0, 0, 5)]), "nitrogen_above_single_application")).toBeUndefined();
  });

  it("above 1 lb N warns the crew, with no box ticked: 4 lb of 29-0-4 = 1.16 lb N is a caution on a feeding visit, a risk on new seed", () => {
    const feeding = warningOf(feedingVisit([product("Lawn food 29-0-4", 29, 0, 4, 4, false)]), "nitrogen_above_single_application");
    expect(feeding?.severity).toBe("caution");
    expect(feeding?.message).toBe("This visit put down 1.16 lb of nitrogen per 1,000 ft² in one application, above the usual 0.75–1 lb.");
    expect(feeding?.source).toMatch(/Minnesota.*764665/);
    expect(feeding?.provenance).toBe("published");
    expect(warningOf(seedingVisit([product("Lawn food 29-0-4", 29, 0, 4, 4)]), "nitrogen_above_single_application")?.severity).toBe("risk");
  });

  it("counts everything spread at one visit as one application: 0.72 lb N of starter + 0.42 lb N of 21-0-0 = 1.14 lb N", () => {
    const raw = seedingVisit([product("Starter 18-24-12", 18, 24, 12, 4), product("Ammonium sulfate 21-0-0", 21, 0, 0, 2)]);
    expect(warningOf(raw, "nitrogen_above_single_application")?.message).toMatch(
      /^This visit put down 1\.14 lb .* \(Starter 18-24-12: 0\.72 lb; Ammonium sulfate 21-0-0: 0\.42 lb\)/,
    );
  });
});

describe("high-nitrogen quick-release recognised from the analysis and the rate (common practice: avoid on new seed)", () => {
  it("a nitrogen-led bag at a full feeding (≥ ¾ lb N, Minnesota Extension) counts even when the quick-release box is left unticked", () => {
    expect(isHighNQuickRelease(product("Green-up 32-0-4", 32, 0, 4, 3, false))).toBe(true); // 0.96 lb N
    expect(isHighNQuickRelease(product("Green-up 32-0-4", 32, 0, 4, 3))).toBe(true);
    const warning = warningOf(seedingVisit([product("Green-up 32-0-4", 32, 0, 4, 3, false)]), "high_n_quick_release_on_seed");
    expect(warning?.severity).toBe("risk");
  });

  it("a light rate of a nitrogen-led bag counts only when marked quick-release: 1 lb of 46-0-0 is 0.46 lb N", () => {
    expect(isHighNQuickRelease(product("Urea 46-0-0", 46, 0, 0, 1))).toBe(false);
    expect(isHighNQuickRelease(product("Urea 46-0-0", 46, 0, 0, 1, true))).toBe(true);
  });

  it("a phosphorus-led starter is never high-N, whatever its rate or box", () => {
    expect(isHighNQuickRelease(product("Starter 18-24-12", 18, 24, 12, 8, true))).toBe(false);
    expect(warningOf(seedingVisit([product("Starter 18-24-12", 18, 24, 12, 4)]), "high_n_quick_release_on_seed")).toBeUndefined();
  });
});
