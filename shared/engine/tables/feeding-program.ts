import { AUTUMN_FEEDING_N, SINGLE_FEEDING_N } from "./feeding.ts";
import { SOURCES } from "./sources.ts";

/**
 * The fall feeding program offered to a thick cool-season lawn instead of seed: about 2 lb N per
 * 1,000 ft² over the fall (common practice; TRADE-REFERENCES "Autumn feeding of a thick
 * cool-season lawn"), split into feedings of at most 1 lb N each (University of Minnesota
 * Extension #764665, published: ¾–1 lb per application), 4–6 weeks apart (common practice).
 * A feeding under ½ lb N is not worth a trip and is left out (Sproutline choice).
 */
export const FALL_FEEDING_PROGRAM = {
  totalLbNPer1000: AUTUMN_FEEDING_N.totalLbPer1000,
  maxPerFeedingLbN: SINGLE_FEEDING_N.maxLbPer1000,
  minPerFeedingLbN: 0.5,
  /** Feedings are rounded to the quarter pound, as bags' rates are read. */
  roundToLbN: 0.25,
  preferredWeeksApart: AUTUMN_FEEDING_N.weeksBetweenSplits,
  minWeeksApart: 4,
  /** A feeding that needs nitrogen the visit already put down counts as the program's first. */
  countsAsFeedingFromLbN: 0.5,
  source: `${AUTUMN_FEEDING_N.source}; at most ${SINGLE_FEEDING_N.maxLbPer1000} lb N per feeding: ${SINGLE_FEEDING_N.source}`,
  provenance: AUTUMN_FEEDING_N.provenance,
  smallestFeedingSource: SOURCES.sproutlineChoice,
} as const;
