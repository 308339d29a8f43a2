import { z } from "zod";
import { CAUTION_IDS, SPECIES, type Plan } from "#shared/engine/index";

/*
 * The engine's Plan as the preview endpoint sends it. Checked on arrival so a change
 * on the server shows up as a clear "answer we didn't understand", not a blank page.
 */
const isoDate = z.string();
const provenance = z.enum(["published", "common practice", "from memory"]);
const phase = z.enum(["prep", "germination", "establishment", "maturing"]);
const holdOffKind = z.enum(["weed_and_feed", "broadleaf_herbicide", "crabgrass_pre_emergent", "high_n_quick_release", "heavy_traffic", "new_seed"]);
const cautionId = z.enum(CAUTION_IDS);
const nutrients = z.object({ n: z.number(), p: z.number(), k: z.number() });

const stepSchema = z.object({
  key: z.string(),
  date: isoDate,
  phase,
  kind: z.enum(["water", "mow", "feed", "leaf_cleanup", "check_in_photo", "prep_mow", "flag_hazards", "clear_debris", "note"]),
  title: z.string(),
  detail: z.string(),
  times: z.array(z.string()).optional(),
  minutesPerCycle: z.number().optional(),
  heightIn: z.number().optional(),
  feed: z
    .object({
      product: z.enum(["starter", "slow_release_n"]),
      highNQuickRelease: z.boolean(),
      nitrogenLbPer1000: z.number().optional(),
    })
    .optional(),
  restrictedBy: z.array(holdOffKind).optional(),
  why: z.object({ text: z.string(), source: z.string(), provenance }),
  cautions: z.array(cautionId),
  state: z.enum(["done", "skipped"]).optional(),
});

const seedSchema = z.object({
  rateLbPer1000: z.number(),
  rateGPerM2: z.number(),
  plsFraction: z.number(),
  plsRateLbPer1000: z.number(),
  bulkSeedLb: z.number(),
  pureLiveSeedLb: z.number(),
  seedsPerSqFt: z.number().nullable(),
  expectedRangeLbPer1000: z.object({ min: z.number(), max: z.number(), basis: z.enum(["overseeding", "new_seeding", "winter_overseeding"]) }),
  perSpecies: z.array(
    z.object({
      species: z.enum(SPECIES),
      percent: z.number(),
      plsFraction: z.number(),
      bulkLb: z.number(),
      seedsPerSqFt: z.number().nullable(),
    }),
  ),
});

export const planSchema: z.ZodType<Plan> = z.object({
  meta: z.object({
    engineVersion: z.number(),
    programVersion: z.number(),
    inputHash: z.string(),
    visitDate: isoDate,
    timeZone: z.string(),
    hemisphere: z.enum(["north", "south"]),
    seeding: z.boolean(),
    phases: z.array(z.object({ phase, start: isoDate, end: isoDate })),
    firstMowDate: isoDate.nullable(),
    germinationWateringEnds: isoDate.nullable(),
    planEnds: isoDate,
    season: z
      .object({
        verdict: z.enum(["in_window", "early", "late", "dormant_seeding"]),
        work: z.enum(["seeding", "winter_overseeding", "care"]),
        family: z.enum(["cool", "warm"]),
        period: z.enum(["spring", "summer", "fall", "winter"]).nullable(),
        firstFrost: isoDate.nullable(),
        firstFrostAssumed: z.boolean(),
        window: z.object({ start: isoDate, end: isoDate }).nullable(),
        soilWarms: isoDate.nullable(),
        sowingStarts: isoDate.nullable(),
        noWatering: z.array(z.object({ start: isoDate, end: isoDate })),
        noFeeding: z.array(z.object({ start: isoDate, end: isoDate })),
      })
      .optional(),
    recomputedOn: isoDate.optional(),
  }),
  prepSteps: z.array(stepSchema),
  steps: z.array(stepSchema),
  holdOffs: z.array(
    z.object({ kind: holdOffKind, start: isoDate, end: isoDate, why: z.string(), source: z.string(), provenance, cautions: z.array(cautionId) }),
  ),
  warnings: z.array(
    z.object({
      code: z.string(),
      audience: z.enum(["crew", "homeowner"]),
      severity: z.enum(["risk", "caution", "info"]),
      message: z.string(),
      reason: z.string(),
      source: z.string(),
      provenance,
    }),
  ),
  summary: z.object({
    areaFt2: z.number(),
    areaM2: z.number(),
    seed: seedSchema.nullable(),
    products: z.array(
      z.object({
        name: z.string(),
        rateLbPer1000: z.number(),
        totalLb: z.number(),
        totalKg: z.number(),
        nutrientsPer1000: nutrients,
        nutrientsTotal: nutrients,
      }),
    ),
    nutrientsPer1000: nutrients,
    nutrientsTotal: nutrients,
    precipitationRateInPerHour: z.number(),
    precipitationRateMeasured: z.boolean(),
    precipitationRateDefault: z
      .discriminatedUnion("basis", [
        z.object({ basis: z.literal("sprinkler_type"), minInPerHour: z.number(), maxInPerHour: z.number(), source: z.string(), provenance }),
        z.object({ basis: z.literal("program") }),
      ])
      .nullable(),
    germinationMinutesPerCycle: z.number().nullable(),
  }),
  cautions: z.array(z.object({ id: cautionId, text: z.string() })),
});

export const previewPlanResponseSchema = z.object({ plan: planSchema });
