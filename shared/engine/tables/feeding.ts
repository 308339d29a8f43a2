import { SOURCES } from "./sources.ts";

/** A typical single feeding is ¾–1 lb N per 1,000 ft² (University of Minnesota Extension #764665). */
export const SINGLE_FEEDING_N = {
  minLbPer1000: 0.75,
  maxLbPer1000: 1,
  source: SOURCES.minnesotaAskExtension764665,
  provenance: "published",
} as const;

/**
 * New seedings: a phosphorus-rich starter supplying about 1–1.5 lb P per
 * 1,000 ft², or an organic fertilizer. Bags show phosphate (P₂O₅), so the
 * homeowner is told the phosphate too (P = P₂O₅ × 0.4364, published).
 */
export const STARTER_FEEDING = {
  minPLbPer1000: 1,
  maxPLbPer1000: 1.5,
  source: SOURCES.nebraskaColumn2021,
  conversionSource: SOURCES.phosphateConversion,
  provenance: "published",
} as const;

/** Thick cool-season lawn in autumn: about 2 lb N per 1,000 ft² over the season, split. */
export const AUTUMN_FEEDING_N = {
  totalLbPer1000: 2,
  weeksBetweenSplits: 6,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/**
 * High-nitrogen quick-release feeds burn and push soft growth on new seed.
 * Recognised from the bag and the rate, no tick needed: nitrogen the largest
 * of the three grades, and either marked quick-release or put down at a full
 * feeding's worth (¾ lb N per 1,000 ft², the low end of a typical single
 * application) or more in one go. A form's unticked box cannot tell "slow-
 * release" from "not asked", so it never clears a product.
 */
export const HIGH_N_QUICK_RELEASE_RULE = {
  fullFeedingLbNPer1000: SINGLE_FEEDING_N.minLbPer1000,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/** Weed-and-feed and broadleaf herbicides stop or injure seedlings until the new grass has been mowed several times. */
export const HERBICIDE_AFTER_SEEDING_RULE = {
  source: `${SOURCES.tradePractice}; labels commonly say after 2–4 mowings (from memory)`,
  provenance: "common practice",
} as const;

/** Most crabgrass pre-emergents also stop grass seed; label intervals are commonly 8–16 weeks. */
export const PRE_EMERGENT_RULE = {
  source: `${SOURCES.productLabel}; 8–16 week intervals recalled from common labels`,
  provenance: "from memory",
} as const;
