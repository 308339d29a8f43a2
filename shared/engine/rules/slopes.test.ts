import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { parsePlanInput } from "../schemas/parse.ts";
import type { PlanInput, PlanInputRaw } from "../schemas/plan-input.ts";
import { planInputArb } from "../testing/arbitraries.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import { isRealLocalTime } from "../zone-time.ts";
import { minutesPerDay, splitCycle } from "./slopes.ts";

/*
 * Slopes (TRADE-REFERENCES.md, common practice): cycle-and-soak, several short runs with
 * pauses, to avoid run-off. Run depths (gentle 0.15 in, steep 0.08 in), the 30-minute pause
 * and the cap of 4 runs are Sproutline's choices (tables/slopes.ts); minutes = depth ÷ rate
 * × 60 (derived, TRADE-REFERENCES "Minutes per cycle").
 */
describe("cycle-and-soak on slopes", () => {
  it("splits a cycle into runs no longer than the slope allows, never more minutes in all", () => {
    // Gentle, 1 in/h: runs of at most 0.15 in = 9 min; 30 min → 4 runs of 7 (28 min).
    expect(splitCycle(30, 1, "gentle")).toEqual({ runs: 4, runMinutes: 7 });
    // Gentle, 1 in/h: a 6-minute light cycle already fits in one run.
    expect(splitCycle(6, 1, "gentle")).toEqual({ runs: 1, runMinutes: 6 });
    // Steep, rotors at 0.6 in/h: runs of at most 0.08 in = 8 min; 17 min → 3 runs of 5.
    expect(splitCycle(17, 0.6, "steep")).toEqual({ runs: 3, runMinutes: 5 });
    // Steep, spray heads at 1.75 in/h: at most 2-minute runs, but capped at 4 runs: 17 min → 4 of 4.
    expect(splitCycle(17, 1.75, "steep")).toEqual({ runs: 4, runMinutes: 4 });
  });

  it("rewrites a deep watering: 0.5 in at 1 in/h (30 min) on a gentle slope becomes 4 runs of 7 minutes, 37 minutes apart", () => {
    const plan = generatePlan(valid(withChanges({ visit: { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined }, property: { slope: "gentle" } })));
    const deep = plan.steps.find((s) => s.key === "water:2026-09-10:1")!;
    expect(deep.minutesPerCycle).toBe(7);
    // One watering, so one start: the reminder and calendar event come at 06:00 only.
    expect(deep.cycleAndSoak).toEqual({ runsPerCycle: 4, soakMinutes: 30, minutesBefore: 30, cycleStarts: ["06:00"] });
    // The program's deep-watering start (06:00), then every run + pause (7 + 30 min).
    expect(deep.times).toEqual(["06:00", "06:37", "07:14", "07:51"]);
    expect(deep.title).toBe("Water the lawn deeply today, 4 runs of 7 minutes per zone");
    expect(deep.detail).toMatch(/split each watering into 4 runs of 7 minutes with about 30 minutes' pause between them, instead of 30 minutes in one go/);
    expect(deep.why.source).toMatch(/cycle-and-soak/);
  });

  it("leaves a flat lawn's plan exactly as before", () => {
    const flat = generatePlan(valid(withChanges({})));
    expect(generatePlan(valid(withChanges({ property: { slope: "none" } })))).toEqual({ ...flat, meta: { ...flat.meta, inputHash: expect.any(String) } });
  });

  it("tells the crew how to hold seed or sod on the slope", () => {
    const codes = (raw: PlanInputRaw) => generatePlan(valid(raw)).warnings.filter((w) => w.code.startsWith("slope_")).map((w) => `${w.code}:${w.severity}`);
    expect(codes(withChanges({ property: { slope: "steep" } }))).toEqual(["slope_erosion_control:caution"]);
    expect(codes(withChanges({ property: { slope: "gentle" } }))).toEqual(["slope_erosion_control:info"]);
    expect(codes(withChanges({}))).toEqual([]);
    const sod = withChanges({ visit: { services: ["sod_installation"], seedMix: [], seedRateLbPer1000: undefined, products: [] }, property: { slope: "steep" } });
    expect(codes(sod)).toEqual(["slope_sod_pinning:caution"]);
    expect(generatePlan(valid(withChanges({ property: { slope: "steep" } }))).warnings.find((w) => w.code === "slope_erosion_control")?.message).toMatch(/erosion-control blanket, straw mulch or a hydroseeding tackifier/);
  });

  it("asks for a photo to re-seed washed-out spots the day after heavy rain on a seeded slope", () => {
    const plan = generatePlan(valid(withChanges({ property: { slope: "steep" }, options: { observations: [{ kind: "heavy_rain", date: "2026-09-20" }] } })));
    expect(plan.steps.find((s) => s.key === "check_in_photo:2026-09-21:washout")?.detail).toMatch(/re-seed the washed-out spots/);
    expect(plan.steps.find((s) => s.key === "note:slope_washout_watch")).toBeDefined();
    const flat = generatePlan(valid(withChanges({ options: { observations: [{ kind: "heavy_rain", date: "2026-09-20" }] } })));
    expect(flat.steps.some((s) => s.key.includes("washout"))).toBe(false);
  });
});

const slopedArb = fc
  .tuple(planInputArb, fc.constantFrom("gentle", "steep") as fc.Arbitrary<"gentle" | "steep">, fc.option(fc.double({ min: 0.05, max: 5, noNaN: true }), { nil: undefined }), fc.boolean())
  .map(([generated, slope, rate, sod]): [PlanInput, PlanInput] => {
    // Sod's own watering goes through the same post-pass, so some of the visits are sod installations.
    const raw = sod ? { ...generated, visit: { ...generated.visit, services: ["sod_installation" as const], seedMix: [], seedRateLbPer1000: undefined } } : generated;
    const irrigation = rate === undefined || raw.property.irrigation.kind === "none" ? raw.property.irrigation : { ...raw.property.irrigation, precipitationRateInPerHour: rate };
    const flat = parsePlanInput({ ...raw, property: { ...raw.property, irrigation } });
    const sloped = parsePlanInput({ ...raw, property: { ...raw.property, irrigation, slope } });
    if (!flat.ok || !sloped.ok) throw new Error("arbitrary built an invalid input");
    return [flat.value, sloped.value];
  });

describe("cycle-and-soak (property-based)", { timeout: 30_000 }, () => {
  it("never asks for more watering minutes in a day than the same plan on flat ground, and every run starts at a real, ordered local time", () => {
    fc.assert(
      fc.property(slopedArb, ([flatInput, slopedInput]) => {
        const flat = new Map(generatePlan(flatInput).steps.filter((s) => s.kind === "water").map((s) => [s.key, s]));
        for (const step of generatePlan(slopedInput).steps.filter((s) => s.kind === "water")) {
          const before = flat.get(step.key);
          expect(before).toBeDefined();
          expect(minutesPerDay(step)).toBeLessThanOrEqual(minutesPerDay(before!));
          expect(step.minutesPerCycle!).toBeLessThanOrEqual(before!.minutesPerCycle!);
          const times = step.times ?? [];
          for (let i = 1; i < times.length; i++) expect(times[i - 1]! < times[i]!).toBe(true);
          for (const t of times) expect(isRealLocalTime(step.date, t, slopedInput.property.timeZone)).toBe(true);
        }
      }),
      { numRuns: 120 },
    );
  });
});
