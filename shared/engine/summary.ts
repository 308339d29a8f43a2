import { nutrientsDelivered, totalProduct, type NutrientAmounts } from "../calculators/fertilizer.ts";
import { minutesPerCycle } from "../calculators/irrigation.ts";
import { pureLiveSeed, seedsPerSqFt } from "../calculators/seed.ts";
import { ft2ToM2, lbPer1000Ft2ToGPerM2, lbToKg } from "../calculators/units.ts";
import type { PlanContext } from "./context.ts";
import { expectedSeedRange } from "./rules/warnings.ts";
import { SPECIES_FACTS } from "./tables/species.ts";
import type { CalculatorSummary, ProductSummary, SeedSummary, SpeciesSeedSummary } from "./types.ts";

const ZERO: NutrientAmounts = { n: 0, p: 0, k: 0 };
const add = (a: NutrientAmounts, b: NutrientAmounts): NutrientAmounts => ({ n: a.n + b.n, p: a.p + b.p, k: a.k + b.k });

function seedSummary(ctx: PlanContext): SeedSummary | null {
  const { visit } = ctx.input;
  const rate = visit.seedRateLbPer1000;
  if (visit.seedMix.length === 0 || rate === undefined) return null;
  const totalPercent = visit.seedMix.reduce((s, e) => s + e.percent, 0);
  const bulkSeedLb = totalProduct(rate, visit.areaFt2);
  const perSpecies: SpeciesSeedSummary[] = visit.seedMix.map((entry) => {
    const share = entry.percent / totalPercent;
    const seedsPerLb = SPECIES_FACTS[entry.species].seedsPerLb;
    return {
      species: entry.species,
      percent: entry.percent,
      plsFraction: pureLiveSeed(entry.purityPct, entry.germinationPct),
      bulkLb: bulkSeedLb * share,
      seedsPerSqFt: seedsPerLb ? seedsPerSqFt(rate * share, seedsPerLb.value) : null,
    };
  });
  const plsFraction = perSpecies.reduce((s, e) => s + (e.plsFraction * e.percent) / totalPercent, 0);
  // A mix total is only honest when every species has a published seed count.
  const seedsKnown = perSpecies.every((e) => e.seedsPerSqFt !== null);
  const range = expectedSeedRange(ctx);
  return {
    rateLbPer1000: rate,
    rateGPerM2: lbPer1000Ft2ToGPerM2(rate),
    plsFraction,
    plsRateLbPer1000: rate * plsFraction,
    bulkSeedLb,
    pureLiveSeedLb: bulkSeedLb * plsFraction,
    seedsPerSqFt: seedsKnown ? perSpecies.reduce((s, e) => s + (e.seedsPerSqFt ?? 0), 0) : null,
    expectedRangeLbPer1000: range,
    perSpecies,
  };
}

export function calculatorSummary(ctx: PlanContext): CalculatorSummary {
  const { visit } = ctx.input;
  const products: ProductSummary[] = visit.products.map((p) => {
    const delivered = nutrientsDelivered(p.analysis, p.rateLbPer1000, visit.areaFt2);
    const totalLb = totalProduct(p.rateLbPer1000, visit.areaFt2);
    return {
      name: p.name,
      rateLbPer1000: p.rateLbPer1000,
      totalLb,
      totalKg: lbToKg(totalLb),
      nutrientsPer1000: delivered.perThousand,
      nutrientsTotal: delivered.total,
    };
  });
  return {
    areaFt2: visit.areaFt2,
    areaM2: ft2ToM2(visit.areaFt2),
    seed: seedSummary(ctx),
    products,
    nutrientsPer1000: products.reduce((sum, p) => add(sum, p.nutrientsPer1000), ZERO),
    nutrientsTotal: products.reduce((sum, p) => add(sum, p.nutrientsTotal), ZERO),
    precipitationRateInPerHour: ctx.precipitationRate,
    precipitationRateMeasured: ctx.precipitationRateMeasured,
    precipitationRateDefault: ctx.precipitationRateMeasured
      ? null
      : ctx.sprinklerDefault
        ? {
            basis: "sprinkler_type",
            minInPerHour: ctx.sprinklerDefault.rateInPerHour.min,
            maxInPerHour: ctx.sprinklerDefault.rateInPerHour.max,
            source: ctx.sprinklerDefault.rateInPerHour.source,
            provenance: ctx.sprinklerDefault.rateInPerHour.provenance,
          }
        : { basis: "program" },
    germinationMinutesPerCycle: ctx.seeding ? minutesPerCycle(ctx.program.waterDepthPerCycleIn, ctx.precipitationRate) : null,
  };
}
