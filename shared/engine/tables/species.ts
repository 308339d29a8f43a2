import type { Sourced, SourcedRange } from "./provenance.ts";
import { SOURCES } from "./sources.ts";

export const SPECIES = [
  "tall_fescue",
  "kentucky_bluegrass",
  "perennial_ryegrass",
  "fine_fescue",
  "bermudagrass",
  "zoysiagrass",
  "st_augustinegrass",
  "centipedegrass",
  "bahiagrass",
] as const;
export type Species = (typeof SPECIES)[number];
export type Season = "cool" | "warm";

export interface SpeciesFacts {
  readonly species: Species;
  /** Plain name for homeowner text. */
  readonly name: string;
  readonly season: Season;
  /** Days from sowing to first sprouts in good soil temperature. */
  readonly emergenceDays: SourcedRange;
  /** Bulk seed, lb per 1,000 ft², for a new lawn on bare soil. */
  readonly newSeedingLbPer1000: SourcedRange;
  /** Bulk seed, lb per 1,000 ft², into existing thin turf. */
  readonly overseedingLbPer1000: SourcedRange;
  /** Only where a publication gives it; null means "not published here". */
  readonly seedsPerLb: (Sourced & { readonly value: number }) | null;
  /** False where the species is normally planted as sod or plugs. */
  readonly commonlySeeded: boolean;
}

/** Overseeding ≈ half the new-seeding rate (Nebraska Extension column, 2021). */
export const OVERSEEDING_TO_NEW_SEEDING_RATIO = 0.5;

const emergenceFromMemory = (min: number, max: number): SourcedRange => ({
  min,
  max,
  source: SOURCES.landGrantEstablishment,
  provenance: "from memory",
});

/*
 * Warm-season emergence days are recalled, not read: TRADE-REFERENCES.md gives none. A consumer
 * page (about.com, "Grass Seed Germination Rates") lists bermuda 10–30, zoysia 14–21, centipede
 * 14–21 and bahia 14–28 days, close to these but not the same; kept "from memory" until an
 * extension publication is read.
 */
const warmSeasonFromMemory = (min: number, max: number): SourcedRange => ({
  min,
  max,
  source: SOURCES.landGrantWarmSeason,
  provenance: "from memory",
});

/** Half of a published new-seeding range, carrying both sources. */
function halfOf(newSeeding: SourcedRange): SourcedRange {
  return {
    min: newSeeding.min * OVERSEEDING_TO_NEW_SEEDING_RATIO,
    max: newSeeding.max * OVERSEEDING_TO_NEW_SEEDING_RATIO,
    source: `${newSeeding.source} × ratio 0.5 from ${SOURCES.nebraskaColumn2021}`,
    provenance: newSeeding.provenance,
  };
}

const tallFescueNew: SourcedRange = {
  min: 6,
  max: 8,
  source: `${SOURCES.cornellSeedingRates}; ${SOURCES.nebraskaColumn2021}`,
  provenance: "published",
};
// Cornell gives 1–3 and Nebraska 2–3; the wider range is kept so a light
// Cornell-style rate does not trigger a warning.
const bluegrassNew: SourcedRange = {
  min: 1,
  max: 3,
  source: `${SOURCES.cornellSeedingRates} (1–3); ${SOURCES.nebraskaColumn2021} (2–3)`,
  provenance: "published",
};
const ryegrassNew: SourcedRange = { min: 4, max: 6, source: SOURCES.cornellSeedingRates, provenance: "published" };
// Fine fescues are not in the references we hold; 3–5 lb is recalled from
// cool-season establishment guides.
const fineFescueNew: SourcedRange = {
  min: 3,
  max: 5,
  source: SOURCES.landGrantEstablishment,
  provenance: "from memory",
};
const bermudaNew = warmSeasonFromMemory(1, 2);
const zoysiaNew = warmSeasonFromMemory(1, 2);
const centipedeNew = warmSeasonFromMemory(0.25, 0.5);
const bahiaNew = warmSeasonFromMemory(5, 10);
// St. Augustinegrass is sold as sod and plugs; seed is scarce and the guides we
// recall give no dependable rate, so this row is a wide placeholder the
// engine pairs with a "rarely seeded" warning.
const stAugustineNew = warmSeasonFromMemory(0.25, 0.5);

