import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { parsePlanInput } from "../schemas/parse.ts";
import { HOSE_END_DEFAULT, SPRINKLER_DEFAULTS } from "../tables/sprinklers.ts";
import { overseedingVisit, valid, withChanges } from "../testing/fixtures.ts";
import type { PlanInputRaw } from "../schemas/plan-input.ts";

type Irrigation = PlanInputRaw["property"]["irrigation"];
const planWith = (irrigation: Irrigation) => generatePlan(valid(withChanges({ property: { irrigation } })));
const lightMinutes = (irrigation: Irrigation) => planWith(irrigation).steps.find((s) => s.key === "water:2026-09-11:1")?.minutesPerCycle;

describe("default precipitation rates by sprinkler type", () => {
  it("match the trade references: fixed spray 1.5–2, rotors 0.4–0.8, hose-end 0.1–0.5 in/h (from memory: Univ. of Florida IFAS, Texas A&M)", () => {
    expect(SPRINKLER_DEFAULTS.fixed_spray.rateInPerHour).toMatchObject({ min: 1.5, max: 2, provenance: "from memory" });
    expect(SPRINKLER_DEFAULTS.rotor.rateInPerHour).toMatchObject({ min: 0.4, max: 0.8, provenance: "from memory" });
    expect(SPRINKLER_DEFAULTS.oscillating.rateInPerHour).toMatchObject({ min: 0.1, max: 0.5 });
    expect(SPRINKLER_DEFAULTS.impact.rateInPerHour).toMatchObject({ min: 0.1, max: 0.5 });
    expect(SPRINKLER_DEFAULTS.rotor.rateInPerHour.source).toMatch(/Florida IFAS.*Texas A&M/);
    // The middle of each range is assumed until measured.
    expect(SPRINKLER_DEFAULTS.fixed_spray.assumedInPerHour).toBe(1.75);
    expect(SPRINKLER_DEFAULTS.rotor.assumedInPerHour).toBe(0.6);
    expect(HOSE_END_DEFAULT.assumedInPerHour).toBe(0.3);
  });

  it("sets light-watering minutes from the type: 0.1 in at 0.6 in/h (rotors) is 10 min, at 1.75 in/h (spray) 3 min (minutes = depth ÷ rate × 60, derived)", () => {
    expect(lightMinutes({ kind: "in_ground", zones: 4, sprinklerType: "rotor" })).toBe(10);
    expect(lightMinutes({ kind: "in_ground", zones: 4, sprinklerType: "fixed_spray" })).toBe(3);
  });

  it("gives a hose-end sprinkler of unknown type the hose-end range, not the in-ground default: 0.1 in at 0.3 in/h is 20 min", () => {
    expect(lightMinutes({ kind: "hose_end" })).toBe(20);
    expect(lightMinutes({ kind: "hose_end", sprinklerType: "impact" })).toBe(20);
  });

  it("keeps older inputs valid: an in-ground system without a type uses the program's default (1.0 in/h → 6 min)", () => {
    const raw = overseedingVisit();
    expect(raw.property.irrigation).not.toHaveProperty("sprinklerType");
    expect(parsePlanInput(raw).ok).toBe(true);
    const plan = generatePlan(valid(raw));
    expect(plan.summary.precipitationRateInPerHour).toBe(1);
    expect(plan.summary.precipitationRateDefault).toEqual({ basis: "program" });
    expect(lightMinutes({ kind: "in_ground", zones: 4 })).toBe(6);
  });

  it("refuses a sprinkler type it does not know", () => {
    const result = parsePlanInput(withChanges({ property: { irrigation: { kind: "in_ground", sprinklerType: "drip" as never } } }));
    expect(result.ok).toBe(false);
    if (!result.ok) expect(Object.keys(result.fields)).toContain("property.irrigation.sprinklerType");
  });

  it("shows the rate as a default with its range, and invites the homeowner to measure it", () => {
    const plan = planWith({ kind: "in_ground", zones: 4, sprinklerType: "rotor" });
    expect(plan.summary.precipitationRateMeasured).toBe(false);
    expect(plan.summary.precipitationRateDefault).toMatchObject({ basis: "sprinkler_type", minInPerHour: 0.4, maxInPerHour: 0.8, provenance: "from memory" });
    const note = plan.steps.find((s) => s.key === "note:catch_can_test");
    expect(note?.detail).toMatch(/assumes 0\.6 inch an hour, a typical figure for rotor heads \(0\.4–0\.8\)/);
    const warning = plan.warnings.find((w) => w.code === "precipitation_rate_estimated");
    expect(warning?.message).toMatch(/0\.6 inch an hour, a typical figure for rotor heads/);
    expect(warning?.source).toMatch(/Florida IFAS/);
  });

  it("lets a measured rate win over the type's default, with no catch-can invitation", () => {
    const plan = planWith({ kind: "in_ground", zones: 4, sprinklerType: "rotor", precipitationRateInPerHour: 1.5 });
    expect(plan.summary.precipitationRateInPerHour).toBe(1.5);
    expect(plan.summary.precipitationRateDefault).toBeNull();
    expect(plan.steps.some((s) => s.key === "note:catch_can_test")).toBe(false);
    expect(plan.steps.find((s) => s.key === "water:2026-09-11:1")?.minutesPerCycle).toBe(4);
  });
});
