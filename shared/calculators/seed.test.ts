import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "./errors.ts";
import { bulkSeedNeeded, pureLiveSeed, seedsPerSqFt } from "./seed.ts";

describe("pure live seed (Cornell University, Safe Sports Fields, 'Seeding rates')", () => {
  it("95 % purity × 85 % germination is 0.8075 PLS", () => {
    expect(pureLiveSeed(95, 85)).toBeCloseTo(0.8075, 10);
  });

  it("5 lb of PLS at 80.75 % needs 6.19 lb of bulk seed (derived from the Cornell example)", () => {
    expect(bulkSeedNeeded(5, pureLiveSeed(95, 85))).toBeCloseTo(6.19, 2);
  });

  it("refuses a germination percentage over 100", () => {
    expect(() => pureLiveSeed(95, 101)).toThrow(CalculatorInputError);
  });

  it("refuses a zero PLS fraction rather than dividing by zero", () => {
    expect(() => bulkSeedNeeded(5, 0)).toThrow(/plsFraction/);
  });
});

describe("seedsPerSqFt", () => {
  it("2 lb/1,000 ft² of Kentucky bluegrass at ≈1.5 million seeds/lb is ≈3,000 seeds/ft² (Cornell, 'Seeding rates')", () => {
    expect(seedsPerSqFt(2, 1_500_000)).toBeCloseTo(3000, 6);
  });

  it("5 lb/1,000 ft² of perennial ryegrass at ≈250,000 seeds/lb is ≈1,250 seeds/ft² (Cornell, 'Seeding rates')", () => {
    expect(seedsPerSqFt(5, 250_000)).toBeCloseTo(1250, 6);
  });

  it("refuses a negative rate", () => {
    expect(() => seedsPerSqFt(-1, 250_000)).toThrow(/rateLbPer1000/);
  });
});
