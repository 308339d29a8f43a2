import { addDays, localToday } from "./local-dates.ts";
import type { PreviewFormValues } from "./form-values.ts";

/** Days from the visit to the expected first frost in the starting example: just clear of the frost warnings. */
export const DEFAULT_DAYS_TO_FROST = 48;

/** The next 10 September: early autumn, the usual overseeding window for cool-season lawns. */
export function nextAutumnVisitDate(today = localToday()): string {
  const year = Number(today.slice(0, 4));
  const thisYear = `${year}-09-10`;
  return today <= thisYear ? thisYear : `${year + 1}-09-10`;
}

/**
 * A typical job to start from: core aeration and overseeding of a thin tall-fescue
 * lawn of 6,000 ft² with in-ground sprinklers, starter fertiliser applied.
 */
export function defaultPreviewValues(visitDate = nextAutumnVisitDate()): PreviewFormValues {
  return {
    visit: {
      date: visitDate,
      services: ["aeration", "overseeding", "starter_fertiliser"],
      seedMix: [{ species: "tall_fescue", percent: "100", purityPct: "98", germinationPct: "90" }],
      seedRateLbPer1000: "5",
      areaFt2: "6000",
      products: [
        { name: "Starter 18-24-12", analysis: { n: "18", p: "24", k: "12" }, rateLbPer1000: "4", quickReleaseN: false, organic: false },
      ],
    },
    property: {
      grassType: { species: ["tall_fescue"], season: "" },
      lawnCondition: "thin",
      slope: "",
      shade: "",
      irrigation: { kind: "in_ground", sprinklerType: "", zones: "4", precipitationRateInPerHour: "" },
      currentMowingHeightIn: "4",
      mowerHighestSettingIn: "4",
      mowerSettingStepIn: "0.5",
      timeZone: "America/New_York",
      timeZoneOther: "",
      expectedFirstFrost: addDays(visitDate, DEFAULT_DAYS_TO_FROST),
    },
  };
}
