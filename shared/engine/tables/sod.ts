import { SOURCES } from "./sources.ts";

/*
 * New sod has no roots in the soil yet: it lives on the water held in the sod and the
 * soil just under it. Soak at once until the soil beneath is wet, keep it moist daily
 * while it roots, then taper to the lawn's ordinary deep watering. First mowing only once
 * it has rooted (it resists a gentle tug), at a high setting. All of it is the trade's
 * rule of thumb (TRADE-REFERENCES.md, "Sod after installation"); the day counts and
 * depths are Sproutline's choices inside that practice.
 */
export const SOD_WATERING = {
  /** The first soak: enough to wet the sod and the top few inches of soil under it. */
  soakDepthIn: 1,
  /** Days 1..dailyUntilDay: once a day. */
  dailyUntilDay: 9,
  dailyDepthIn: 0.5,
  /** Then every other day, longer each time, until the last day the sod schedule covers. */
  everyOtherDayDepthIn: 0.75,
  /** Last day of the sod's own watering; the lawn's ordinary deep watering takes over after it. */
  lastDay: 14,
  source: `${SOURCES.tradePractice} (sod: soak at once, then daily); days and depths: ${SOURCES.sproutlineChoice}`,
  provenance: "common practice",
} as const;

/** When the homeowner checks rooting, and the earliest first mowing. */
export const SOD_ROOTING = {
  tugTestDay: 13,
  firstMowFromDay: 14,
  source: `${SOURCES.tradePractice} (first mow once it resists a gentle tug, at a high setting); days: ${SOURCES.sproutlineChoice}`,
  provenance: "common practice",
} as const;
