import type { PlanInput, PlanInputRaw } from "../schemas/plan-input.ts";
import { parsePlanInput } from "../schemas/parse.ts";

/**
 * A typical autumn job: core aeration and overseeding of a thin tall-fescue
 * lawn in New Jersey, starter fertilizer applied, in-ground sprinklers.
 * Tests change one thing at a time from here.
 */
export function overseedingVisit(): PlanInputRaw {
  return {
    visit: {
      date: "2026-09-10",
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
      expectedFirstFrost: "2026-11-15",
    },
  };
}

/** Parses a raw input that the test expects to be valid, failing loudly with the field errors otherwise. */
export function valid(raw: unknown): PlanInput {
  const result = parsePlanInput(raw);
  if (!result.ok) throw new Error(`fixture is invalid: ${JSON.stringify(result.fields)}`);
  return result.value;
}

/** Shallow-merge helper for the two nested objects tests usually tweak. */
export function withChanges(
  changes: { visit?: Partial<PlanInputRaw["visit"]>; property?: Partial<PlanInputRaw["property"]>; program?: PlanInputRaw["program"]; options?: PlanInputRaw["options"] },
  base: PlanInputRaw = overseedingVisit(),
): PlanInputRaw {
  return {
    ...base,
    visit: { ...base.visit, ...changes.visit },
    property: { ...base.property, ...changes.property },
    ...(changes.program ? { program: changes.program } : {}),
    ...(changes.options ? { options: changes.options } : {}),
  };
}
