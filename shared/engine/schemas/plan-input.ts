import { z } from "zod";
import { isValidIsoDate, toDayNumber } from "../dates.ts";
import { PRE_EMERGENT_INGREDIENTS, PRIOR_PRE_EMERGENT_PRODUCTS } from "../tables/pre-emergent.ts";
import { SPRINKLER_TYPES } from "../tables/sprinklers.ts";
import { isoDateSchema, localTimeSchema, speciesSchema, timeZoneSchema } from "./common.ts";
import { placeRulesSchema } from "./place-rules.ts";
import { programSettingsSchema } from "./program-settings.ts";

export const SERVICES = [
  "aeration",
  "dethatching",
  "overseeding",
  "slit_seeding",
  "new_seeding",
  "starter_fertiliser",
  "fertiliser_only",
  "top_dressing",
  "sod_installation",
] as const;
export type Service = (typeof SERVICES)[number];

export const SEEDING_SERVICES: readonly Service[] = ["overseeding", "slit_seeding", "new_seeding"];

/** How steep the lawn is: slopes shed water (cycle-and-soak watering) and seed (erosion control). */
export const SLOPES = ["none", "gentle", "steep"] as const;
export type Slope = (typeof SLOPES)[number];

/** How much of the day the lawn is shaded: shade calls for shade-tolerant seed and less nitrogen. */
export const SHADE_LEVELS = ["none", "partial", "heavy"] as const;
export type ShadeLevel = (typeof SHADE_LEVELS)[number];

/** Seed-mix percentages may be rounded on the tag, hence the ±0.5 slack. */
export const SEED_MIX_SUM_TOLERANCE = 0.5;

const percent = z.number().min(0, "Must be 0 % or more").max(100, "Must be 100 % or less");

export const seedMixEntrySchema = z.object({
  species: speciesSchema,
  percent: z.number().gt(0, "Must be more than 0 %").max(100, "Must be 100 % or less"),
  purityPct: z.number().gt(0, "Must be more than 0 %").max(100, "Must be 100 % or less"),
  germinationPct: z.number().gt(0, "Must be more than 0 %").max(100, "Must be 100 % or less"),
});

export const analysisSchema = z
  .object({ n: percent, p: percent, k: percent })
  .refine((a) => a.n + a.p + a.k <= 100, { message: "N + P + K cannot add up to more than 100 %" });

export const productAppliedSchema = z.object({
  name: z.string().trim().min(1, "Name the product").max(120),
  analysis: analysisSchema,
  rateLbPer1000: z.number().gt(0, "Must be more than 0").max(100, "Must be at most 100 lb per 1,000 ft²"),
  quickReleaseN: z.boolean().optional(),
  /** Organic (natural) fertilizers suit new seed as a starter does. */
  organic: z.boolean().optional(),
});

/**
 * A crabgrass preventer, weed-and-feed or other pre-emergent put down in the months before a
 * seeding (by the homeowner or anyone else): it may still stop the new seed. The date may be
 * approximate; the active ingredient is optional because few people keep the bag.
 */
export const priorPreEmergentSchema = z.object({
  product: z.enum(PRIOR_PRE_EMERGENT_PRODUCTS, { message: "Pick what was put down" }),
  appliedOn: isoDateSchema,
  activeIngredient: z.enum(PRE_EMERGENT_INGREDIENTS, { message: "Pick an active ingredient from the list" }).optional(),
});

export const visitSchema = z
  .object({
    date: isoDateSchema,
    services: z
      .array(z.enum(SERVICES))
      .min(1, "Pick at least one service")
      .refine((s) => new Set(s).size === s.length, { message: "List each service once" }),
    seedMix: z.array(seedMixEntrySchema).max(9).default([]),
    seedRateLbPer1000: z.number().gt(0, "Must be more than 0").max(50, "Must be at most 50 lb per 1,000 ft²").optional(),
    areaFt2: z.number().gt(0, "Must be more than 0").max(5_000_000, "Must be at most 5,000,000 ft²"),
    products: z.array(productAppliedSchema).max(10).default([]),
    /** A soil test showed the lawn needs phosphorus: a reason places that limit phosphorus accept. */
    soilTestCallsForPhosphorus: z.boolean().optional(),
    priorPreEmergent: priorPreEmergentSchema.optional(),
  })
  .superRefine((visit, ctx) => {
    // Cross-field checks run even when single fields failed; guard the shapes.
    if (!Array.isArray(visit.services) || !Array.isArray(visit.seedMix)) return;
    const seeding = visit.services.some((s) => SEEDING_SERVICES.includes(s));
    if (visit.services.includes("sod_installation") && (seeding || visit.seedMix.length > 0)) {
      // Sod wants a deep soak and daily deep watering, seed light frequent cycles: one plan can't give both.
      ctx.addIssue({ code: "custom", path: ["services"], message: "Log sod and seed as separate visits: they need different watering" });
    }
    if (seeding && visit.seedMix.length === 0) {
      // The plan's watering and mowing dates depend on the species sown.
      ctx.addIssue({ code: "custom", path: ["seedMix"], message: "List the seed used for this seeding" });
    }
    const prior = visit.priorPreEmergent;
    if (prior && isValidIsoDate(prior.appliedOn) && isValidIsoDate(visit.date) && toDayNumber(prior.appliedOn) > toDayNumber(visit.date)) {
      ctx.addIssue({ code: "custom", path: ["priorPreEmergent", "appliedOn"], message: "Must be on or before the visit date" });
    }
    if (visit.seedMix.length === 0) return;
    const total = visit.seedMix.reduce((sum, entry) => sum + (typeof entry?.percent === "number" ? entry.percent : 0), 0);
    if (Math.abs(total - 100) > SEED_MIX_SUM_TOLERANCE) {
      ctx.addIssue({ code: "custom", path: ["seedMix"], message: `Mix percentages add up to ${round1(total)} %, not 100 %` });
    }
    const seen = new Set<string>();
    visit.seedMix.forEach((entry, i) => {
      if (typeof entry?.species !== "string") return;
      if (seen.has(entry.species)) {
        ctx.addIssue({ code: "custom", path: ["seedMix", i, "species"], message: "Each species once; add the percentages together" });
      }
      seen.add(entry.species);
    });
    if (visit.seedRateLbPer1000 === undefined) {
      ctx.addIssue({ code: "custom", path: ["seedRateLbPer1000"], message: "Give the seed rate in lb per 1,000 ft²" });
    }
  });

