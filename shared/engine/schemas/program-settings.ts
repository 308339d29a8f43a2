import { z } from "zod";
import { isValidLocalTime, minutesOfLocalTime } from "../dates.ts";
import { HERBICIDE_AFTER_SEEDING_RULE } from "../tables/feeding.ts";
import type { Provenance } from "../tables/provenance.ts";
import { SOURCES } from "../tables/sources.ts";
import { localTimeSchema } from "./common.ts";

/*
 * A company may tune its care program, but only inside bounds that keep new
 * seed safe: e.g. nobody can configure fewer than 14 days of germination
 * watering or a first mow before day 14. Each bound says where it comes from.
 */
export interface SettingBound {
  readonly default: number;
  readonly min: number;
  readonly max: number;
  readonly integer: boolean;
  readonly unit: string;
  readonly why: string;
  readonly source: string;
  readonly provenance: Provenance;
}

const bound = (
  value: number,
  min: number,
  max: number,
  unit: string,
  why: string,
  source: string,
  provenance: Provenance,
): SettingBound => ({ default: value, min, max, integer: unit === "days" || unit === "count", unit, why, source, provenance });

export const programSettingBounds = {
  germinationDays: bound(14, 14, 35, "days", "Several light waterings a day for at least the first 2 weeks after seeding.", SOURCES.nebraskaColumn2021, "published"),
  wateringCyclesPerDayGermination: bound(3, 2, 5, "count", "Seed and the top ½–1 in of soil must stay moist, not soaked; that takes several light cycles a day.", SOURCES.nebraskaColumn2021, "published"),
  waterDepthPerCycleIn: bound(0.1, 0.05, 0.25, "in", "A light cycle wets the seed zone without puddling or washing seed.", SOURCES.tradePractice, "common practice"),
  defaultPrecipitationRateInPerHour: bound(1.0, 0.2, 3, "in/h", "Used until a catch-can test measures the real sprinkler rate.", SOURCES.tradePractice, "common practice"),
  wateringDaysAfterSprouts: bound(7, 5, 14, "days", "Sprouts have shallow roots; light watering continues for a while after they show.", SOURCES.tradePractice, "common practice"),
  establishmentDays: bound(28, 21, 56, "days", "Fewer, deeper waterings (2–3 a week) while the new grass roots down.", SOURCES.nebraskaColumn2021, "published"),
  establishmentWateringsPerWeek: bound(3, 2, 3, "count", "Fewer, deeper waterings: 2–3 a week once the grass is up.", SOURCES.nebraskaColumn2021, "published"),
  deepWateringDepthIn: bound(0.5, 0.25, 1, "in", "Deeper watering pulls roots down. The most one watering puts down: the week's waterings share about 1 in in total.", SOURCES.tradePractice, "common practice"),
  maturingDays: bound(28, 14, 56, "days", "Ordinary care while the new lawn thickens.", SOURCES.tradePractice, "common practice"),
  maturingWateringsPerWeek: bound(2, 1, 3, "count", "Deep, infrequent watering for an established lawn.", SOURCES.tradePractice, "common practice"),
  firstMowMinDays: bound(14, 14, 42, "days", "First mowing not before about 2 weeks after seeding.", SOURCES.tradePractice, "common practice"),
  firstMowDaysAfterEmergence: bound(7, 3, 21, "days", "Seedlings must grow tall enough to cut after the slowest grass in the mix comes up.", SOURCES.tradePractice, "common practice"),
  mowingsBeforeHerbicide: bound(3, 2, 6, "count", "Labels commonly allow weed control only after 2–4 mowings of new grass.", HERBICIDE_AFTER_SEEDING_RULE.source, "from memory"),
  seedingMowHeightIn: bound(2, 1, 3, "in", "About 2 in before overseeding so seed reaches the soil.", SOURCES.tradePractice, "common practice"),
  prepMowStageDays: bound(7, 5, 10, "days", "Mow down in stages with about a week between them.", SOURCES.tradePractice, "common practice"),
  weedAndFeedHoldDays: bound(60, 42, 180, "days", "Weed-and-feed and broadleaf herbicides stop or injure seedlings.", HERBICIDE_AFTER_SEEDING_RULE.source, "common practice"),
  preEmergentHoldDays: bound(112, 56, 180, "days", "Most crabgrass pre-emergents also stop grass seed; label intervals are commonly 8–16 weeks.", SOURCES.productLabel, "from memory"),
  highNQuickReleaseHoldDays: bound(42, 28, 90, "days", "High-nitrogen quick-release feeds harm new seedlings.", SOURCES.tradePractice, "common practice"),
  trafficHoldDays: bound(28, 21, 60, "days", "Seedlings crush and soft seedbeds rut under foot and wheel traffic.", SOURCES.tradePractice, "common practice"),
} as const satisfies Record<string, SettingBound>;

