import type { MixFacts } from "./mix.ts";
import type { ProgramSettings } from "./schemas/program-settings.ts";
import { RECOVERY_RULE } from "./tables/timing.ts";
import type { Phase } from "./types.ts";

/** Milestones as whole days after the visit (day 0 = visit day). */
export interface Timeline {
  /** Last day of several light waterings a day (never before the first mowing); null when nothing was sown. */
  readonly germinationEnd: number | null;
  /** Our best estimate of the day the slowest species in the mix is up. */
  readonly slowestEmergence: number | null;
  readonly firstMow: number | null;
  readonly establishmentEnd: number;
  readonly planEnd: number;
}

export interface TimelineObservations {
  /** Earliest day sprouts were reported, if any. */
  readonly sproutsSeenDay: number | null;
  /** Germination-phase days on which the homeowner skipped watering. */
  readonly skippedGerminationWateringDays: number;
}

/** A skipped day of light watering is made up at the end, but never more than a week of it. */
const MAX_MAKE_UP_DAYS = 7;

/**
 * When sprouts are reported we learn where in its emergence range the fastest
 * species landed (soil warm → early, cool → late) and assume the slowest
 * species sits at the same relative point of its own range. Sprouts of a
 * quick ryegrass on day 6 say the soil is warm; they do not say the bluegrass
 * in the same mix is up, so watering is kept for the bluegrass.
 */
export function estimateSlowestEmergence(mix: MixFacts, sproutsSeenDay: number | null): number {
  const slow = mix.slowest.emergenceDays;
  if (sproutsSeenDay === null) return slow.max;
  const fast = mix.fastest.emergenceDays;
  const span = fast.max - fast.min;
  const position = span > 0 ? Math.min(1, Math.max(0, (sproutsSeenDay - fast.min) / span)) : 1;
  return Math.max(sproutsSeenDay, Math.ceil(slow.min + position * (slow.max - slow.min)));
}

/**
 * `startDay` > 0 when seed sown on cold soil lies dormant: its clock starts when the soil
 * warms, and sprouts reported before then count as sprouts on that clock's first day.
 */
export function computeTimeline(
  program: ProgramSettings,
  mix: MixFacts | null,
  observations: TimelineObservations,
  startDay = 0,
): Timeline {
  if (!mix) {
    const establishmentEnd = RECOVERY_RULE.days;
    return {
      germinationEnd: null,
      slowestEmergence: null,
      firstMow: null,
      establishmentEnd,
      planEnd: establishmentEnd + program.maturingDays,
    };
  }
  const sprouts = observations.sproutsSeenDay === null ? null : Math.max(1, observations.sproutsSeenDay - startDay);
  const slowestEmergence = estimateSlowestEmergence(mix, sprouts);
  const afterSprouts = sprouts === null ? 0 : sprouts + program.wateringDaysAfterSprouts;
  const firstMow = Math.max(program.firstMowMinDays, slowestEmergence + program.firstMowDaysAfterEmergence);
  // The program's germination days (bounded at ≥ 14) is a floor no observation
  // can shorten: early sprouts only stop watering from running past it. The
  // surface stays moist until the grass is tall enough to mow, so light
  // watering also runs through the first mowing day (TAPER_RULE).
  const germinationEnd =
    Math.max(program.germinationDays, slowestEmergence, afterSprouts, firstMow) +
    Math.min(MAX_MAKE_UP_DAYS, observations.skippedGerminationWateringDays);
  const establishmentEnd = germinationEnd + program.establishmentDays;
  return {
    germinationEnd: germinationEnd + startDay,
    slowestEmergence: slowestEmergence + startDay,
    firstMow: firstMow + startDay,
    establishmentEnd: establishmentEnd + startDay,
    planEnd: establishmentEnd + program.maturingDays + startDay,
  };
}

export function phaseOfDay(timeline: Timeline, day: number): Phase {
  if (day < 0) return "prep";
  if (timeline.germinationEnd !== null && day <= timeline.germinationEnd) return "germination";
  return day <= timeline.establishmentEnd ? "establishment" : "maturing";
}
