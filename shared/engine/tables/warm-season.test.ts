import { describe, expect, it } from "vitest";
import { WARM_SEASON_MOWING_HEIGHT_IN, WINTER_RYEGRASS_MOWING_HEIGHT_IN } from "./mowing.ts";
import { SPECIES, SPECIES_FACTS } from "./species.ts";
import {
  WARM_SEASON_GERMINATION_SOIL_F,
  WARM_SOIL_MONTHS,
  WINTER_OVERSEEDING_ADVISED_AGAINST,
  WINTER_OVERSEEDING_PREP,
  WINTER_RYEGRASS_SEED_LB_PER_1000,
} from "./warm-season.ts";

describe("warm-season tables match the trade references", () => {
  it("winter ryegrass on bermudagrass: about 5–10 lb per 1,000 ft² (TRADE-REFERENCES: Clemson / UGA, from memory), above the 2–3 lb cool-season ryegrass overseeding", () => {
    expect(WINTER_RYEGRASS_SEED_LB_PER_1000).toMatchObject({ min: 5, max: 10, provenance: "from memory" });
    expect(WINTER_RYEGRASS_SEED_LB_PER_1000.min).toBeGreaterThan(SPECIES_FACTS.perennial_ryegrass.overseedingLbPer1000.max);
  });

  it("advised against on centipede, St. Augustine and zoysia (TRADE-REFERENCES, from memory); bahia is not listed", () => {
    expect([...WINTER_OVERSEEDING_ADVISED_AGAINST.species].sort()).toEqual(["centipedegrass", "st_augustinegrass", "zoysiagrass"]);
    expect(WINTER_OVERSEEDING_ADVISED_AGAINST.provenance).toBe("from memory");
  });

  it("scalp height 1 in, within the Kansas City Star column's 1–1.5 in before verticutting", () => {
    expect(WINTER_OVERSEEDING_PREP.scalpHeightIn).toBeGreaterThanOrEqual(1);
    expect(WINTER_OVERSEEDING_PREP.scalpHeightIn).toBeLessThanOrEqual(1.5);
    expect(WINTER_OVERSEEDING_PREP.scalpSource).toMatch(/Kansas City Star/);
  });

  it("warm-season seed needs soil about 65–70 °F (TRADE-REFERENCES: UGA / Clemson, from memory)", () => {
    expect(WARM_SEASON_GERMINATION_SOIL_F).toMatchObject({ min: 65, max: 70, provenance: "from memory" });
  });

  it("warm-soil months are five in each hemisphere, six months apart", () => {
    expect(WARM_SOIL_MONTHS.north).toHaveLength(5);
    expect(WARM_SOIL_MONTHS.south.map((m) => ((m + 5) % 12) + 1)).toEqual(WARM_SOIL_MONTHS.north);
  });
});

describe("mowing heights by species (southern extension lawn guides, from memory; check against a publication)", () => {
  it.each([
    ["bermudagrass", 1, 1.5],
    ["zoysiagrass", 1, 2],
    ["centipedegrass", 1, 2],
    ["st_augustinegrass", 2.5, 4],
    ["bahiagrass", 3, 4],
  ] as const)("%s: %s–%s in", (species, min, max) => {
    expect(WARM_SEASON_MOWING_HEIGHT_IN[species]).toMatchObject({ min, max, provenance: "from memory" });
  });

  it("every warm-season species has a height and no cool-season species does (their new grass keeps the highest-setting rule)", () => {
    for (const species of SPECIES) {
      expect(WARM_SEASON_MOWING_HEIGHT_IN[species] !== undefined, species).toBe(SPECIES_FACTS[species].season === "warm");
    }
  });

  it("winter ryegrass about 2–2.5 in (Texas A&M AgriLife specialists, quoted at plantanswers.com)", () => {
    expect(WINTER_RYEGRASS_MOWING_HEIGHT_IN).toMatchObject({ min: 2, max: 2.5, provenance: "published" });
    expect(WINTER_RYEGRASS_MOWING_HEIGHT_IN.source).toMatch(/Texas A&M/);
  });
});
