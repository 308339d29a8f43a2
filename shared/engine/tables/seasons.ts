import type { Sourced } from "./provenance.ts";
import { SOURCES } from "./sources.ts";
import type { Hemisphere } from "./timing.ts";

/** A calendar day that recurs every year. */
export interface MonthDay {
  readonly month: number;
  readonly day: number;
}

/*
 * Windows are counted in days from the season's first frost (F), or from the
 * spring day the soil has warmed enough for the grass family's seed (S), so
 * one table serves both hemispheres and any frost date the crew enters.
 */

/**
 * First fall frost when the crew enters none: mid-October in the north, mid-April
 * in the south, roughly the median first freeze of the main temperate lawn
 * markets. A rough guess, so the crew is asked to enter the local date.
 */
export const DEFAULT_FIRST_FROST: Readonly<Record<Hemisphere, MonthDay>> & Sourced = {
  north: { month: 10, day: 15 },
  south: { month: 4, day: 15 },
  source: "Median first fall freeze of temperate US lawn markets, NOAA freeze-table method (recalled)",
  provenance: "from memory",
};

/** Time zones of places without frost (Hawaii, the Caribbean, the wet tropics): no frost date, no cold-soil season. */
export const FROST_FREE_ZONES: ReadonlySet<string> & Sourced = Object.assign(
  new Set([
    "Pacific/Honolulu",
    "Pacific/Guam",
    "Pacific/Saipan",
    "Pacific/Pago_Pago",
    "America/Puerto_Rico",
    "America/St_Thomas",
    "America/Panama",
    "America/Costa_Rica",
    "America/Jamaica",
    "America/Santo_Domingo",
    "Asia/Singapore",
    "Asia/Manila",
    "Asia/Jakarta",
    "Asia/Bangkok",
    "Asia/Kuala_Lumpur",
    "Asia/Ho_Chi_Minh",
    "Africa/Lagos",
    "Africa/Accra",
    "Indian/Maldives",
  ]),
  { source: "Climate of the zones' populated lowlands (recalled)", provenance: "from memory" as const },
);

/**
 * When spring soil is warm enough for each family's seed: about 50–65 °F for
 * cool-season grasses (Minnesota, published), about 65–70 °F for warm-season
 * grasses (from memory, Georgia/Clemson). The calendar days are recalled
 * rules of thumb for temperate lawns.
 */
export const SOIL_WARMS: Readonly<Record<"cool" | "warm", Readonly<Record<Hemisphere, MonthDay>>>> & Sourced = {
  cool: { north: { month: 4, day: 1 }, south: { month: 10, day: 1 } },
  warm: { north: { month: 5, day: 1 }, south: { month: 11, day: 1 } },
  source: `${SOURCES.minnesotaAskExtension764665} (cool-season soil 50–65 °F); warm-season soil 65–70 °F and the calendar days recalled from University of Georgia / Clemson turf guides`,
  provenance: "from memory",
};

/**
 * A frost entered later (or earlier) than the default says the climate is milder
 * (or colder): the next spring's soil warms about that much earlier (or later),
 * never by more than this. A Sproutline estimate.
 */
export const CLIMATE_SHIFT_RULE = {
  maxDays: 60,
  source: SOURCES.sproutlineChoice,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/**
 * The ground is cold (and soon frozen) a little after the first frost: from
 * then until spring no watering, no feeding of any kind, and seed sown lies
 * dormant until the soil warms. No nitrogen on frozen ground is also law in
 * several states (from memory).
 */
export const COLD_SOIL_RULE = {
  daysAfterFirstFrost: 14,
  /** A frost entered far later than usual still gets this much cold season before spring (Sproutline choice). */
  shortestColdDays: 30,
  source: `${SOURCES.tradePractice} (no nitrogen on frozen or snow-covered ground; dormant seeding)`,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/**
 * Warm-season lawns get no nitrogen from late summer, about six weeks before the
 * first frost, until they green up in spring: late nitrogen feeds winter disease
 * and cold injury.
 */
export const WARM_NITROGEN_CUTOFF = {
  daysBeforeFirstFrost: 42,
  source: SOURCES.landGrantWarmSeason,
  provenance: "from memory",
} as const satisfies Sourced & Record<string, unknown>;

/** Cool-season seeding: late summer to early fall (75 to 30 days before the first frost); spring is second best. */
export const COOL_SEEDING_WINDOW = {
  fromDaysBeforeFrost: 75,
  untilDaysBeforeFrost: 30,
  /** From the day soil warms, the spring part of the year; summer follows. */
  springDays: 60,
  source: `${SOURCES.tradePractice} (late summer to early fall, as soil cools; at least 30–45 days before the first hard frost)`,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/** Warm-season seeding: from warm soil in late spring until roughly 60–90 days of growth remain before the first frost. */
export const WARM_SEEDING_WINDOW = {
  untilDaysBeforeFrost: 90,
  /** Within this many days before warm soil, the seed only waits a little: "early" rather than dormant. */
  earlyWithinDays: 45,
  source: "University of Georgia turf guides (recalled): late spring to early summer, 60–90 days before the first frost",
  provenance: "from memory",
} as const satisfies Sourced & Record<string, unknown>;

/** Winter ryegrass overseeding of a warm-season lawn: about 3–4 weeks before the first frost, widened by two weeks early and one late. */
export const WINTER_RYEGRASS_WINDOW = {
  fromDaysBeforeFrost: 42,
  untilDaysBeforeFrost: 14,
  source: "Clemson / University of Georgia guides (recalled): as the lawn slows in fall, about 3–4 weeks before the first frost",
  provenance: "from memory",
} as const satisfies Sourced & Record<string, unknown>;

/** Aeration, dethatching and feeding: cool-season lawns in spring and fall (not in summer heat), warm-season lawns while they grow. */
export const CARE_WINDOW = {
  coolFallFromDaysBeforeFrost: 75,
  source: `${SOURCES.tradePractice} (cool-season lawns: fall, or spring; warm-season lawns: late spring to summer)`,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/**
 * Cool-season seed sown in summer dries fast: one more light watering a day
 * (at most five), and a reminder that late summer is the better window.
 */
export const SUMMER_SEEDING_RULE = {
  extraCyclesPerDay: 1,
  maxCyclesPerDay: 5,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/**
 * Crabgrass preventers stop grass seed too; a few actives are labelled for use at
 * seeding (siduron; mesotrione on some labels, recalled). The label decides.
 */
export const SPRING_PRE_EMERGENT_RULE = {
  source: `${SOURCES.productLabel}; actives labelled for use at seeding recalled (siduron, mesotrione)`,
  provenance: "from memory",
} as const satisfies Sourced & Record<string, unknown>;
