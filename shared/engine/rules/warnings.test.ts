import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import { frostWarning } from "./warnings.ts";

const codes = (raw: Parameters<typeof valid>[0]) => generatePlan(valid(raw)).warnings.map((w) => w.code);
const warning = (raw: Parameters<typeof valid>[0], code: string) =>
  generatePlan(valid(raw)).warnings.find((w) => w.code === code);

describe("frost thresholds (common practice: at least 30–45 days before first hard frost)", () => {
  it("29 days → risk, 30 and 45 → caution, 46 → no warning", () => {
    expect(frostWarning(29)?.severity).toBe("risk");
    expect(frostWarning(30)?.severity).toBe("caution");
    expect(frostWarning(45)?.severity).toBe("caution");
    expect(frostWarning(46)).toBeNull();
  });

  it("counts calendar days from the visit to the frost date in a plan", () => {
    expect(warning(withChanges({ property: { expectedFirstFrost: "2026-10-09" } }), "frost_too_close")?.severity).toBe("risk"); // 29 days
    expect(warning(withChanges({ property: { expectedFirstFrost: "2026-10-10" } }), "frost_too_close")?.severity).toBe("caution"); // 30 days
    expect(codes(withChanges({ property: { expectedFirstFrost: "2026-10-26" } }))).not.toContain("frost_too_close"); // 46 days
  });

  it("does not warn about frost when nothing was sown", () => {
    const raw = withChanges({
      visit: { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined },
      property: { expectedFirstFrost: "2026-09-20" },
    });
    expect(codes(raw)).not.toContain("frost_too_close");
  });
});

describe("warm-season lawn overseeded in autumn (common practice)", () => {
  const bermudaLawn = (date: string, timeZone: string) =>
    withChanges({
      visit: {
        date,
        seedMix: [{ species: "bermudagrass", percent: 100, purityPct: 95, germinationPct: 85 }],
        seedRateLbPer1000: 1,
      },
      property: { grassType: { species: ["bermudagrass"] }, timeZone, expectedFirstFrost: undefined },
    });

  it("warns for a September overseeding in the northern hemisphere", () => {
    expect(warning(bermudaLawn("2026-09-15", "America/Chicago"), "warm_season_autumn_overseeding")?.severity).toBe("caution");
  });

  it("does not warn for September in Sydney (spring there), but does for April (autumn there)", () => {
    expect(codes(bermudaLawn("2026-09-15", "Australia/Sydney"))).not.toContain("warm_season_autumn_overseeding");
    expect(codes(bermudaLawn("2026-04-15", "Australia/Sydney"))).toContain("warm_season_autumn_overseeding");
  });

  it("treats winter ryegrass for colour as information, not a caution", () => {
    const raw = withChanges({
      visit: { date: "2026-10-01", seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 3 },
      property: { grassType: { species: ["bermudagrass"] }, timeZone: "America/Chicago", expectedFirstFrost: undefined },
    });
    expect(warning(raw, "warm_season_autumn_overseeding")?.severity).toBe("info");
  });
});

describe("seed rate against the species range", () => {
  it("tall fescue overseeded at 4–6 lb is fine (Colorado State Ask Extension #877015)", () => {
    for (const rate of [4, 5, 6]) expect(codes(withChanges({ visit: { seedRateLbPer1000: rate } }))).not.toContain("seed_rate_low");
  });

  it("tall fescue overseeded at 3 lb is low (caution), at 1.5 lb far too low (risk)", () => {
    expect(warning(withChanges({ visit: { seedRateLbPer1000: 3 } }), "seed_rate_low")?.severity).toBe("caution");
    expect(warning(withChanges({ visit: { seedRateLbPer1000: 1.5 } }), "seed_rate_low")?.severity).toBe("risk");
  });

  it("new seeding is judged on the new-seeding range: 5 lb of tall fescue on bare soil is low (6–8, Cornell)", () => {
    const raw = withChanges({ visit: { services: ["new_seeding"], seedRateLbPer1000: 5 }, property: { lawnCondition: "bare" } });
    expect(warning(raw, "seed_rate_low")?.source).toMatch(/Cornell/);
  });

  it("a mix is judged on the percent-weighted range: 50/50 tall fescue + bluegrass overseeded at 5 lb is high", () => {
    // Weighted overseeding range: 0.5 × (4–6) + 0.5 × (0.5–1.5) = 2.25–3.75 lb.
    const raw = withChanges({
      visit: {
        seedMix: [
          { species: "tall_fescue", percent: 50, purityPct: 98, germinationPct: 90 },
          { species: "kentucky_bluegrass", percent: 50, purityPct: 97, germinationPct: 85 },
        ],
        seedRateLbPer1000: 5,
      },
    });
    const w = warning(raw, "seed_rate_high");
    expect(w?.message).toMatch(/2\.25–3\.75/);
    expect(w?.severity).toBe("caution");
  });
});

describe("other warnings", () => {
  it("a thick lawn that is only brown (dormant) is better watered and fed than seeded (common practice)", () => {
    expect(warning(withChanges({ property: { lawnCondition: "thick_dormant" } }), "dormant_lawn_seeded")?.severity).toBe("caution");
  });

  it("seed logged without a seeding service is flagged and still planned as a seeding", () => {
    const plan = generatePlan(valid(withChanges({ visit: { services: ["aeration"] } })));
    expect(plan.warnings.map((w) => w.code)).toContain("seed_without_seeding_service");
    expect(plan.meta.seeding).toBe(true);
  });

  it("a high-N quick-release feed applied on new seed is a risk (common practice)", () => {
    const raw = withChanges({
      visit: { products: [{ name: "Green-up 32-0-4", analysis: { n: 32, p: 0, k: 4 }, rateLbPer1000: 3, quickReleaseN: true }] },
    });
    expect(warning(raw, "high_n_quick_release_on_seed")?.severity).toBe("risk");
  });

  it("every warning carries a reason, a source and a provenance", () => {
    const plan = generatePlan(valid(withChanges({ visit: { seedRateLbPer1000: 12 }, property: { expectedFirstFrost: "2026-09-25", lawnCondition: "thick" } })));
    expect(plan.warnings.length).toBeGreaterThanOrEqual(3);
    for (const w of plan.warnings) {
      expect(w.reason.length).toBeGreaterThan(0);
      expect(w.source.length).toBeGreaterThan(0);
      expect(["published", "common practice", "from memory"]).toContain(w.provenance);
    }
  });
});
