import { SOURCES } from "./sources.ts";

/** Never remove more than a third of the blade in one mowing (University of Minnesota Extension #764665). */
export const ONE_THIRD_RULE = {
  maxFractionRemoved: 1 / 3,
  source: SOURCES.minnesotaAskExtension764665,
  provenance: "published",
} as const;

/**
 * Mowing down before overseeding in stages (4 in → 3 in for about a week →
 * about 2 in). When the mower's setting step is unknown we assume ½ inch: a
 * coarser assumed step only adds a stage, it can never break the one-third rule.
 */
export const MOW_DOWN_RULE = {
  assumedSettingStepIn: 0.5,
  source: `${SOURCES.tradePractice}; ${SOURCES.kansasCityStarColumn} (1–1.5 in before verticutting)`,
  provenance: "common practice",
} as const;

/** First mowing of new grass at the mower's highest setting, then lower gradually, about weekly. */
export const FIRST_MOW_RULE = {
  daysBetweenMowings: 7,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;
