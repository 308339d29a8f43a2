import { describe, expect, it } from "vitest";
import { CalculatorInputError } from "./errors.ts";
import {
  bagsNeeded,
  nutrientsDelivered,
  phosphateFromPhosphorus,
  phosphorusFromPhosphate,
  PHOSPHORUS_PER_PHOSPHATE,
  productPerThousand,
  totalProduct,
} from "./fertilizer.ts";

describe("productPerThousand and totalProduct", () => {
  it("1.0 lb N from 28-3-6 needs 3.57 lb/1,000 ft², 21.4 lb on 6,000 ft² (University of Nebraska–Lincoln, Backyard Farmer, 'Lawn Fertilizer Calculations')", () => {
    const perThousand = productPerThousand(1.0, 28);
    expect(perThousand).toBeCloseTo(3.57, 2);
    expect(totalProduct(perThousand, 6000)).toBeCloseTo(21.4, 1);
  });

  it("1 lb N from a 20 % N product needs 5 lb/1,000 ft², 60 lb on 12,000 ft² (Country Gardener, 'Fertilizer calculations')", () => {
    const perThousand = productPerThousand(1, 20);
    expect(perThousand).toBeCloseTo(5, 10);
    expect(totalProduct(perThousand, 12_000)).toBeCloseTo(60, 10);
  });

  it("refuses a 0 % or over-100 % analysis with the field name instead of returning Infinity", () => {
    expect(() => productPerThousand(1, 0)).toThrow(CalculatorInputError);
    try {
      productPerThousand(1, 120);
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(CalculatorInputError);
      expect((error as CalculatorInputError).field).toBe("analysisPct");
    }
  });

  it("refuses a negative area", () => {
    expect(() => totalProduct(3, -10)).toThrow(/areaFt2/);
  });
});

describe("bagsNeeded", () => {
  it("rounds a part bag up: 60 lb in 50 lb bags is 2 bags (whole bags are bought)", () => {
    expect(bagsNeeded(60, 50)).toBe(2);
    expect(bagsNeeded(21.4, 50)).toBe(1);
  });

  it("does not buy an extra bag for an exact multiple, even after floating-point drift", () => {
    expect(bagsNeeded(0.1 * 3 * 100, 10)).toBe(3); // 0.1*3 = 0.30000000000000004
  });

  it("refuses a zero bag size", () => {
    expect(() => bagsNeeded(10, 0)).toThrow(CalculatorInputError);
  });
});

describe("nutrientsDelivered", () => {
  it("reverses the Nebraska example: 3.57 lb of 28-3-6 puts down ≈1.0 lb N per 1,000 ft² (UNL Backyard Farmer)", () => {
    const delivered = nutrientsDelivered({ n: 28, p: 3, k: 6 }, 1 / 0.28, 6000);
    expect(delivered.perThousand.n).toBeCloseTo(1.0, 10);
    expect(delivered.total.n).toBeCloseTo(6.0, 10);
    expect(delivered.perThousand.p).toBeCloseTo(3 / 28, 10);
  });

  it("refuses an analysis that adds up to more than the bag", () => {
    expect(() => nutrientsDelivered({ n: 60, p: 30, k: 20 }, 2, 1000)).toThrow(/analysis/);
  });

  it("names the offending grade for a negative one", () => {
    try {
      nutrientsDelivered({ n: -1, p: 0, k: 0 }, 2, 1000);
      expect.unreachable();
    } catch (error) {
      expect((error as CalculatorInputError).field).toBe("analysis.n");
    }
  });
});

describe("phosphate (P₂O₅) and phosphorus (P)", () => {
  it("P = P₂O₅ × 0.4364 (published labelling conversion), which the atomic masses confirm (P 30.974, O 15.999)", () => {
    expect(PHOSPHORUS_PER_PHOSPHATE).toBe(0.4364);
    expect((2 * 30.974) / (2 * 30.974 + 5 * 15.999)).toBeCloseTo(PHOSPHORUS_PER_PHOSPHATE, 4);
  });

  it("24 lb of P₂O₅ is 10.47 lb of P, and 1 lb of P is 2.29 lb of P₂O₅", () => {
    expect(phosphorusFromPhosphate(24)).toBeCloseTo(10.4736, 4);
    expect(phosphateFromPhosphorus(1)).toBeCloseTo(2.2915, 4);
    expect(phosphorusFromPhosphate(phosphateFromPhosphorus(1.5))).toBeCloseTo(1.5, 12);
  });

  it("refuses negative amounts", () => {
    expect(() => phosphorusFromPhosphate(-1)).toThrow(CalculatorInputError);
  });
});
