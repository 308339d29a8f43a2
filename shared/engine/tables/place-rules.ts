import type { SourcedRange } from "./provenance.ts";
import { SOURCES } from "./sources.ts";

/*
 * How long a feeding may wait for a fertilizer blackout to end and still do its job. No
 * publication gives a figure: a starter feeds seedlings in their first weeks, a slow-release
 * feeding is flexible by a few weeks. Beyond these the plan leaves the feeding out instead.
 */
export const FEED_DELAY_LIMIT_DAYS = {
  starter: 14,
  other: 30,
  source: SOURCES.sproutlineChoice,
  provenance: "common practice",
} as const;

/** How far a deep watering may move, either way, to reach an allowed day: within its own week. */
export const WATERING_MOVE_LIMIT_DAYS: SourcedRange = {
  min: 1,
  max: 6,
  source: SOURCES.sproutlineChoice,
  provenance: "common practice",
};

/** Where rules entered by a company come from, for the "why?" of the steps they change. */
export const PLACE_RULES_SOURCE = "Rules your lawn-care company entered for this place; the local ordinance decides";
