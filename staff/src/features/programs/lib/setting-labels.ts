import type { NumericSettingKey } from "#shared/engine/index";

/** Plain names for the engine's setting keys, in the words a crew lead would use. */
export const settingLabels: Record<NumericSettingKey, string> = {
  germinationDays: "Germination watering",
  wateringCyclesPerDayGermination: "Light waterings a day while germinating",
  waterDepthPerCycleIn: "Water per light watering",
  defaultPrecipitationRateInPerHour: "Sprinkler rate until measured",
  wateringDaysAfterSprouts: "Light watering after sprouts show",
  establishmentDays: "Establishment phase",
  establishmentWateringsPerWeek: "Deep waterings a week while establishing",
  deepWateringDepthIn: "Most water per deep watering",
  maturingDays: "Maturing phase",
  maturingWateringsPerWeek: "Waterings a week while maturing",
  firstMowMinDays: "Earliest first mow after seeding",
  firstMowDaysAfterEmergence: "First mow after the slowest grass comes up",
  mowingsBeforeHerbicide: "Mowings before any weed killer",
  seedingMowHeightIn: "Mowing height before seeding",
  prepMowStageDays: "Days between mow-down stages",
  weedAndFeedHoldDays: "No weed-and-feed for",
  preEmergentHoldDays: "No crabgrass pre-emergent for",
  highNQuickReleaseHoldDays: "No quick-release high-nitrogen feed for",
  trafficHoldDays: "Keep heavy traffic off for",
};

export const settingGroups: { id: string; title: string; keys: NumericSettingKey[] }[] = [
  {
    id: "watering",
    title: "Watering",
    keys: [
      "germinationDays",
      "wateringCyclesPerDayGermination",
      "waterDepthPerCycleIn",
      "wateringDaysAfterSprouts",
      "defaultPrecipitationRateInPerHour",
      "establishmentDays",
      "establishmentWateringsPerWeek",
      "deepWateringDepthIn",
      "maturingDays",
      "maturingWateringsPerWeek",
    ],
  },
  { id: "mowing", title: "Mowing", keys: ["firstMowMinDays", "firstMowDaysAfterEmergence", "seedingMowHeightIn", "prepMowStageDays"] },
  {
    id: "hold-offs",
    title: "Hold-off windows after seeding",
    keys: ["mowingsBeforeHerbicide", "weedAndFeedHoldDays", "preEmergentHoldDays", "highNQuickReleaseHoldDays", "trafficHoldDays"],
  },
];

/** Units as shown beside an input; counts need none because the label names what is counted. */
export function unitLabel(unit: string): string {
  return unit === "count" ? "" : unit;
}

/** A step that fits the bound's precision, so arrow keys move in sensible amounts. */
export function stepOf(unit: string, integer: boolean): string {
  if (integer) return "1";
  return unit === "in/h" ? "0.1" : "0.05";
}

export const holdOffLabels: Record<string, string> = {
  weed_and_feed: "No weed-and-feed",
  broadleaf_herbicide: "No broadleaf weed killer",
  crabgrass_pre_emergent: "No crabgrass pre-emergent",
  high_n_quick_release: "No quick-release high-N feed",
  heavy_traffic: "Keep heavy traffic off",
  new_seed: "No more seed while an earlier pre-emergent is active",
};