const round1 = (x: number) => Math.round(x * 10) / 10;

export const LAWN_CONDITIONS = ["thin", "bare", "thick_dormant", "thick"] as const;
export type LawnCondition = (typeof LAWN_CONDITIONS)[number];

export const irrigationSchema = z.object({
  kind: z.enum(["in_ground", "hose_end", "none"]),
  /** Optional: without it an in-ground system uses the program's default rate, a hose-end sprinkler the hose-end range. */
  sprinklerType: z.enum(SPRINKLER_TYPES).optional(),
  zones: z.number().int().min(1).max(99).optional(),
  precipitationRateInPerHour: z.number().min(0.05, "Must be at least 0.05 in/h").max(5, "Must be at most 5 in/h").optional(),
});

export const propertySchema = z
  .object({
    grassType: z.object({
      species: z.array(speciesSchema).max(9).default([]),
      season: z.enum(["cool", "warm"]).optional(),
    }),
    lawnCondition: z.enum(LAWN_CONDITIONS),
    irrigation: irrigationSchema,
    currentMowingHeightIn: z.number().min(0.5, "Must be at least 0.5 in").max(6, "Must be at most 6 in"),
    mowerHighestSettingIn: z.number().min(1, "Must be at least 1 in").max(6, "Must be at most 6 in"),
    mowerSettingStepIn: z.number().min(0.125, "Must be at least 1/8 in").max(1, "Must be at most 1 in").optional(),
    timeZone: timeZoneSchema,
    /** Optional: derived from the time zone when absent. */
    hemisphere: z.enum(["north", "south"]).optional(),
    /** Optional: without it the hemisphere's default first frost is assumed, except in frost-free zones (tables/seasons.ts). */
    expectedFirstFrost: isoDateSchema.optional(),
    /** Optional: unknown counts as flat. */
    slope: z.enum(SLOPES).optional(),
    /** Optional: unknown counts as full sun. */
    shade: z.enum(SHADE_LEVELS).optional(),
  })
  .superRefine((property, ctx) => {
    const grass = property.grassType;
    if (grass && Array.isArray(grass.species) && grass.species.length === 0 && grass.season === undefined) {
      ctx.addIssue({ code: "custom", path: ["grassType"], message: "Give the lawn's grass species or its season (cool or warm)" });
    }
    if (
      typeof property.currentMowingHeightIn === "number" &&
      typeof property.mowerHighestSettingIn === "number" &&
      property.currentMowingHeightIn > property.mowerHighestSettingIn
    ) {
      ctx.addIssue({
        code: "custom",
        path: ["currentMowingHeightIn"],
        message: "Is above the mower's highest setting",
      });
    }
  });

export const observationSchema = z.discriminatedUnion("kind", [
  z.object({ kind: z.literal("sprouts_seen"), onDay: z.number().int().min(1).max(60) }),
  z.object({ kind: z.literal("heavy_rain"), date: isoDateSchema }),
  z.object({ kind: z.literal("step_skipped"), stepKey: z.string().min(1).max(120) }),
]);

export const planOptionsSchema = z.object({
  today: isoDateSchema.optional(),
  observations: z.array(observationSchema).max(500).default([]),
});

/*
 * An expected first frost before the visit is allowed: the frost has come, so the work is late or
 * a dormant seeding, which the season check (rules/season.ts) reports.
 */
export const planInputSchema = z.object({
  visit: visitSchema,
  property: propertySchema,
  program: programSettingsSchema.prefault({}),
  options: planOptionsSchema.prefault({}),
  /** The rules of the place the lawn is in, as its company entered them; absent: none. */
  placeRules: placeRulesSchema.optional(),
});

export type SeedMixEntry = z.output<typeof seedMixEntrySchema>;
export type ProductApplied = z.output<typeof productAppliedSchema>;
export type PriorPreEmergent = z.output<typeof priorPreEmergentSchema>;
export type Visit = z.output<typeof visitSchema>;
export type Irrigation = z.output<typeof irrigationSchema>;
export type Property = z.output<typeof propertySchema>;
export type Observation = z.output<typeof observationSchema>;
export type PlanOptions = z.output<typeof planOptionsSchema>;
export type PlanInput = z.output<typeof planInputSchema>;
/** What callers may send: defaults (program, options, empty lists) filled in by parsing. */
export type PlanInputRaw = z.input<typeof planInputSchema>;

// Re-exported so consumers validating single fields use the same rules.
export { isoDateSchema, localTimeSchema, speciesSchema, timeZoneSchema };
