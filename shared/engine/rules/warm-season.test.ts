import { describe, expect, it } from "vitest";
import { generatePlan, visitWarnings } from "../generate.ts";
import { valid, withChanges, overseedingVisit } from "../testing/fixtures.ts";
import { bermudaSeedingVisit, winterRyegrassVisit } from "../testing/warm-fixtures.ts";
import type { PlanWarning } from "../types.ts";

type Raw = Parameters<typeof valid>[0];
const warningsOf = (raw: Raw) => generatePlan(valid(raw)).warnings;
const told = (raw: Raw, code: string, audience: PlanWarning["audience"]) =>
  warningsOf(raw).find((w) => w.code === code && w.audience === audience);
const codes = (raw: Raw) => new Set(warningsOf(raw).map((w) => w.code));
const winter = (changes: Parameters<typeof withChanges>[0]) => withChanges(changes, winterRyegrassVisit());
const bermudaSeed = (changes: Parameters<typeof withChanges>[0]) => withChanges(changes, bermudaSeedingVisit());

describe("winter ryegrass on bermudagrass: its own seed rate", () => {
  it("is judged by the winter range, about 5–10 lb per 1,000 ft² (TRADE-REFERENCES: Clemson / UGA guides, from memory)", () => {
    const seed = generatePlan(valid(winterRyegrassVisit())).summary.seed;
    expect(seed?.expectedRangeLbPer1000).toEqual({ min: 5, max: 10, basis: "winter_overseeding" });
    expect(codes(winterRyegrassVisit()).has("seed_rate_high")).toBe(false);
  });

  it("the same 8 lb of ryegrass into a tall fescue lawn is above the cool-season overseeding range (Cornell 4–6 lb × 0.5, Nebraska Extension 2021)", () => {
    const fescue = winter({ property: { grassType: { species: ["tall_fescue"] }, timeZone: "America/New_York" } });
    expect(generatePlan(valid(fescue)).summary.seed?.expectedRangeLbPer1000).toEqual({ min: 2, max: 3, basis: "overseeding" });
    expect(told(fescue, "seed_rate_high", "crew")?.severity).toBe("risk");
  });

  it("3 lb, enough to overseed a cool-season lawn, is light for winter color on bermudagrass; the warning names its from-memory source", () => {
    const crew = told(winter({ visit: { seedRateLbPer1000: 3 } }), "seed_rate_low", "crew");
    expect(crew?.message).toBe("Seed rate 3 lb per 1,000 ft² is below the usual 5–10 lb for this mix.");
    expect(crew).toMatchObject({ provenance: "from memory", source: expect.stringMatching(/Clemson/) });
  });

  it("a bermudagrass lawn recorded with last winter's ryegrass is still a warm-season lawn; one with tall fescue is not", () => {
    const withRyegrass = winter({ property: { grassType: { species: ["bermudagrass", "perennial_ryegrass"] } } });
    expect(generatePlan(valid(withRyegrass)).summary.seed?.expectedRangeLbPer1000.basis).toBe("winter_overseeding");
    const withFescue = winter({ property: { grassType: { species: ["bermudagrass", "tall_fescue"] } } });
    expect(generatePlan(valid(withFescue)).summary.seed?.expectedRangeLbPer1000.basis).toBe("overseeding");
  });

  it("a lawn given only as warm-season counts too; a bare warm-season lawn sown with ryegrass is a new seeding, not winter overseeding", () => {
    const warmOnly = winter({ property: { grassType: { species: [], season: "warm" } } });
    expect(generatePlan(valid(warmOnly)).summary.seed?.expectedRangeLbPer1000.basis).toBe("winter_overseeding");
    const bare = winter({ visit: { services: ["new_seeding"] }, property: { lawnCondition: "bare" } });
    expect(generatePlan(valid(bare)).summary.seed?.expectedRangeLbPer1000.basis).toBe("new_seeding");
    expect(codes(bare).has("winter_ryegrass_spring_transition")).toBe(false);
  });
});

describe("lawns where winter overseeding is usually advised against (centipede, St. Augustine, zoysia: TRADE-REFERENCES, from memory)", () => {
  it.each([
    ["zoysiagrass", "zoysiagrass"],
    ["centipedegrass", "centipedegrass"],
    ["st_augustinegrass", "St. Augustinegrass"],
  ] as const)("%s: a caution for the crew and a plain note for the homeowner", (species, name) => {
    const raw = winter({ property: { grassType: { species: [species] }, currentMowingHeightIn: 2 } });
    const crew = told(raw, "winter_overseeding_not_advised", "crew");
    expect(crew?.severity).toBe("caution");
    expect(crew?.message).toContain(`usually advised against on ${name}`);
    expect(crew?.provenance).toBe("from memory");
    const homeowner = told(raw, "winter_overseeding_not_advised", "homeowner");
    expect(homeowner?.message).toContain(`crowd your ${name}`);
    expect(homeowner?.message).not.toMatch(/advised against|should not/);
    expect(homeowner?.source).toBe(crew?.source);
  });

  it("not on bermudagrass, and not on bahiagrass, which the reference does not list", () => {
    expect(codes(winterRyegrassVisit()).has("winter_overseeding_not_advised")).toBe(false);
    const bahia = winter({ property: { grassType: { species: ["bahiagrass"] }, currentMowingHeightIn: 3 } });
    expect(codes(bahia).has("winter_overseeding_not_advised")).toBe(false);
  });

  it("names only the listed grasses of a mixed lawn", () => {
    const raw = winter({ property: { grassType: { species: ["bermudagrass", "centipedegrass"] } } });
    expect(told(raw, "winter_overseeding_not_advised", "crew")?.message).toMatch(/advised against on centipedegrass:/);
  });
});

