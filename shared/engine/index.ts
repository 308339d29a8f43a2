/*
 * The care-plan engine. Pure: no I/O, no clock. "Today" and the property's
 * IANA zone are inputs. Validate API bodies with parsePlanInput, then call
 * generatePlan / recomputePlan with the parsed value.
 */
export { generatePlan, visitWarnings, ENGINE_VERSION } from "./generate.ts";
export { homeownerWarnings } from "./rules/audiences.ts";
export { recomputePlan, type PreviousPlan } from "./recompute.ts";
export { parsePlanInput, fieldErrorsFrom, ROOT_FIELD, type FieldErrors, type ParseResult } from "./schemas/parse.ts";
export {
  planInputSchema,
  visitSchema,
  propertySchema,
  irrigationSchema,
  seedMixEntrySchema,
  productAppliedSchema,
  analysisSchema,
  observationSchema,
  planOptionsSchema,
  isoDateSchema,
  localTimeSchema,
  speciesSchema,
  timeZoneSchema,
  SERVICES,
  SEEDING_SERVICES,
  SEED_MIX_SUM_TOLERANCE,
  LAWN_CONDITIONS,
  type LawnCondition,
  SLOPES,
  SHADE_LEVELS,
  type Slope,
  type ShadeLevel,
  type Service,
  type SeedMixEntry,
  type ProductApplied,
  type PriorPreEmergent,
  type Visit,
  type Irrigation,
  type Property,
  type Observation,
  type PlanOptions,
  type PlanInput,
  type PlanInputRaw,
} from "./schemas/plan-input.ts";
export {
  placeRulesSchema,
  blackoutWindowSchema,
  wateringDaysSchema,
  monthDaySchema,
  isValidMonthDay,
  PHOSPHORUS_RULES,
  type PlaceRules,
  type PlaceRulesInput,
  type BlackoutWindow,
  type WateringDays,
  type PhosphorusRule,
} from "./schemas/place-rules.ts";
export { inFertilizerBlackout, weekdayOfDayNumber } from "./rules/place-rules.ts";
export {
  programSettingsSchema,
  programSettingBounds,
  defaultProgramSettings,
  CHECK_IN_DAY_BOUNDS,
  type ProgramSettings,
  type ProgramSettingsInput,
  type SettingBound,
  type NumericSettingKey,
} from "./schemas/program-settings.ts";
export type * from "./types.ts";
export { SPECIES, SPECIES_FACTS, OVERSEEDING_TO_NEW_SEEDING_RATIO, type Species, type Season, type SpeciesFacts } from "./tables/species.ts";
export { CAUTIONS, CAUTION_IDS, type Caution, type CautionId } from "./tables/cautions.ts";
export { SOURCES } from "./tables/sources.ts";
export type { Provenance, Sourced, SourcedRange, Why } from "./tables/provenance.ts";
export { SPRINKLER_TYPES, SPRINKLER_DEFAULTS, HOSE_END_DEFAULT, type SprinklerType, type SprinklerDefault } from "./tables/sprinklers.ts";
export { FROST_RULE, hemisphereOfZone, type Hemisphere } from "./tables/timing.ts";
export {
  PRIOR_PRE_EMERGENT_PRODUCTS,
  PRE_EMERGENT_INGREDIENTS,
  PRE_EMERGENT_INGREDIENT_NAMES,
  type PriorPreEmergentProduct,
  type PreEmergentIngredient,
} from "./tables/pre-emergent.ts";
export { addDays, daysBetween, isValidIsoDate, isValidLocalTime, type IsoDate } from "./dates.ts";
export { isRealLocalTime, nearestRealLocalTime, isValidTimeZone } from "./zone-time.ts";
export { mowDownStages } from "./rules/prep.ts";
export { frostWarning } from "./rules/warnings.ts";
export { violatesHoldOff } from "./rules/hold-offs.ts";
export { estimateSlowestEmergence } from "./timeline.ts";
