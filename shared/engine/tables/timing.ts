import type { Sourced } from "./provenance.ts";
import { SOURCES } from "./sources.ts";

/** New seed needs 30–45 days before the first hard frost: under 30 is a risk, 30–45 a caution. */
export const FROST_RULE = {
  riskBelowDays: 30,
  cautionUpToDays: 45,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const satisfies Sourced & Record<string, unknown>;

/**
 * Autumn by hemisphere, as calendar months. Used for the warm-season
 * overseeding warning and for leaf clean-up.
 */
export const AUTUMN_MONTHS = {
  north: [9, 10, 11],
  south: [3, 4, 5],
} as const;

/**
 * Leaf season: from the first day of autumn until leaves stop falling a little
 * after autumn's last month. Clean-up steps fall on plan dates inside it,
 * whatever month the visit was in.
 */
export const LEAF_SEASON = {
  north: { start: { month: 9, day: 1 }, end: { month: 12, day: 15 } },
  south: { start: { month: 3, day: 1 }, end: { month: 6, day: 15 } },
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/** After a visit with no seed (aeration, dethatching, feeding) the lawn recovers for about two weeks. */
export const RECOVERY_RULE = {
  days: 14,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

/*
 * Hemisphere from the IANA zone, used only to know which months are autumn.
 * Zones whose country straddles the equator (e.g. America/Guayaquil) count as
 * north; a property can override with an explicit hemisphere.
 */
const SOUTHERN_ZONE_PREFIXES = ["Australia/", "Antarctica/", "America/Argentina/"];
const SOUTHERN_ZONES = new Set([
  "Pacific/Auckland",
  "Pacific/Chatham",
  "Pacific/Fiji",
  "Pacific/Tongatapu",
  "Pacific/Apia",
  "Pacific/Noumea",
  "Pacific/Tahiti",
  "America/Sao_Paulo",
  "America/Santiago",
  "America/Montevideo",
  "America/Asuncion",
  "America/La_Paz",
  "America/Lima",
  "Africa/Johannesburg",
  "Africa/Maputo",
  "Africa/Harare",
  "Africa/Windhoek",
  "Africa/Gaborone",
  "Africa/Maseru",
  "Africa/Mbabane",
  "Africa/Lusaka",
  "Indian/Mauritius",
  "Indian/Reunion",
  "Indian/Antananarivo",
  "Atlantic/Stanley",
  "Antarctica/McMurdo",
  "NZ",
]);

export type Hemisphere = "north" | "south";

export function hemisphereOfZone(zone: string): Hemisphere {
  if (SOUTHERN_ZONES.has(zone)) return "south";
  return SOUTHERN_ZONE_PREFIXES.some((prefix) => zone.startsWith(prefix)) ? "south" : "north";
}

/** Grass keeps growing for a few weeks after the first frost, so mowing steps run on a little past it. */
export const AFTER_FROST_RULE = {
  mowingContinuesDays: 21,
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;
