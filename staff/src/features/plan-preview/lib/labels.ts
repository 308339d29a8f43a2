import { SPECIES_FACTS, type HoldOffKind, type Phase, type Provenance, type Species, type SprinklerType } from "#shared/engine/index";
import type { IrrigationKind } from "./form-values.ts";

/** Plain names for the engine's codes, as staff say them (services, lawn condition, slope and shade: `#shared/ui`). */

export const IRRIGATION_LABELS: Record<IrrigationKind, string> = {
  in_ground: "In-ground sprinkler system",
  hose_end: "Hose-end sprinkler",
  none: "No sprinkler",
};

export const SPRINKLER_TYPE_LABELS: Record<SprinklerType, string> = {
  fixed_spray: "Fixed spray heads",
  rotor: "Rotor heads",
  oscillating: "Hose-end, oscillating",
  impact: "Hose-end, impact",
};

export const PHASE_LABELS: Record<Phase, string> = {
  prep: "Before the visit",
  germination: "Germination",
  establishment: "Establishment",
  maturing: "Maturing",
};

export const HOLD_OFF_LABELS: Record<HoldOffKind, string> = {
  weed_and_feed: "No weed-and-feed",
  broadleaf_herbicide: "No broadleaf weed killer",
  crabgrass_pre_emergent: "No crabgrass pre-emergent",
  high_n_quick_release: "No high-nitrogen quick-release feed",
  heavy_traffic: "Keep heavy traffic off",
  new_seed: "No more seed while an earlier pre-emergent is active",
};

export const PROVENANCE_LABELS: Record<Provenance, string> = {
  published: "published source",
  "common practice": "common trade practice",
  "from memory": "recalled, not re-read",
};

export function speciesLabel(species: Species): string {
  const name = SPECIES_FACTS[species].name;
  return name.charAt(0).toUpperCase() + name.slice(1);
}

/** Common North American zones; anything else goes in the free-text box. */
export const COMMON_TIME_ZONES: readonly { zone: string; label: string }[] = [
  { zone: "America/St_Johns", label: "Newfoundland (St. John's)" },
  { zone: "America/Halifax", label: "Atlantic (Halifax)" },
  { zone: "America/Puerto_Rico", label: "Atlantic, no DST (Puerto Rico)" },
  { zone: "America/New_York", label: "Eastern (New York)" },
  { zone: "America/Toronto", label: "Eastern (Toronto)" },
  { zone: "America/Chicago", label: "Central (Chicago)" },
  { zone: "America/Winnipeg", label: "Central (Winnipeg)" },
  { zone: "America/Regina", label: "Central, no DST (Regina)" },
  { zone: "America/Mexico_City", label: "Central Mexico (Mexico City)" },
  { zone: "America/Denver", label: "Mountain (Denver)" },
  { zone: "America/Edmonton", label: "Mountain (Edmonton)" },
  { zone: "America/Phoenix", label: "Mountain, no DST (Phoenix)" },
  { zone: "America/Los_Angeles", label: "Pacific (Los Angeles)" },
  { zone: "America/Vancouver", label: "Pacific (Vancouver)" },
  { zone: "America/Anchorage", label: "Alaska (Anchorage)" },
  { zone: "Pacific/Honolulu", label: "Hawaii (Honolulu)" },
];

const FIELD_LABELS: Record<string, string> = {
  "visit.date": "Visit date",
  "visit.services": "Services done",
  "visit.areaFt2": "Lawn area",
  "visit.seedMix": "Seed mix",
  "visit.seedRateLbPer1000": "Seed rate",
  "visit.products": "Products",
  "property.grassType": "Grass in the lawn",
  "property.grassType.species": "Grass in the lawn",
  "property.grassType.season": "Grass season",
  "property.lawnCondition": "Lawn condition",
  "property.slope": "Slope",
  "property.shade": "Shade",
  "property.irrigation": "Watering",
  "property.irrigation.kind": "Watering",
  "property.irrigation.zones": "Zones",
  "property.irrigation.precipitationRateInPerHour": "Precipitation rate",
  "property.irrigation.sprinklerType": "Sprinkler type",
  "property.currentMowingHeightIn": "Mowing height now",
  "property.mowerHighestSettingIn": "Mower's highest setting",
  "property.mowerSettingStepIn": "Mower step",
  "property.timeZone": "Time zone",
  "property.expectedFirstFrost": "Expected first frost",
};

const ROW_FIELD_LABELS: Record<string, string> = {
  species: "species",
  percent: "share of mix",
  purityPct: "purity",
  germinationPct: "germination",
  name: "name",
  analysis: "analysis",
  "analysis.n": "N",
  "analysis.p": "P",
  "analysis.k": "K",
  rateLbPer1000: "rate",
};

/** "visit.seedMix.1.purityPct" → "Seed 2, purity": names a field in the error summary. */
export function describeFieldPath(path: string): string {
  const row = /^visit\.(seedMix|products)\.(\d+)(?:\.(.+))?$/.exec(path);
  if (row) {
    const [, list, index, rest] = row;
    const item = `${list === "seedMix" ? "Seed" : "Product"} ${Number(index) + 1}`;
    return rest ? `${item}, ${ROW_FIELD_LABELS[rest] ?? rest}` : item;
  }
  return FIELD_LABELS[path] ?? path;
}
