import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { overseedingVisit, withChanges } from "../testing/fixtures.ts";
import { parsePlanInput } from "./parse.ts";

function fieldsOf(raw: unknown): Record<string, string> {
  const result = parsePlanInput(raw);
  if (result.ok) throw new Error("expected the input to be rejected");
  return result.fields;
}

describe("parsePlanInput: the typical overseeding visit", () => {
  it("is accepted and gets the program defaults filled in", () => {
    const result = parsePlanInput(overseedingVisit());
    expect(result.ok).toBe(true);
    if (result.ok) {
      expect(result.value.program.germinationDays).toBe(14);
      expect(result.value.options.observations).toEqual([]);
    }
  });
});

describe("parsePlanInput: field errors name the exact path", () => {
  it("negative area → visit.areaFt2", () => {
    expect(Object.keys(fieldsOf(withChanges({ visit: { areaFt2: -100 } })))).toEqual(["visit.areaFt2"]);
  });

  it("analysis over 100 % in total → visit.products.0.analysis", () => {
    const raw = withChanges({
      visit: { products: [{ name: "Impossible", analysis: { n: 60, p: 30, k: 20 }, rateLbPer1000: 3 }] },
    });
    expect(Object.keys(fieldsOf(raw))).toEqual(["visit.products.0.analysis"]);
  });

  it("one grade over 100 % → visit.products.0.analysis.n", () => {
    const raw = withChanges({
      visit: { products: [{ name: "Typo", analysis: { n: 280, p: 3, k: 6 }, rateLbPer1000: 3 }] },
    });
    expect(fieldsOf(raw)).toHaveProperty(["visit.products.0.analysis.n"]);
  });

  it("mix percentages adding to 90 → visit.seedMix, and 99.6 is accepted (±0.5 tolerance)", () => {
    const mix = (a: number, b: number) => [
      { species: "tall_fescue" as const, percent: a, purityPct: 98, germinationPct: 90 },
      { species: "kentucky_bluegrass" as const, percent: b, purityPct: 97, germinationPct: 85 },
    ];
    expect(fieldsOf(withChanges({ visit: { seedMix: mix(80, 10) } }))["visit.seedMix"]).toMatch(/90/);
    expect(parsePlanInput(withChanges({ visit: { seedMix: mix(89.6, 10) } })).ok).toBe(true);
  });

  it("unknown species → visit.seedMix.0.species", () => {
    const raw = withChanges({
      visit: { seedMix: [{ species: "crabgrass" as never, percent: 100, purityPct: 98, germinationPct: 90 }] },
    });
    expect(Object.keys(fieldsOf(raw))).toEqual(["visit.seedMix.0.species"]);
  });

  it("accepts a first frost on or before the visit: the frost has come, and the season check calls the work late or dormant", () => {
    expect(parsePlanInput(withChanges({ property: { expectedFirstFrost: "2026-09-01" } })).ok).toBe(true);
    expect(parsePlanInput(withChanges({ property: { expectedFirstFrost: "2026-09-10" } })).ok).toBe(true);
  });

  it("invalid IANA zone → property.timeZone", () => {
    expect(Object.keys(fieldsOf(withChanges({ property: { timeZone: "Eastern Time" } })))).toEqual(["property.timeZone"]);
  });

  it("impossible visit date → visit.date", () => {
    expect(Object.keys(fieldsOf(withChanges({ visit: { date: "2026-02-30" } })))).toEqual(["visit.date"]);
  });

  it("overseeding with no seed listed → visit.seedMix; seed without a rate → visit.seedRateLbPer1000", () => {
    expect(fieldsOf(withChanges({ visit: { seedMix: [] } }))).toHaveProperty(["visit.seedMix"]);
    const noRate = overseedingVisit();
    delete noRate.visit.seedRateLbPer1000;
    expect(Object.keys(fieldsOf(noRate))).toEqual(["visit.seedRateLbPer1000"]);
  });

  it("program settings below their safe bounds → program.firstMowMinDays / program.germinationDays", () => {
    const fields = fieldsOf({ ...overseedingVisit(), program: { firstMowMinDays: 7, germinationDays: 10 } });
    expect(Object.keys(fields).sort()).toEqual(["program.firstMowMinDays", "program.germinationDays"]);
  });

  it("germination watering times that do not match the cycles a day → program.germinationWateringTimes", () => {
    const fields = fieldsOf({ ...overseedingVisit(), program: { wateringCyclesPerDayGermination: 3, germinationWateringTimes: ["07:00", "12:00"] } });
    expect(Object.keys(fields)).toEqual(["program.germinationWateringTimes"]);
  });

  it("never throws, whatever arrives in the request body", () => {
    fc.assert(
      fc.property(fc.anything(), (raw) => {
        const result = parsePlanInput(raw);
        expect(typeof result.ok).toBe("boolean");
      }),
      { numRuns: 300 },
    );
  });
});

describe("parsePlanInput: near-valid inputs", () => {
  // Junk in one spot of an otherwise valid input is what a buggy client sends;
  // the cross-field checks must cope with it rather than throw.
  const junk = fc.oneof(fc.constant(null), fc.constant(undefined), fc.string(), fc.integer(), fc.constant([]), fc.constant({}), fc.double());
  const leafPaths: (string | number)[][] = [
    ["visit", "date"], ["visit", "services"], ["visit", "services", 0], ["visit", "seedMix"], ["visit", "seedMix", 0],
    ["visit", "seedMix", 0, "percent"], ["visit", "seedMix", 0, "species"], ["visit", "seedRateLbPer1000"],
    ["visit", "areaFt2"], ["visit", "products", 0, "analysis"], ["visit", "products", 0, "analysis", "n"],
    ["property", "grassType"], ["property", "grassType", "species"], ["property", "timeZone"],
    ["property", "expectedFirstFrost"], ["property", "currentMowingHeightIn"], ["property", "irrigation"],
    ["visit"], ["property"],
  ];

  it("returns field errors, never throws, when any one field holds junk", () => {
    fc.assert(
      fc.property(fc.constantFrom(...leafPaths), junk, (path, value) => {
        const raw = overseedingVisit() as unknown as Record<string | number, unknown>;
        let target = raw;
        for (const key of path.slice(0, -1)) target = target[key] as Record<string | number, unknown>;
        target[path[path.length - 1]!] = value;
        const result = parsePlanInput(raw);
        if (!result.ok) expect(Object.keys(result.fields).length).toBeGreaterThan(0);
      }),
      { numRuns: 500 },
    );
  });
});
