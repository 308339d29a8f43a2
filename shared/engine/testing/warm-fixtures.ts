import type { PlanInputRaw } from "../schemas/plan-input.ts";
import { withChanges } from "./fixtures.ts";

/**
 * Winter ryegrass overseeding of a thin bermudagrass lawn in Texas in early October, no frost date given.
 * Warm-season tests change one thing at a time from here.
 */
export function winterRyegrassVisit(): PlanInputRaw {
  return withChanges({
    visit: {
      date: "2026-10-01",
      services: ["overseeding"],
      seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 90 }],
      seedRateLbPer1000: 8,
      products: [],
    },
    property: {
      grassType: { species: ["bermudagrass"] },
      currentMowingHeightIn: 1.5,
      mowerHighestSettingIn: 3,
      mowerSettingStepIn: 0.5,
      timeZone: "America/Chicago",
      expectedFirstFrost: undefined,
    },
  });
}

/** A new bermudagrass lawn sown from seed on bare soil in early June in Georgia. */
export function bermudaSeedingVisit(): PlanInputRaw {
  return withChanges({
    visit: {
      date: "2026-06-01",
      services: ["new_seeding"],
      seedMix: [{ species: "bermudagrass", percent: 100, purityPct: 95, germinationPct: 85 }],
      seedRateLbPer1000: 1.5,
      products: [],
    },
    property: {
      grassType: { species: ["bermudagrass"] },
      lawnCondition: "bare",
      currentMowingHeightIn: 1,
      mowerHighestSettingIn: 3,
      mowerSettingStepIn: 0.5,
      timeZone: "America/New_York",
      expectedFirstFrost: "2026-11-10",
    },
  });
}
