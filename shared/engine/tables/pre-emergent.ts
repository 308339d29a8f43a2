import { SOURCES } from "./sources.ts";

/** What the crew was told went down on the lawn in the months before a seeding. */
export const PRIOR_PRE_EMERGENT_PRODUCTS = ["crabgrass_preventer", "weed_and_feed", "other_pre_emergent"] as const;
export type PriorPreEmergentProduct = (typeof PRIOR_PRE_EMERGENT_PRODUCTS)[number];

/** Active ingredients a crew can read off a bag; "unknown" is the usual answer and is treated as the common case. */
export const PRE_EMERGENT_INGREDIENTS = [
  "prodiamine",
  "dithiopyr",
  "pendimethalin",
  "siduron",
  "mesotrione",
  "other",
] as const;
export type PreEmergentIngredient = (typeof PRE_EMERGENT_INGREDIENTS)[number];

/**
 * How long a product put down before seeding may still stop grass seed, in weeks after it went
 * down: inside `riskUntilWeeks` expect the seed to fail, up to `possibleUntilWeeks` it may still
 * be active. The label states the real interval and always wins.
 *
 * - Crabgrass preventers: label intervals are commonly 8–16 weeks (TRADE-REFERENCES "Crabgrass
 *   pre-emergents", from memory).
 * - Other pre-emergents: often 2–4 months (TRADE-REFERENCES "Pre-emergent herbicides applied before
 *   seeding", from memory).
 * - Weed-and-feed: usually a broadleaf herbicide with fertilizer; its labels commonly ask for about
 *   3–4 weeks before seeding (from memory). Some weed-and-feeds carry a crabgrass preventer: the
 *   crew picks "crabgrass preventer" for those.
 */
export const PRIOR_PRE_EMERGENT_INTERVALS: Readonly<
  Record<PriorPreEmergentProduct, { riskUntilWeeks: number; possibleUntilWeeks: number; source: string; provenance: "from memory" }>
> = {
  crabgrass_preventer: {
    riskUntilWeeks: 8,
    possibleUntilWeeks: 16,
    source: `${SOURCES.productLabel}; 8–16 week intervals recalled from common crabgrass-preventer labels`,
    provenance: "from memory",
  },
  other_pre_emergent: {
    riskUntilWeeks: 8,
    possibleUntilWeeks: 17,
    source: `${SOURCES.productLabel}; "often 2–4 months" recalled from common pre-emergent labels`,
    provenance: "from memory",
  },
  weed_and_feed: {
    riskUntilWeeks: 3,
    possibleUntilWeeks: 4,
    source: `${SOURCES.productLabel}; 3–4 weeks before seeding recalled from common weed-and-feed labels`,
    provenance: "from memory",
  },
};

/**
 * Ingredients some labels allow at seeding time (siduron; mesotrione on cool-season seedings),
 * from memory: the label of the product actually used is the rule.
 */
export const LABELLED_AT_SEEDING: ReadonlySet<PreEmergentIngredient> = new Set(["siduron", "mesotrione"]);
export const LABELLED_AT_SEEDING_RULE = {
  source: `${SOURCES.productLabel}; siduron and mesotrione labels recalled as allowing use at seeding`,
  provenance: "from memory",
} as const;

/** Names as the crew reads them on the bag. */
export const PRE_EMERGENT_INGREDIENT_NAMES: Readonly<Record<PreEmergentIngredient, string>> = {
  prodiamine: "prodiamine",
  dithiopyr: "dithiopyr",
  pendimethalin: "pendimethalin",
  siduron: "siduron",
  mesotrione: "mesotrione",
  other: "another active ingredient",
};
