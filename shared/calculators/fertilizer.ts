import { CalculatorInputError, requireNonNegative, requirePercent, requirePositive } from "./errors.ts";

/** Guaranteed analysis from the bag, in percent by weight (N, P as P₂O₅, K as K₂O). */
export interface NpkAnalysis {
  readonly n: number;
  readonly p: number;
  readonly k: number;
}

export interface NutrientAmounts {
  readonly n: number;
  readonly p: number;
  readonly k: number;
}

export function validateAnalysis(analysis: NpkAnalysis, field = "analysis"): NpkAnalysis {
  requirePercent(`${field}.n`, analysis.n);
  requirePercent(`${field}.p`, analysis.p);
  requirePercent(`${field}.k`, analysis.k);
  // The three grades are shares of one bag's weight, so together they cannot pass 100 %.
  if (analysis.n + analysis.p + analysis.k > 100) {
    throw new CalculatorInputError(field, "N + P + K must not exceed 100 %");
  }
  return analysis;
}

/** Pounds of product per 1,000 ft² that deliver the nutrient target (lb per 1,000 ft²). */
export function productPerThousand(nutrientTargetLb: number, analysisPct: number): number {
  requireNonNegative("nutrientTargetLb", nutrientTargetLb);
  requirePercent("analysisPct", analysisPct);
  if (analysisPct === 0) throw new CalculatorInputError("analysisPct", "a 0 % product cannot deliver that nutrient");
  return nutrientTargetLb / (analysisPct / 100);
}

/** Product for the whole area from a per-1,000 ft² rate. */
export function totalProduct(perThousand: number, areaFt2: number): number {
  requireNonNegative("perThousand", perThousand);
  requireNonNegative("areaFt2", areaFt2);
  return (perThousand * areaFt2) / 1000;
}

/** Whole bags: a partial bag still has to be bought. */
export function bagsNeeded(totalLb: number, bagSizeLb: number): number {
  requireNonNegative("totalLb", totalLb);
  requirePositive("bagSizeLb", bagSizeLb);
  // Tolerance so 100 lb in 50 lb bags is 2 bags even after floating-point drift.
  return Math.ceil(totalLb / bagSizeLb - 1e-9);
}

export interface NutrientsDelivered {
  readonly perThousand: NutrientAmounts;
  readonly total: NutrientAmounts;
}

/** N-P-K actually put down, per 1,000 ft² and over the whole area. */
export function nutrientsDelivered(
  analysis: NpkAnalysis,
  rateLbPer1000: number,
  areaFt2: number,
): NutrientsDelivered {
  validateAnalysis(analysis);
  requireNonNegative("rateLbPer1000", rateLbPer1000);
  requireNonNegative("areaFt2", areaFt2);
  const perThousand = {
    n: (rateLbPer1000 * analysis.n) / 100,
    p: (rateLbPer1000 * analysis.p) / 100,
    k: (rateLbPer1000 * analysis.k) / 100,
  };
  const scale = areaFt2 / 1000;
  return {
    perThousand,
    total: { n: perThousand.n * scale, p: perThousand.p * scale, k: perThousand.k * scale },
  };
}

/**
 * A bag's middle number is phosphate (P₂O₅); elemental phosphorus is 0.4364
 * of it (standard fertilizer-labelling conversion from atomic masses:
 * 2 × 30.974 ÷ (2 × 30.974 + 5 × 15.999)).
 */
export const PHOSPHORUS_PER_PHOSPHATE = 0.4364;

export function phosphorusFromPhosphate(p2o5Lb: number): number {
  requireNonNegative("p2o5Lb", p2o5Lb);
  return p2o5Lb * PHOSPHORUS_PER_PHOSPHATE;
}

export function phosphateFromPhosphorus(pLb: number): number {
  requireNonNegative("pLb", pLb);
  return pLb / PHOSPHORUS_PER_PHOSPHATE;
}
