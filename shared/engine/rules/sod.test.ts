import { describe, expect, it } from "vitest";
import { daysBetween } from "../dates.ts";
import { generatePlan } from "../generate.ts";
import { parsePlanInput } from "../schemas/parse.ts";
import { SOD_ROOTING, SOD_WATERING } from "../tables/sod.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import type { Plan } from "../types.ts";

/*
 * Sod after installation (TRADE-REFERENCES.md, common practice): water at once until the
 * soil under it is wet, then daily; first mow when it has rooted (it resists a gentle tug),
 * at a high setting. Day counts and depths are Sproutline's choices (tables/sod.ts).
 */
type Changes = Parameters<typeof withChanges>[0];
const sodVisit = (changes: Changes = {}) =>
  withChanges({
    ...changes,
    visit: { services: ["sod_installation"], seedMix: [], seedRateLbPer1000: undefined, products: [], ...changes.visit },
    // A measured 2 in/h, so minutes are depth ÷ rate × 60 (derived, TRADE-REFERENCES "Minutes per cycle").
    property: { irrigation: { kind: "in_ground", zones: 4, precipitationRateInPerHour: 2 }, ...changes.property },
  });
const sodPlan = (changes: Changes = {}) => generatePlan(valid(sodVisit(changes)));
const day = (plan: Plan, date: string) => daysBetween(plan.meta.visitDate, date);
const waterDays = (plan: Plan) => plan.steps.filter((s) => s.kind === "water").map((s) => day(plan, s.date));

describe("sod installation", () => {
  it("is a service of its own that sows nothing: no germination watering, no seed hold-offs, no starter step", () => {
    const plan = sodPlan();
    expect(plan.meta.seeding).toBe(false);
    expect(plan.meta.germinationWateringEnds).toBeNull();
    expect(plan.steps.filter((s) => s.kind === "water").every((s) => (s.times ?? []).length <= 1)).toBe(true);
    expect(plan.steps.some((s) => s.kind === "feed")).toBe(false);
    expect(plan.holdOffs.map((h) => h.kind)).toEqual(["heavy_traffic"]);
    expect(plan.warnings.map((w) => w.code)).toEqual([]);
  });

  it("soaks at once, 1 in: 30 minutes at 2 in/h, and says to lift a corner to check the soil under it", () => {
    const soak = sodPlan().steps.find((s) => s.key === "water:2026-09-10:1");
    expect(soak?.minutesPerCycle).toBe(30);
    expect(soak?.title).toBe("Soak the new sod as soon as it is laid, 30 minutes per zone");
    expect(soak?.detail).toMatch(/lift a corner/);
    expect(soak?.why.provenance).toBe("common practice");
  });

  it("waters daily (0.5 in = 15 min) through day 9, then every other day (0.75 in = 22.5 → 23 min) until its own schedule ends on day 14", () => {
    const plan = sodPlan();
    const days = waterDays(plan).filter((d) => d <= SOD_WATERING.lastDay);
    expect(days).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 11, 13]);
    expect(plan.steps.find((s) => s.key === "water:2026-09-11:1")?.minutesPerCycle).toBe(15);
    expect(plan.steps.find((s) => s.key === "water:2026-09-21:1")?.minutesPerCycle).toBe(23);
    // After it, the lawn's ordinary deep watering picks up.
    expect(waterDays(plan).some((d) => d > SOD_WATERING.lastDay)).toBe(true);
  });

  it("turns a heavy-rain day into a check-the-soil note, and never waters on or after the expected first frost", () => {
    const rainy = sodPlan({ options: { observations: [{ kind: "heavy_rain", date: "2026-09-13" }] } });
    expect(rainy.steps.find((s) => s.date === "2026-09-13" && s.kind === "water")).toBeUndefined();
    expect(rainy.steps.find((s) => s.key === "note:2026-09-13:rain")?.detail).toMatch(/Lift a corner/);

    const frosty = sodPlan({ property: { expectedFirstFrost: "2026-09-16" } });
    expect(Math.max(...waterDays(frosty))).toBe(5);
  });

  it("keeps people off until the tug test, then the first mowing at the highest setting, stepping down one setting a week", () => {
    const plan = sodPlan({ property: { currentMowingHeightIn: 3, mowerHighestSettingIn: 4, mowerSettingStepIn: 0.5 } });
    const tug = plan.steps.find((s) => s.key === "note:sod_tug_test");
    const mows = plan.steps.filter((s) => s.kind === "mow");
    expect(day(plan, tug!.date)).toBe(SOD_ROOTING.tugTestDay);
    expect(tug?.detail).toMatch(/Gently pull up on a corner/);
    expect(plan.holdOffs[0]).toMatchObject({ start: "2026-09-10", end: tug!.date });
    expect(day(plan, mows[0]!.date)).toBeGreaterThanOrEqual(SOD_ROOTING.firstMowFromDay);
    expect(mows[0]?.title).toBe("First mow of the new sod, once it passes the tug test: highest setting (4 in)");
    expect(mows.map((m) => m.heightIn)).toEqual([4, 3.5, 3, 3, 3, 3].slice(0, mows.length));
  });

  it("warns the crew when the lawn has no sprinkler: 0.5 in a day for 9 days by hose", () => {
    const plan = sodPlan({ property: { irrigation: { kind: "none" } } });
    expect(plan.warnings.filter((w) => w.code === "no_sprinkler_for_sod").map((w) => `${w.audience}:${w.severity}`)).toEqual(["crew:caution"]);
    expect(plan.warnings.find((w) => w.code === "no_sprinkler_for_sod")?.message).toMatch(/^No sprinkler: new sod needs about 0\.5 inch of water every day for its first 9 days\./);
    expect(sodPlan().warnings.some((w) => w.code === "no_sprinkler_for_sod")).toBe(false);
  });

  it("is refused together with seed on one visit: the two need different watering", () => {
    const result = parsePlanInput(withChanges({ visit: { services: ["sod_installation", "overseeding"] } }));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.fields["visit.services"]).toMatch(/separate visits/);
  });
});