describe("winter ryegrass prep and spring transition (common practice)", () => {
  it("reminds the crew to verticut or rake when no dethatching was logged; the homeowner is not told", () => {
    expect(told(winterRyegrassVisit(), "winter_overseeding_prep", "crew")?.message).toMatch(/Verticut or rake/);
    expect(told(winterRyegrassVisit(), "winter_overseeding_prep", "homeowner")).toBeUndefined();
    expect(codes(winter({ visit: { services: ["dethatching", "overseeding"] } })).has("winter_overseeding_prep")).toBe(false);
  });

  it("tells both that the bermudagrass competes in spring: lower the mowing toward its summer height (low end of 1–1.5 in, from memory)", () => {
    expect(told(winterRyegrassVisit(), "winter_ryegrass_spring_transition", "crew")?.message).toMatch(/lower the mowing a notch at a time to about 1 in/);
    const homeowner = told(winterRyegrassVisit(), "winter_ryegrass_spring_transition", "homeowner");
    expect(homeowner).toMatchObject({ severity: "info", provenance: "common practice" });
    expect(homeowner?.message).toMatch(/Next spring.*about 1 in\./);
  });

  it("without the lawn's species, or on a tall summer grass (St. Augustine 2.5–4 in, above the ryegrass's 2 in), no figure: their usual summer height", () => {
    const unknown = winter({ property: { grassType: { species: [], season: "warm" } } });
    expect(told(unknown, "winter_ryegrass_spring_transition", "homeowner")?.message).toMatch(/your usual summer height/);
    const stAugustine = winter({ property: { grassType: { species: ["st_augustinegrass"] }, currentMowingHeightIn: 3 } });
    expect(told(stAugustine, "winter_ryegrass_spring_transition", "homeowner")?.message).toMatch(/your usual summer height/);
  });

  it("a cool-season overseeding gets none of the warm-season findings", () => {
    const warmCodes = [...codes(overseedingVisit())].filter((c) => /winter_|warm_season_seed/.test(c));
    expect(warmCodes).toEqual([]);
  });

  it("visitWarnings shows the warm-season findings the plan has", () => {
    const raw = winter({ property: { grassType: { species: ["zoysiagrass"] }, currentMowingHeightIn: 2 } });
    expect(visitWarnings(valid(raw))).toEqual(warningsOf(raw));
  });
});

describe("warm-season seed: soil warmth and slow sprouting", () => {
  it("April in Georgia is early: bermudagrass needs soil about 65–70 °F (TRADE-REFERENCES, UGA / Clemson, from memory)", () => {
    const raw = bermudaSeed({ visit: { date: "2026-04-10" } });
    const crew = told(raw, "warm_season_seed_cool_soil", "crew");
    expect(crew?.message).toMatch(/^Bermudagrass seed needs soil about 65–70 °F to sprout/);
    expect(crew).toMatchObject({ severity: "caution", provenance: "from memory" });
    expect(told(raw, "warm_season_seed_cool_soil", "homeowner")?.message).toMatch(/sprouts only once the soil warms up/);
  });

  it("early June (late spring, the guides' seeding window) has no soil note", () => {
    expect(codes(bermudaSeedingVisit()).has("warm_season_seed_cool_soil")).toBe(false);
  });

  it("follows the hemisphere: June in Sydney is early, December is not", () => {
    const sydney = (date: string) => bermudaSeed({ visit: { date }, property: { timeZone: "Australia/Sydney", expectedFirstFrost: undefined } });
    expect(codes(sydney("2026-06-15")).has("warm_season_seed_cool_soil")).toBe(true);
    expect(codes(sydney("2026-12-01")).has("warm_season_seed_cool_soil")).toBe(false);
  });

  it("says how long sprouts take: bermudagrass 7–21 days (species table, from memory), for crew and homeowner", () => {
    expect(told(bermudaSeedingVisit(), "warm_season_seed_emergence", "crew")?.message).toMatch(/about 7–21 days/);
    expect(told(bermudaSeedingVisit(), "warm_season_seed_emergence", "homeowner")?.message).toMatch(/about 7–21 days to sprout/);
  });

  it("a mix of warm-season seeds spans the fastest start to the slowest end (bermudagrass 7, centipedegrass 28)", () => {
    const raw = bermudaSeed({
      visit: {
        seedMix: [
          { species: "bermudagrass", percent: 50, purityPct: 95, germinationPct: 85 },
          { species: "centipedegrass", percent: 50, purityPct: 95, germinationPct: 85 },
        ],
        seedRateLbPer1000: 1,
      },
    });
    expect(told(raw, "warm_season_seed_emergence", "crew")?.message).toMatch(/^Bermudagrass, centipedegrass seed is slow to come up: expect sprouts in about 7–28 days/);
  });
});
