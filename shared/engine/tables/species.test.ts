import { describe, expect, it } from "vitest";
import { OVERSEEDING_TO_NEW_SEEDING_RATIO, SPECIES, SPECIES_FACTS } from "./species.ts";

describe("species table matches the trade references", () => {
  it("tall fescue: new seeding 6–8 lb/1,000 ft² (Cornell 'Seeding rates'; Nebraska Extension 2021)", () => {
    expect(SPECIES_FACTS.tall_fescue.newSeedingLbPer1000).toMatchObject({ min: 6, max: 8, provenance: "published" });
  });

  it("tall fescue: overseeding 4–6 lb/1,000 ft² (Colorado State University Extension, Ask Extension #877015)", () => {
    const range = SPECIES_FACTS.tall_fescue.overseedingLbPer1000;
    expect(range).toMatchObject({ min: 4, max: 6, provenance: "published" });
    expect(range.source).toMatch(/877015/);
  });

  it("Kentucky bluegrass: new seeding 1–3 (Cornell), which contains Nebraska's 2–3", () => {
    expect(SPECIES_FACTS.kentucky_bluegrass.newSeedingLbPer1000).toMatchObject({ min: 1, max: 3 });
    expect(SPECIES_FACTS.kentucky_bluegrass.newSeedingLbPer1000.source).toMatch(/Nebraska/);
  });

  it("perennial ryegrass 100 % stand: 4–6 lb/1,000 ft² (Cornell 'Seeding rates')", () => {
    expect(SPECIES_FACTS.perennial_ryegrass.newSeedingLbPer1000).toMatchObject({ min: 4, max: 6, provenance: "published" });
  });

  it("overseeding ≈ half the new-seeding rate where no overseeding figure is published (ratio 0.5, Nebraska Extension 2021)", () => {
    expect(OVERSEEDING_TO_NEW_SEEDING_RATIO).toBe(0.5);
    const kbg = SPECIES_FACTS.kentucky_bluegrass;
    expect(kbg.overseedingLbPer1000.min).toBeCloseTo(kbg.newSeedingLbPer1000.min * 0.5, 12);
    expect(kbg.overseedingLbPer1000.max).toBeCloseTo(kbg.newSeedingLbPer1000.max * 0.5, 12);
    expect(kbg.overseedingLbPer1000.source).toMatch(/ratio 0\.5/);
  });

  it("seeds per pound: Kentucky bluegrass ≈1.5 million, perennial ryegrass ≈250,000 (Cornell 'Seeding rates')", () => {
    expect(SPECIES_FACTS.kentucky_bluegrass.seedsPerLb?.value).toBe(1_500_000);
    expect(SPECIES_FACTS.perennial_ryegrass.seedsPerLb?.value).toBe(250_000);
  });

  it("days to emerge (from memory, land-grant establishment guides): ryegrass 5–10, tall and fine fescue 7–14, bluegrass 14–30", () => {
    expect(SPECIES_FACTS.perennial_ryegrass.emergenceDays).toMatchObject({ min: 5, max: 10, provenance: "from memory" });
    expect(SPECIES_FACTS.tall_fescue.emergenceDays).toMatchObject({ min: 7, max: 14 });
    expect(SPECIES_FACTS.fine_fescue.emergenceDays).toMatchObject({ min: 7, max: 14 });
    expect(SPECIES_FACTS.kentucky_bluegrass.emergenceDays).toMatchObject({ min: 14, max: 30 });
  });

  it("warm-season species are not in the references, so none of their figures claims to be published", () => {
    for (const species of SPECIES) {
      const facts = SPECIES_FACTS[species];
      if (facts.season !== "warm") continue;
      for (const fact of [facts.emergenceDays, facts.newSeedingLbPer1000, facts.overseedingLbPer1000]) {
        expect(fact.provenance, species).toBe("from memory");
      }
    }
  });

  it("every row has a source, ordered ranges, and seeds per pound only where published", () => {
    for (const species of SPECIES) {
      const facts = SPECIES_FACTS[species];
      expect(facts.species).toBe(species);
      for (const range of [facts.emergenceDays, facts.newSeedingLbPer1000, facts.overseedingLbPer1000]) {
        expect(range.source.length).toBeGreaterThan(0);
        expect(range.min).toBeLessThanOrEqual(range.max);
      }
      if (facts.seedsPerLb) expect(facts.seedsPerLb.provenance).toBe("published");
    }
  });
});
