import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "./errors.ts";
import {
  CATCH_CAN_CONSTANT,
  lowQuarterDU,
  minutesPerCycle,
  openingAreaIn2,
  precipitationRateInPerHour,
} from "./irrigation.ts";
import { MM_PER_IN } from "./units.ts";

describe("catch-can precipitation rate", () => {
  it("the auditor constant 3.66 comes out of 60 × in³ per mL (from memory: Irrigation Association; checked by unit conversion)", () => {
    // 1 mL = 1 cm³ and 1 in = 2.54 cm exactly (NIST SP 811), so in³/mL = 1/2.54³.
    expect(CATCH_CAN_CONSTANT).toBeCloseTo(60 / 2.54 ** 3, 12);
    // Loose tolerance: the 3.66 we check against was recalled, not re-read.
    expect(Math.abs(CATCH_CAN_CONSTANT - 3.66)).toBeLessThan(0.005);
  });

  it("round can opening area is π(d/2)² (CSU Chico DU calculator notes)", () => {
    expect(openingAreaIn2(4)).toBeCloseTo(4 * Math.PI, 12);
  });

  it("agrees with a first-principles depth calculation for a 4 in can, 50 mL in 15 min", () => {
    const area = openingAreaIn2(4);
    const depthIn = (50 / (MM_PER_IN / 10) ** 3) / area; // cm³ → in³, spread over the opening
    const expected = depthIn * (60 / 15);
    expect(precipitationRateInPerHour(50, area, 15)).toBeCloseTo(expected, 12);
  });

  it("refuses a zero-minute run", () => {
    expect(() => precipitationRateInPerHour(50, 12, 0)).toThrow(CalculatorInputError);
  });
});

describe("lowQuarterDU (from memory: Irrigation Association)", () => {
  it("is 1 for perfectly even catches", () => {
    expect(lowQuarterDU([30, 30, 30, 30, 30, 30, 30, 30])).toBe(1);
  });

  it("divides the mean of the lowest two of eight cans by the mean of all", () => {
    const catches = [10, 20, 30, 40, 50, 60, 70, 80];
    expect(lowQuarterDU(catches)).toBeCloseTo(15 / 45, 12);
  });

  it("refuses all-empty cans and too few cans", () => {
    expect(() => lowQuarterDU([0, 0, 0, 0])).toThrow(/catches/);
    expect(() => lowQuarterDU([1, 2])).toThrow(/catches/);
  });
});

describe("minutesPerCycle", () => {
  it("0.1 in at 1.0 in/h is 6 minutes (derived: depth ÷ PR × 60)", () => {
    expect(minutesPerCycle(0.1, 1.0)).toBeCloseTo(6, 12);
  });

  it("refuses a zero precipitation rate", () => {
    expect(() => minutesPerCycle(0.1, 0)).toThrow(/prInPerHour/);
  });
});
