export { CalculatorInputError } from "./errors.ts";
export * from "./units.ts";
export { pureLiveSeed, bulkSeedNeeded, seedsPerSqFt } from "./seed.ts";
export {
  productPerThousand,
  totalProduct,
  bagsNeeded,
  nutrientsDelivered,
  PHOSPHORUS_PER_PHOSPHATE,
  phosphorusFromPhosphate,
  phosphateFromPhosphorus,
  validateAnalysis,
  type NpkAnalysis,
  type NutrientAmounts,
  type NutrientsDelivered,
} from "./fertilizer.ts";
export {
  CATCH_CAN_CONSTANT,
  openingAreaIn2,
  precipitationRateInPerHour,
  lowQuarterDU,
  minutesPerCycle,
} from "./irrigation.ts";
