import type { SourcedRange } from "./provenance.ts";
import { SOURCES } from "./sources.ts";
import type { Species } from "./species.ts";
import { WARM_SOURCES } from "./warm-season.ts";

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

const warmHeight = (min: number, max: number, source: string = SOURCES.landGrantWarmSeason): SourcedRange => ({
  min,
  max,
  source,
  provenance: "from memory",
});

/**
 * Mowing heights of warm-season lawns, in inches. New warm-season grass is first cut at the top of its
 * range rather than at the mower's highest setting (a 4-inch first cut leaves bermudagrass stemmy and
 * thin). Cool-season grasses are absent on purpose: their new grass keeps the highest-setting rule.
 * All recalled from southern extension lawn guides, not re-read: check against a publication.
 */
export const WARM_SEASON_MOWING_HEIGHT_IN: Readonly<Partial<Record<Species, SourcedRange>>> = {
  bermudagrass: warmHeight(1, 1.5),
  zoysiagrass: warmHeight(1, 2),
  centipedegrass: warmHeight(1, 2),
  st_augustinegrass: warmHeight(2.5, 4),
  // UF/IFAS bahiagrass guidance as recalled: 3–4 in (some guides say 2–3 in).
  bahiagrass: warmHeight(3, 4, `${SOURCES.landGrantWarmSeason}; University of Florida IFAS bahiagrass guide`),
};

/**
 * Ryegrass sown into a warm-season lawn for winter color is kept lower than a cool-season lawn:
 * about 2–2.5 in (Texas A&M AgriLife specialists, for annual ryegrass; perennial kept alike).
 */
export const WINTER_RYEGRASS_MOWING_HEIGHT_IN: SourcedRange = {
  min: 2,
  max: 2.5,
  source: WARM_SOURCES.texasAmOverseeding,
  provenance: "published",
};
