import type { ShadeLevel, Service, Slope, Species, SprinklerType } from "#shared/engine/index";

/*
 * What the form holds. Numbers stay as the text the person typed, so a half-typed
 * "4." or a stray letter is never thrown away; lib/to-plan-input.ts turns them into
 * numbers. Paths mirror PlanInputRaw ("visit.areaFt2", "visit.seedMix.0.percent"),
 * so the engine's and the server's field errors land on the right input unchanged.
 */
export interface SeedRowValues {
  species: Species;
  percent: string;
  purityPct: string;
  germinationPct: string;
}

export interface ProductRowValues {
  name: string;
  analysis: { n: string; p: string; k: string };
  rateLbPer1000: string;
  quickReleaseN: boolean;
  organic: boolean;
}

export type LawnCondition = "thin" | "bare" | "thick_dormant" | "thick";
export type IrrigationKind = "in_ground" | "hose_end" | "none";

/** The time-zone select's choice that reveals a free-text box. */
export const OTHER_TIME_ZONE = "other";

export interface PreviewFormValues {
  visit: {
    date: string;
    services: Service[];
    seedMix: SeedRowValues[];
    seedRateLbPer1000: string;
    areaFt2: string;
    products: ProductRowValues[];
  };
  property: {
    grassType: { species: Species[]; season: "" | "cool" | "warm" };
    lawnCondition: LawnCondition;
    /** Empty when not noted (treated as flat / full sun). */
    slope: "" | Slope;
    shade: "" | ShadeLevel;
    /** Empty when the crew does not know the sprinkler type. */
    irrigation: { kind: IrrigationKind; sprinklerType: "" | SprinklerType; zones: string; precipitationRateInPerHour: string };
    currentMowingHeightIn: string;
    mowerHighestSettingIn: string;
    mowerSettingStepIn: string;
    /** An IANA zone from the list, or OTHER_TIME_ZONE to use `timeZoneOther`. */
    timeZone: string;
    timeZoneOther: string;
    /** Empty for a frost-free climate. */
    expectedFirstFrost: string;
  };
}

/** A new seed row starts on a species not yet in the mix, since each species may appear once. */
export const emptySeedRow = (species: Species = "tall_fescue"): SeedRowValues => ({ species, percent: "", purityPct: "", germinationPct: "" });

export const emptyProductRow = (): ProductRowValues => ({
  name: "",
  analysis: { n: "", p: "", k: "" },
  rateLbPer1000: "",
  quickReleaseN: false,
  organic: false,
});
