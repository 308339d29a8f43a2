import { fromDayNumber, toDayNumber, type IsoDate } from "./dates.ts";
import { mixFacts, type MixFacts } from "./mix.ts";
import { SEEDING_SERVICES, type PlanInput, type Service } from "./schemas/plan-input.ts";
import type { ProgramSettings } from "./schemas/program-settings.ts";
import { dateOfKey } from "./step-keys.ts";
import { SPECIES_FACTS, type Season } from "./tables/species.ts";
import { HOSE_END_DEFAULT, SPRINKLER_DEFAULTS, type SprinklerDefault } from "./tables/sprinklers.ts";
import { hemisphereOfZone, type Hemisphere } from "./tables/timing.ts";
import { computeTimeline, phaseOfDay, type Timeline } from "./timeline.ts";
import { seasonOf, type SeasonFacts } from "./rules/season.ts";
import type { Phase } from "./types.ts";
import { zoneClock, type ZoneClock } from "./zone-time.ts";

/** Everything the rule modules need, worked out once per plan. */
export interface PlanContext {
  readonly input: PlanInput;
  readonly program: ProgramSettings;
  readonly visitDay: number;
  readonly zone: string;
  readonly hemisphere: Hemisphere;
  readonly services: ReadonlySet<Service>;
  /** Seed went down: a seeding service, or seed logged without one. */
  readonly seeding: boolean;
  readonly mix: MixFacts | null;
  readonly lawnSeason: Season | "mixed";
  readonly precipitationRate: number;
  readonly precipitationRateMeasured: boolean;
  /** The sprinkler's typical range the rate was taken from; null when measured or the program default. */
  readonly sprinklerDefault: SprinklerDefault | null;
  readonly rainDays: ReadonlySet<number>;
  readonly skippedKeys: ReadonlySet<string>;
  readonly sproutsSeenDay: number | null;
  /**
   * The first frost that ends the plan's growing days, as an offset from the visit: entered or the
   * hemisphere's default (null only in frost-free places); negative once it has passed; next
   * season's when seed lies dormant until spring.
   */
  readonly frostDay: number | null;
  /** The season check, worked out once per plan (rules/season.ts). */
  readonly season: SeasonFacts;
  readonly timeline: Timeline;
  /** DST gaps of the zone over the plan's dates, for checking watering times. */
  readonly clock: ZoneClock;
  /** ISO date of a day offset from the visit. */
  dateOf(dayOffset: number): IsoDate;
  phaseOf(dayOffset: number): Phase;
}

function lawnSeasonOf(input: PlanInput): Season | "mixed" {
  if (input.property.grassType.season) return input.property.grassType.season;
  const seasons = new Set(input.property.grassType.species.map((s) => SPECIES_FACTS[s].season));
  if (seasons.size === 1) return seasons.has("warm") ? "warm" : "cool";
  return "mixed";
}

/** A sprinkler of known type (or a hose-end one) has a typical rate; an in-ground system of unknown type does not. */
function sprinklerDefaultOf(irrigation: PlanInput["property"]["irrigation"]): SprinklerDefault | null {
  if (irrigation.precipitationRateInPerHour !== undefined || irrigation.kind === "none") return null;
  if (irrigation.sprinklerType) return SPRINKLER_DEFAULTS[irrigation.sprinklerType];
  return irrigation.kind === "hose_end" ? HOSE_END_DEFAULT : null;
}

export function buildContext(input: PlanInput): PlanContext {
  const { visit, property, program, options } = input;
  const visitDay = toDayNumber(visit.date);
  const services = new Set(visit.services);
  const seeding = visit.seedMix.length > 0 || visit.services.some((s) => SEEDING_SERVICES.includes(s));
  const mix = seeding ? mixFacts(visit.seedMix) : null;
  const sprinklerDefault = sprinklerDefaultOf(property.irrigation);

  let sproutsSeenDay: number | null = null;
  const rainDays = new Set<number>();
  const skippedKeys = new Set<string>();
  for (const observation of options.observations) {
    if (observation.kind === "sprouts_seen") {
      sproutsSeenDay = sproutsSeenDay === null ? observation.onDay : Math.min(sproutsSeenDay, observation.onDay);
    } else if (observation.kind === "heavy_rain") {
      rainDays.add(toDayNumber(observation.date));
    } else {
      skippedKeys.add(observation.stepKey);
    }
  }

  const hemisphere = property.hemisphere ?? hemisphereOfZone(property.timeZone);
  const lawnSeason = lawnSeasonOf(input);
  const season = seasonOf(input, visitDay, hemisphere, lawnSeason, seeding, mix);
  const start = season.sowingStartDay;
  const base = computeTimeline(program, mix, { sproutsSeenDay, skippedGerminationWateringDays: 0 }, start);
  const skippedGerminationWateringDays = countSkippedWateringDays(skippedKeys, visitDay, base.germinationEnd);
  const timeline =
    skippedGerminationWateringDays === 0
      ? base
      : computeTimeline(program, mix, { sproutsSeenDay, skippedGerminationWateringDays }, start);

  return {
    input,
    program,
    visitDay,
    zone: property.timeZone,
    hemisphere,
    services,
    seeding,
    mix,
    lawnSeason,
    precipitationRate:
      property.irrigation.precipitationRateInPerHour ?? sprinklerDefault?.assumedInPerHour ?? program.defaultPrecipitationRateInPerHour,
    precipitationRateMeasured: property.irrigation.precipitationRateInPerHour !== undefined,
    sprinklerDefault,
    rainDays,
    skippedKeys,
    sproutsSeenDay,
    frostDay: season.frostDay,
    season,
    timeline,
    clock: zoneClock(property.timeZone, visitDay, visitDay + timeline.planEnd),
    dateOf: (dayOffset) => fromDayNumber(visitDay + dayOffset),
    phaseOf: (dayOffset) => phaseOfDay(timeline, dayOffset),
  };
}

/** Distinct germination days with a skipped watering (a day counts once however many cycles were skipped). */
function countSkippedWateringDays(skippedKeys: ReadonlySet<string>, visitDay: number, germinationEnd: number | null): number {
  if (germinationEnd === null) return 0;
  const days = new Set<number>();
  for (const key of skippedKeys) {
    if (!key.startsWith("water:")) continue;
    const date = dateOfKey(key);
    if (date === null) continue;
    const offset = toDayNumber(date) - visitDay;
    if (offset >= 1 && offset <= germinationEnd) days.add(offset);
  }
  return days.size;
}
