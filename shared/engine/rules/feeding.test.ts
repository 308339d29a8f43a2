import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";

const withoutStarter = (products: NonNullable<Parameters<typeof withChanges>[0]["visit"]>["products"]) =>
  withChanges({ visit: { services: ["aeration", "overseeding"], products } });
const starterStep = (raw: Parameters<typeof valid>[0]) => generatePlan(valid(raw)).steps.find((s) => s.key === "feed:starter");

describe("starter fertilizer step (Nebraska Extension 2021: starter or organic, about 1–1.5 lb P per 1,000 ft²)", () => {
  it("speaks of phosphate (P₂O₅) as the bag shows it: 1–1.5 lb P is 2.3–3.4 lb P₂O₅ (P = P₂O₅ × 0.4364, published)", () => {
    const step = starterStep(withoutStarter([]));
    expect(step?.detail).toMatch(/about 2\.3–3\.4 lb of phosphate \(P₂O₅, the middle number on the bag\) per 1,000 ft², which is 1–1\.5 lb of phosphorus/);
    expect(step?.title).toBe("Spread a starter fertilizer on the seeded lawn");
    expect(step?.why.source).toMatch(/0\.4364/);
  });

  it("counts an organic fertilizer spread at the visit as the starter, so no second feeding is asked for", () => {
    const organic = { name: "Organic 6-4-0", analysis: { n: 6, p: 4, k: 0 }, rateLbPer1000: 12, organic: true };
    expect(starterStep(withoutStarter([organic]))).toBeUndefined();
    // The same bag not marked organic is nitrogen-led, so it is no starter.
    expect(starterStep(withoutStarter([{ ...organic, organic: false }]))).toBeDefined();
  });
});