export const SPECIES_FACTS: Readonly<Record<Species, SpeciesFacts>> = {
  tall_fescue: {
    species: "tall_fescue",
    name: "tall fescue",
    season: "cool",
    emergenceDays: emergenceFromMemory(7, 14),
    newSeedingLbPer1000: tallFescueNew,
    overseedingLbPer1000: { min: 4, max: 6, source: SOURCES.coloradoAskExtension877015, provenance: "published" },
    seedsPerLb: null,
    commonlySeeded: true,
  },
  kentucky_bluegrass: {
    species: "kentucky_bluegrass",
    name: "Kentucky bluegrass",
    season: "cool",
    emergenceDays: emergenceFromMemory(14, 30),
    newSeedingLbPer1000: bluegrassNew,
    overseedingLbPer1000: halfOf(bluegrassNew),
    seedsPerLb: { value: 1_500_000, source: SOURCES.cornellSeedingRates, provenance: "published" },
    commonlySeeded: true,
  },
  perennial_ryegrass: {
    species: "perennial_ryegrass",
    name: "perennial ryegrass",
    season: "cool",
    emergenceDays: emergenceFromMemory(5, 10),
    newSeedingLbPer1000: ryegrassNew,
    overseedingLbPer1000: halfOf(ryegrassNew),
    seedsPerLb: { value: 250_000, source: SOURCES.cornellSeedingRates, provenance: "published" },
    commonlySeeded: true,
  },
  fine_fescue: {
    species: "fine_fescue",
    name: "fine fescue",
    season: "cool",
    emergenceDays: emergenceFromMemory(7, 14),
    newSeedingLbPer1000: fineFescueNew,
    overseedingLbPer1000: halfOf(fineFescueNew),
    seedsPerLb: null,
    commonlySeeded: true,
  },
  bermudagrass: {
    species: "bermudagrass",
    name: "bermudagrass",
    season: "warm",
    emergenceDays: warmSeasonFromMemory(7, 21),
    newSeedingLbPer1000: bermudaNew,
    overseedingLbPer1000: halfOf(bermudaNew),
    seedsPerLb: null,
    commonlySeeded: true,
  },
  zoysiagrass: {
    species: "zoysiagrass",
    name: "zoysiagrass",
    season: "warm",
    emergenceDays: warmSeasonFromMemory(10, 21),
    newSeedingLbPer1000: zoysiaNew,
    overseedingLbPer1000: halfOf(zoysiaNew),
    seedsPerLb: null,
    commonlySeeded: true,
  },
  st_augustinegrass: {
    species: "st_augustinegrass",
    name: "St. Augustinegrass",
    season: "warm",
    emergenceDays: warmSeasonFromMemory(14, 28),
    newSeedingLbPer1000: stAugustineNew,
    overseedingLbPer1000: halfOf(stAugustineNew),
    seedsPerLb: null,
    commonlySeeded: false,
  },
  centipedegrass: {
    species: "centipedegrass",
    name: "centipedegrass",
    season: "warm",
    emergenceDays: warmSeasonFromMemory(14, 28),
    newSeedingLbPer1000: centipedeNew,
    overseedingLbPer1000: halfOf(centipedeNew),
    seedsPerLb: null,
    commonlySeeded: true,
  },
  bahiagrass: {
    species: "bahiagrass",
    name: "bahiagrass",
    season: "warm",
    emergenceDays: warmSeasonFromMemory(14, 28),
    newSeedingLbPer1000: bahiaNew,
    overseedingLbPer1000: halfOf(bahiaNew),
    seedsPerLb: null,
    commonlySeeded: true,
  },
};
