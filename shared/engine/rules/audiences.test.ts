import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { visitWarnings } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import type { PlanWarning } from "../types.ts";
import { homeownerWarnings } from "./audiences.ts";

type Raw = Parameters<typeof valid>[0];
const warningsOf = (raw: Raw) => generatePlan(valid(raw)).warnings;
const told = (raw: Raw, code: string, audience: PlanWarning["audience"]) =>
  warningsOf(raw).find((w) => w.code === code && w.audience === audience);

describe("who each warning is for", () => {
  it("seed rate above the range (tall fescue overseeding 4–6 lb, Colorado State Ask Extension #877015): the crew gets the figures, the homeowner a plain note without them", () => {
    const raw = withChanges({ visit: { seedRateLbPer1000: 9 } });
    const crew = told(raw, "seed_rate_high", "crew");
    expect(crew?.message).toBe("Seed rate 9 lb per 1,000 ft² is above the usual 4–6 lb for this mix.");
    expect(crew?.source).toMatch(/Colorado State/);
    const homeowner = told(raw, "seed_rate_high", "homeowner");
    expect(homeowner?.message).toBe("Your lawn got a generous seeding. Keep watering as planned.");
    expect(homeowner?.message).not.toMatch(/lb|above|usual/);
    // The homeowner's note rests on the same figures, so it keeps their source and provenance.
    expect(homeowner?.source).toBe(crew?.source);
    expect(homeowner?.provenance).toBe(crew?.provenance);
  });

  it("seed rate below the range: the homeowner is asked for a photo of bare spots, not told the rate was low", () => {
    const homeowner = told(withChanges({ visit: { seedRateLbPer1000: 3 } }), "seed_rate_low", "homeowner");
    expect(homeowner?.message).toMatch(/photo/);
    expect(homeowner?.message).not.toMatch(/below|low|lb/);
  });

  it("frost 29 days away (common practice: 30–45 days of growth before frost) is a scheduling risk for the crew and a caution for the homeowner", () => {
    const raw = withChanges({ property: { expectedFirstFrost: "2026-10-09" } });
    expect(told(raw, "frost_too_close", "crew")).toMatchObject({ severity: "risk", source: "Lawn-care trade practice (no single source)" });
    const homeowner = told(raw, "frost_too_close", "homeowner");
    expect(homeowner).toMatchObject({ severity: "caution", provenance: "common practice" });
    expect(homeowner?.message).toMatch(/about 29 days/);
  });

  it("high-N quick-release on seed (common practice): the homeowner is told not to add fertilizer of their own", () => {
    const raw = withChanges({
      visit: { products: [{ name: "Green-up 32-0-4", analysis: { n: 32, p: 0, k: 4 }, rateLbPer1000: 3, quickReleaseN: true }] },
    });
    expect(told(raw, "high_n_quick_release_on_seed", "crew")?.severity).toBe("risk");
    expect(told(raw, "high_n_quick_release_on_seed", "homeowner")?.message).toMatch(/don't put down any fertilizer of your own/);
  });

  it("no sprinkler for seed (Nebraska Extension column, 2021) matters to both: the homeowner does the watering", () => {
    const raw = withChanges({ property: { irrigation: { kind: "none" } } });
    expect(told(raw, "no_sprinkler_for_seed", "crew")?.source).toBe("Nebraska Extension column (2021)");
    expect(told(raw, "no_sprinkler_for_seed", "homeowner")).toMatchObject({ source: "Nebraska Extension column (2021)", provenance: "published" });
  });

  it("a thick lawn that is only dormant gets a homeowner note; seed logged without a seeding service stays with the crew", () => {
    expect(told(withChanges({ property: { lawnCondition: "thick_dormant" } }), "dormant_lawn_seeded", "homeowner")?.message).toMatch(/resting, not dead/);
    const bookkeeping = withChanges({ visit: { services: ["aeration"] } });
    expect(told(bookkeeping, "seed_without_seeding_service", "crew")).toBeDefined();
    expect(told(bookkeeping, "seed_without_seeding_service", "homeowner")).toBeUndefined();
  });

  it("the estimated sprinkler rate (Irrigation Association figure, from memory) is for the crew only", () => {
    const raw = withChanges({});
    expect(told(raw, "precipitation_rate_estimated", "crew")?.provenance).toBe("from memory");
    expect(told(raw, "precipitation_rate_estimated", "homeowner")).toBeUndefined();
  });

  it("autumn overseeding of bermudagrass is out-of-season work for the crew only; winter ryegrass tells the homeowner what to expect", () => {
    const lawn = { grassType: { species: ["bermudagrass" as const] }, timeZone: "America/Chicago", expectedFirstFrost: undefined };
    const bermuda = withChanges({
      visit: { date: "2026-09-15", seedMix: [{ species: "bermudagrass", percent: 100, purityPct: 95, germinationPct: 85 }], seedRateLbPer1000: 1 },
      property: lawn,
    });
    expect(told(bermuda, "warm_season_autumn_overseeding", "crew")?.severity).toBe("caution");
    expect(told(bermuda, "warm_season_autumn_overseeding", "homeowner")).toBeUndefined();
    const ryegrass = withChanges({
      visit: { date: "2026-10-01", seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 3 },
      property: lawn,
    });
    expect(told(ryegrass, "warm_season_autumn_overseeding", "homeowner")?.message).toMatch(/green through the winter/);
  });

  it("every finding reaches the crew, and every homeowner warning has a crew finding behind it", () => {
    const warnings = warningsOf(withChanges({ visit: { seedRateLbPer1000: 12 }, property: { expectedFirstFrost: "2026-09-25", irrigation: { kind: "none" } } }));
    const crewCodes = new Set(warnings.filter((w) => w.audience === "crew").map((w) => w.code));
    const homeowner = warnings.filter((w) => w.audience === "homeowner");
    expect(homeowner.length).toBeGreaterThanOrEqual(3);
    for (const w of homeowner) expect(crewCodes.has(w.code)).toBe(true);
  });

  it("visitWarnings gives the same warnings as the whole plan", () => {
    const raw = withChanges({ visit: { seedRateLbPer1000: 9 } });
    expect(visitWarnings(valid(raw))).toEqual(warningsOf(raw));
  });
});

describe("homeownerWarnings", () => {
  it("keeps homeowner warnings only, and treats warnings stored without an audience as the crew's", () => {
    const stored = [
      { code: "a", audience: "crew" },
      { code: "b", audience: "homeowner" },
      { code: "c" },
    ];
    expect(homeownerWarnings(stored).map((w) => w.code)).toEqual(["b"]);
  });
});
