import { SOURCES } from "./sources.ts";

/*
 * Cycle-and-soak on slopes (TRADE-REFERENCES.md, "Slopes": several short runs with pauses
 * to avoid run-off). How much one run may put down before water starts to run off depends
 * on soil and grade; the figures below are Sproutline's choices inside that practice: a
 * spray head at about 1.75 in/h gets runs of about 5 minutes on a gentle slope and 2 on a
 * steep one, a rotor at 0.6 in/h about 15 and 8.
 */
export const CYCLE_AND_SOAK = {
  /** The most water (in) one run may put down before a pause. */
  maxRunIn: { gentle: 0.15, steep: 0.08 },
  /** Pause between runs so the water soaks in. */
  soakMinutes: 30,
  /** More runs than this make a day nobody follows; the runs get longer instead. */
  maxRunsPerCycle: 4,
  source: `${SOURCES.tradePractice} (cycle-and-soak on slopes); run depths and pause: ${SOURCES.sproutlineChoice}`,
  provenance: "common practice",
} as const;

/** Seed on slopes washes off in heavy rain: hold it down, and re-seed washed-out spots. */
export const EROSION_CONTROL = {
  /** Only rain in the first weeks, while seed or seedlings can still wash away, calls for a look. */
  washoutCheckDaysAfterRain: 1,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;
