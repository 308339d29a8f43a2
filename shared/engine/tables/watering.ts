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
