import { CalculatorInputError, requireNonNegative, requirePercent, requirePositive } from "./errors.ts";

/**
 * Pure live seed as a fraction: purity × germination (Cornell, "Seeding rates").
 * Both inputs are the percentages printed on the seed tag.
 */
export function pureLiveSeed(purityPct: number, germinationPct: number): number {
  requirePercent("purityPct", purityPct);
  requirePercent("germinationPct", germinationPct);
  return (purityPct / 100) * (germinationPct / 100);
}

/** Bulk seed that carries the wanted pounds of pure live seed. */
export function bulkSeedNeeded(plsTargetLb: number, plsFraction: number): number {
  requireNonNegative("plsTargetLb", plsTargetLb);
  requirePositive("plsFraction", plsFraction);
  if (plsFraction > 1) throw new CalculatorInputError("plsFraction", "must be a fraction between 0 and 1");
  return plsTargetLb / plsFraction;
}

/** Seeds landing on each square foot at a rate given per 1,000 ft². */
export function seedsPerSqFt(rateLbPer1000: number, seedsPerLb: number): number {
  requireNonNegative("rateLbPer1000", rateLbPer1000);
  requirePositive("seedsPerLb", seedsPerLb);
  return (rateLbPer1000 * seedsPerLb) / 1000;
}