export type NumericSettingKey = keyof typeof programSettingBounds;

function boundedNumber(key: NumericSettingKey) {
  const b: SettingBound = programSettingBounds[key];
  const base = b.integer ? z.number().int() : z.number();
  return base
    .min(b.min, { message: `Must be at least ${b.min} ${b.unit} (safe bound)` })
    .max(b.max, { message: `Must be at most ${b.max} ${b.unit} (safe bound)` })
    .default(b.default);
}

export const CHECK_IN_DAY_BOUNDS = { min: 1, max: 120, maxEntries: 6 } as const;

export const programSettingsSchema = z
  .object({
    version: z.number().int().min(1).default(1),
    germinationDays: boundedNumber("germinationDays"),
    wateringCyclesPerDayGermination: boundedNumber("wateringCyclesPerDayGermination"),
    waterDepthPerCycleIn: boundedNumber("waterDepthPerCycleIn"),
    defaultPrecipitationRateInPerHour: boundedNumber("defaultPrecipitationRateInPerHour"),
    wateringDaysAfterSprouts: boundedNumber("wateringDaysAfterSprouts"),
    establishmentDays: boundedNumber("establishmentDays"),
    establishmentWateringsPerWeek: boundedNumber("establishmentWateringsPerWeek"),
    deepWateringDepthIn: boundedNumber("deepWateringDepthIn"),
    maturingDays: boundedNumber("maturingDays"),
    maturingWateringsPerWeek: boundedNumber("maturingWateringsPerWeek"),
    firstMowMinDays: boundedNumber("firstMowMinDays"),
    firstMowDaysAfterEmergence: boundedNumber("firstMowDaysAfterEmergence"),
    mowingsBeforeHerbicide: boundedNumber("mowingsBeforeHerbicide"),
    seedingMowHeightIn: boundedNumber("seedingMowHeightIn"),
    prepMowStageDays: boundedNumber("prepMowStageDays"),
    weedAndFeedHoldDays: boundedNumber("weedAndFeedHoldDays"),
    preEmergentHoldDays: boundedNumber("preEmergentHoldDays"),
    highNQuickReleaseHoldDays: boundedNumber("highNQuickReleaseHoldDays"),
    trafficHoldDays: boundedNumber("trafficHoldDays"),
    /** Extra check-in photo days (days after the visit) on top of the emergence-based ones. */
    checkInPhotoDays: z
      .array(z.number().int().min(CHECK_IN_DAY_BOUNDS.min).max(CHECK_IN_DAY_BOUNDS.max))
      .max(CHECK_IN_DAY_BOUNDS.maxEntries)
      .default([45]),
    /** Own start times for the light germination cycles; must match the cycles a day. */
    germinationWateringTimes: z.array(localTimeSchema).optional(),
    /** Start time for deep waterings; controllers often run before dawn. */
    deepWateringTime: localTimeSchema.default("06:00"),
  })
  .superRefine((settings, ctx) => {
    const times = settings.germinationWateringTimes;
    if (!Array.isArray(times) || !times.every(isValidLocalTime)) return;
    if (times.length !== settings.wateringCyclesPerDayGermination) {
      ctx.addIssue({
        code: "custom",
        path: ["germinationWateringTimes"],
        message: `Give exactly ${settings.wateringCyclesPerDayGermination} times, one per watering cycle`,
      });
      return;
    }
    const minutes = times.map(minutesOfLocalTime);
    if (minutes.some((m, i) => i > 0 && m <= (minutes[i - 1] ?? -1))) {
      ctx.addIssue({ code: "custom", path: ["germinationWateringTimes"], message: "List the times from earliest to latest" });
    }
  });

export type ProgramSettings = z.output<typeof programSettingsSchema>;
export type ProgramSettingsInput = z.input<typeof programSettingsSchema>;

export const defaultProgramSettings: ProgramSettings = Object.freeze(programSettingsSchema.parse({})) as ProgramSettings;
