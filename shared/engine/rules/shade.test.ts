import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { SHADE_TOLERANCE } from "../tables/shade.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import { shadeTolerantPercent } from "./shade.ts";

/*
 * Shade: shade-tolerant seed (species ratings recalled from US land-grant extension lawn
 * guides, "from memory") and less nitrogen (about half in heavy shade, common practice;
 * three quarters in partial shade, Sproutline's choice).
 */
const mix = (entries: [string, number][]) =>
  entries.map(([species, percent]) => ({ species: species as "tall_fescue", percent, purityPct: 98, germinationPct: 90 }));

describe("shade", () => {
  it("rates fine fescue the cool-season shade grass and Kentucky bluegrass and perennial ryegrass sun grasses (from memory)", () => {
    expect(SHADE_TOLERANCE.fine_fescue).toMatchObject({ rating: "good", provenance: "from memory" });
    expect(SHADE_TOLERANCE.tall_fescue.rating).toBe("moderate");
    expect(SHADE_TOLERANCE.kentucky_bluegrass.rating).toBe("poor");
    expect(SHADE_TOLERANCE.perennial_ryegrass.rating).toBe("poor");
  });

  it("counts the shade-tolerant share of a mix by the tag's percentages: tall fescue counts in partial shade only", () => {
    const m = mix([["tall_fescue", 60], ["fine_fescue", 30], ["kentucky_bluegrass", 10]]);
    expect(shadeTolerantPercent(m, "heavy")).toBe(30);
    expect(shadeTolerantPercent(m, "partial")).toBe(90);
  });

  it("warns the crew when seed sown in shade is mostly sun grass (under half shade-tolerant, common practice)", () => {
    const warnings = (shade: "partial" | "heavy", seedMix: ReturnType<typeof mix>) =>
      generatePlan(valid(withChanges({ visit: { seedMix }, property: { shade } }))).warnings.filter((w) => w.code === "shade_mix_low_tolerance");
    const sunMix = mix([["kentucky_bluegrass", 50], ["perennial_ryegrass", 50]]);
    const heavy = warnings("heavy", sunMix);
    expect(heavy.map((w) => `${w.audience}:${w.severity}`)).toEqual(["crew:risk"]);
    expect(heavy[0]?.message).toBe("Heavy shade, but only 0 % of the mix is shade-tolerant grass (fine fescue). Shade mixes are mostly fine fescues.");
    expect(heavy[0]?.provenance).toBe("from memory");
    expect(warnings("partial", mix([["tall_fescue", 40], ["kentucky_bluegrass", 60]])).map((w) => w.severity)).toEqual(["caution"]);
    expect(warnings("heavy", mix([["fine_fescue", 70], ["kentucky_bluegrass", 30]]))).toEqual([]);
    expect(warnings("partial", mix([["tall_fescue", 100]]))).toEqual([]);
  });

  it("lowers nitrogen in feed steps: 0.75 lb N (Minnesota #764665, published) → 0.4 lb in heavy shade (× 0.5, to 0.05 lb), 0.55 lb in partial (× 0.75)", () => {
    const followUp = (shade?: "partial" | "heavy") =>
      generatePlan(valid(withChanges({ property: shade ? { shade } : {} }))).steps.find((s) => s.key === "feed:follow_up");
    expect(followUp()?.feed?.nitrogenLbPer1000).toBe(0.75);
    const heavy = followUp("heavy");
    expect(heavy?.feed?.nitrogenLbPer1000).toBe(0.4);
    // 0.4 lb × 6,000 ft² ÷ 1,000 = 2.4 lb.
    expect(heavy?.detail).toMatch(/Your lawn is shaded, so use less: about 0\.4 lb of nitrogen per 1,000 ft² \(2\.4 lb for your 6,000 ft²\)\.$/);
    expect(heavy?.why.source).toMatch(/shade:/);
    expect(followUp("partial")?.feed?.nitrogenLbPer1000).toBe(0.55);
  });

  it("names the shade-tolerant grasses of the mix's own season: a bermudagrass mix is pointed to St. Augustine, zoysia and centipede, not fine fescue", () => {
    const plan = generatePlan(valid(withChanges({
      visit: { services: ["new_seeding"], seedMix: mix([["bermudagrass", 100]]), seedRateLbPer1000: 1.5 },
      property: { shade: "partial", grassType: { species: ["bermudagrass"] }, lawnCondition: "bare" },
    })));
    expect(plan.warnings.find((w) => w.code === "shade_mix_low_tolerance")?.message).toBe(
      "Partial shade, but only 0 % of the mix is shade-tolerant grass (zoysiagrass, St. Augustinegrass, centipedegrass).",
    );
  });

  it("gives a shaded lawn's homeowner a care note, and a sunny lawn none", () => {
    expect(generatePlan(valid(withChanges({ property: { shade: "partial" } }))).steps.find((s) => s.key === "note:shade_care")?.detail).toMatch(/Rake or blow fallen leaves/);
    expect(generatePlan(valid(withChanges({}))).steps.some((s) => s.key === "note:shade_care")).toBe(false);
    // A plan made two days after the visit starts that day, and the note with it.
    const later = generatePlan(valid(withChanges({ property: { shade: "heavy" }, options: { today: "2026-09-12" } })));
    expect(later.steps.find((s) => s.key === "note:shade_care")?.date).toBe("2026-09-12");
  });
});
