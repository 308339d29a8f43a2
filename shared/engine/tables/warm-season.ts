import type { Hemisphere } from "./timing.ts";
import type { Sourced, SourcedRange } from "./provenance.ts";
import { SOURCES } from "./sources.ts";
import type { Species } from "./species.ts";

/*
 * Warm-season practice: winter ryegrass on bermudagrass, the lawns it is usually advised against on,
 * and the soil warmth warm-season seed needs. Sources named here rather than in sources.ts because they
 * only serve these rows.
 */
export const WARM_SOURCES = {
  clemsonUgaFromMemory: "Clemson University HGIC and University of Georgia turf guides",
  augustaColumn2006: 'The Augusta Chronicle garden column, "Overplant ryeseed when the weather turns cooler" (Oct. 20, 2006)',
  texasAmOverseeding: 'Texas A&M AgriLife turf specialists (J. McAfee, R. Havlak), quoted in plantanswers.com "To overseed or not to overseed"',
} as const;

/** Perennial ryegrass sown into bermudagrass for winter color: about 5–10 lb per 1,000 ft² (TRADE-REFERENCES, Clemson / UGA). */
export const WINTER_RYEGRASS_SEED_LB_PER_1000: SourcedRange = {
  min: 5,
  max: 10,
  source: WARM_SOURCES.clemsonUgaFromMemory,
  provenance: "from memory",
};

/**
 * Lawns on which winter ryegrass overseeding is usually advised against: they green up slowly in spring
 * and cannot be scalped, so the ryegrass crowds them (TRADE-REFERENCES: centipede, St. Augustine, zoysia).
 * Bahiagrass is not on that list, so it is not warned about.
 */
export const WINTER_OVERSEEDING_ADVISED_AGAINST: Sourced & { readonly species: readonly Species[] } = {
  species: ["centipedegrass", "st_augustinegrass", "zoysiagrass"],
  source: `${WARM_SOURCES.clemsonUgaFromMemory}; centipede: ${WARM_SOURCES.augustaColumn2006}`,
  provenance: "from memory",
};

/**
 * Prep for winter ryegrass. Bermudagrass is cut low ("scalped") so seed reaches the soil, then verticut or
 * raked; the Kansas City Star column gives 1–1.5 in before verticutting, we aim for the low end. Lawns that
 * cannot be scalped are taken one mower setting lower, "about all you can do" (Augusta Chronicle column).
 */
export const WINTER_OVERSEEDING_PREP = {
  scalpHeightIn: 1,
  scalpSource: `${SOURCES.kansasCityStarColumn} (1–1.5 in before verticutting); ${SOURCES.tradePractice}`,
  scalpProvenance: "common practice",
  notchLowerSource: WARM_SOURCES.augustaColumn2006,
  notchLowerProvenance: "published",
} as const;

/**
 * Spring transition: the ryegrass competes with the bermudagrass as it wakes; lowering the mowing in
 * spring, a notch at a time, lets sun reach the bermuda so it takes the lawn back.
 */
export const SPRING_TRANSITION: Sourced = {
  source: SOURCES.tradePractice,
  provenance: "common practice",
};

/** Warm-season seed sprouts in soil about 65–70 °F or warmer; cool-season seed at about 50–65 °F. */
export const WARM_SEASON_GERMINATION_SOIL_F: SourcedRange = {
  min: 65,
  max: 70,
  source: `${WARM_SOURCES.clemsonUgaFromMemory} (warm-season); cool-season 50–65 °F: ${SOURCES.minnesotaAskExtension764665}`,
  provenance: "from memory",
};

/**
 * Months in which the soil is usually warm enough for warm-season seed (late spring through summer: the
 * guides give late spring to early summer for seeding, and the soil stays warm through September). Without
 * a soil thermometer reading the month is the best the engine has; outside them the seed waits for warmth.
 */
export const WARM_SOIL_MONTHS: Readonly<Record<Hemisphere, readonly number[]>> & Sourced = {
  north: [5, 6, 7, 8, 9],
  south: [11, 12, 1, 2, 3],
  source: `${WARM_SOURCES.clemsonUgaFromMemory} (seeding late spring to early summer)`,
  provenance: "from memory",
};
