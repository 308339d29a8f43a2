import type { PlanInputRaw } from "#shared/engine/index";
import type { SavePlace } from "#shared/schemas/place-rules";

export type SampleJob = "seeding" | "feeding";

export const sampleJobOptions: { value: SampleJob; label: string }[] = [
  { value: "seeding", label: "Overseeding, starter fertilizer to follow" },
  { value: "feeding", label: "Fertilizer visit with 10-10-10" },
];

export const sampleJobDescriptions: Record<SampleJob, string> = {
  seeding: "Core aeration and overseeding of a thin 6,000 ft² tall-fescue lawn with in-ground sprinklers; the plan schedules the starter fertilizer.",
  feeding: "A fertilizer visit on a thick 6,000 ft² tall-fescue lawn with in-ground sprinklers: 5 lb of 10-10-10 per 1,000 ft², which contains phosphorus.",
};

/** The next September 10: early fall, when most cool-season work is done. */
export function defaultSampleDate(today = new Date()): string {
  const year = today.getFullYear();
  const thisYear = `${year}-09-10`;
  return today.toISOString().slice(0, 10) <= thisYear ? thisYear : `${year + 1}-09-10`;
}

/**
 * One sample job on the chosen date, with or without the place's rules. No frost date, so any
 * date of the year makes a plan; the company's current program is used.
 */
export function sampleInput(job: SampleJob, date: string, place: SavePlace | null): PlanInputRaw {
  const seeding = job === "seeding";
  return {
    visit: {
      date,
      services: seeding ? ["aeration", "overseeding"] : ["fertiliser_only"],
      seedMix: seeding ? [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }] : [],
      ...(seeding ? { seedRateLbPer1000: 5 } : {}),
      areaFt2: 6000,
      products: seeding ? [] : [{ name: "Balanced 10-10-10", analysis: { n: 10, p: 10, k: 10 }, rateLbPer1000: 5 }],
    },
    property: {
      grassType: { species: ["tall_fescue"] },
      lawnCondition: seeding ? "thin" : "thick",
      irrigation: { kind: "in_ground", zones: 4 },
      currentMowingHeightIn: 4,
      mowerHighestSettingIn: 4,
      mowerSettingStepIn: 0.5,
      timeZone: "America/New_York",
    },
    ...(place
      ? {
          placeRules: {
            name: place.name,
            fertilizerBlackouts: place.fertilizerBlackouts,
            phosphorus: place.phosphorus,
            ...(place.watering ? { watering: place.watering } : {}),
          },
        }
      : {}),
  };
}
