import { addDays, type PlanInputRaw, type ProgramSettingsInput } from "#shared/engine/index";

/** The next 10 September: early autumn, when most cool-season overseeding is done. */
function nextAutumnVisitDate(today = new Date()): string {
  const year = today.getFullYear();
  const thisYear = `${year}-09-10`;
  const todayIso = today.toISOString().slice(0, 10);
  return todayIso <= thisYear ? thisYear : `${year + 1}-09-10`;
}

/**
 * One typical job to show the program on: core aeration and overseeding of a thin
 * 6,000 ft² tall-fescue lawn with in-ground sprinklers, starter fertiliser applied,
 * first frost seven weeks out. Only the program changes between previews.
 */
export function sampleVisitInput(program: ProgramSettingsInput): PlanInputRaw {
  const date = nextAutumnVisitDate();
  return {
    visit: {
      date,
      services: ["aeration", "overseeding", "starter_fertiliser"],
      seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
      seedRateLbPer1000: 5,
      areaFt2: 6000,
      products: [{ name: "Starter 18-24-12", analysis: { n: 18, p: 24, k: 12 }, rateLbPer1000: 4 }],
    },
    property: {
      grassType: { species: ["tall_fescue"] },
      lawnCondition: "thin",
      irrigation: { kind: "in_ground", zones: 4 },
      currentMowingHeightIn: 4,
      mowerHighestSettingIn: 4,
      mowerSettingStepIn: 0.5,
      timeZone: "America/New_York",
      expectedFirstFrost: addDays(date, 48),
    },
    program,
  } as PlanInputRaw;
}

export const sampleDescription = "Core aeration and overseeding of a thin 6,000 ft² tall-fescue lawn on September 10, in-ground sprinklers, starter fertilizer.";
