import { SOURCES } from "./sources.ts";

/** Keep seed and the top ½–1 in of soil moist, not soaked: several light waterings a day. */
export const GERMINATION_WATERING_RULE = {
  source: `${SOURCES.nebraskaColumn2021}; 2-week minimum from ${SOURCES.tradePractice}`,
  provenance: "published",
} as const;

/** After emergence: fewer, deeper waterings, 2–3 a week. */
export const ESTABLISHMENT_WATERING_RULE = {
  source: SOURCES.nebraskaColumn2021,
  provenance: "published",
} as const;

/**
 * Default start times for the light germination waterings, by cycles a day:
 * spread through the daylight hours when seed dries fastest, ending by late
 * afternoon so the grass is dry by night.
 */
export const GERMINATION_TIMES_BY_CYCLES: Readonly<Record<number, readonly string[]>> = {
  2: ["08:00", "14:00"],
  3: ["07:00", "12:00", "16:00"],
  4: ["07:00", "10:30", "13:30", "16:30"],
  5: ["07:00", "10:00", "12:30", "15:00", "17:30"],
};

/** Which days of each 7-day block get a deep watering, spaced as evenly as whole days allow. */
export const DEEP_WATERING_DAY_OFFSETS: Readonly<Record<number, readonly number[]>> = {
  1: [0],
  2: [0, 3],
  3: [0, 2, 4],
};

/** How a homeowner measures their sprinkler: a timed catch-can run. */
export const CATCH_CAN_TEST = {
  cans: "6 to 8",
  minutes: 15,
  source: `${SOURCES.irrigationAssociation}; ${SOURCES.chicoDuNotes}`,
  provenance: "from memory",
} as const;

/**
 * Keep the seeded surface moist until the new grass is tall enough to mow
 * (the first mowing), then taper: once a day, then every other day, then deep
 * and infrequent. The moist-until-mowable part is published; how long each
 * taper step lasts is a rule of thumb, a week each here.
 */
export const TAPER_RULE = {
  onceADayDays: 7,
  everyOtherDayDays: 7,
  source: `${SOURCES.nebraskaColumn2021} (moist until tall enough to mow); taper steps: ${SOURCES.tradePractice}`,
  provenance: "common practice",
} as const;

/**
 * About 1 inch of water a week, rain included, for a lawn past germination.
 * Each watering's depth is this week's total shared by the week's waterings,
 * so the plan never asks for more than the "about 1 inch" it states.
 */
export const WEEKLY_WATER_NEED = {
  inches: 1,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/** Aerate moist soil (water the day before if dry) and leave the cores to break down. */
export const AERATION_PREP_RULE = {
  waterBeforeIn: 0.5,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;
