import { describe, expect, it } from "vitest";
import { pureLiveSeed } from "../calculators/seed.ts";
import { addDays, daysBetween } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import { overseedingVisit, valid, withChanges } from "./testing/fixtures.ts";
import type { PlanStep } from "./types.ts";

const planFor = (raw = overseedingVisit()) => generatePlan(valid(raw));
const ofKind = (steps: readonly PlanStep[], kind: PlanStep["kind"]) => steps.filter((s) => s.kind === kind);

describe("germination watering", () => {
  it("waters 3 times a day at 07:00, 12:00, 16:00 for 6 minutes at the default 1 in/h (0.1 in ÷ 1.0 in/h × 60, derived)", () => {
    const day1 = planFor().steps.find((s) => s.key === "water:2026-09-11:1");
    expect(day1?.title).toBe("Water 3 times today, 6 minutes per zone");
    expect(day1?.times).toEqual(["07:00", "12:00", "16:00"]);
    expect(day1?.minutesPerCycle).toBe(6);
    expect(day1?.phase).toBe("germination");
  });

  it("uses the measured precipitation rate: 0.1 in at 1.5 in/h is 4 minutes, and then asks for no catch-can test", () => {
    const plan = planFor(withChanges({ property: { irrigation: { kind: "in_ground", zones: 4, precipitationRateInPerHour: 1.5 } } }));
    expect(plan.steps.find((s) => s.key === "water:2026-09-11:1")?.minutesPerCycle).toBe(4);
    expect(plan.steps.some((s) => s.key === "note:catch_can_test")).toBe(false);
  });

  it("asks once for a catch-can test when the rate is unknown", () => {
    expect(planFor().steps.filter((s) => s.key === "note:catch_can_test")).toHaveLength(1);
  });

  it("keeps light watering every day for at least 14 days and through the first mowing (Nebraska Extension 2021; 2-week minimum common practice)", () => {
    const plan = planFor();
    const lightDays = plan.steps.filter((s) => s.kind === "water" && (s.times?.length ?? 0) >= 2);
    expect(lightDays.length).toBeGreaterThanOrEqual(14);
    // Tall fescue: up by day 14 at the latest, mowable 7 days later (common practice) → first mowing on day 21.
    expect(plan.meta.firstMowDate).toBe("2026-10-01");
    expect(plan.meta.germinationWateringEnds).toBe("2026-10-01");
  });

  it("keeps light watering until Kentucky bluegrass (emergence up to 30 days, from memory) is up and mowable when it is in the mix", () => {
    const raw = withChanges({
      visit: {
        seedMix: [
          { species: "tall_fescue", percent: 90, purityPct: 98, germinationPct: 90 },
          { species: "kentucky_bluegrass", percent: 10, purityPct: 97, germinationPct: 85 },
        ],
      },
    });
    // Up by day 30, mowable 7 days later: light watering through day 37.
    expect(planFor(raw).meta.germinationWateringEnds).toBe(addDays("2026-09-10", 37));
  });

  it("after the first mowing tapers: a week once a day, a week every other day (taper steps common practice)", () => {
    const plan = planFor();
    const water = plan.steps.filter((s) => s.kind === "water" && s.phase === "establishment");
    const days = water.map((s) => daysBetween("2026-09-10", s.date));
    expect(days.filter((d) => d >= 22 && d <= 28)).toEqual([22, 23, 24, 25, 26, 27, 28]);
    expect(days.filter((d) => d >= 29 && d <= 35)).toEqual([29, 31, 33, 35]);
    const onceADay = water.find((s) => s.date === "2026-10-02");
    expect(onceADay?.title).toBe("From today, water once a day: 9 minutes per zone");
    expect(onceADay?.times).toEqual(["06:00"]);
    // About 1 in a week (common practice) over 7 waterings: 1/7 in ÷ 1.0 in/h × 60 ≈ 8.6 → 9 minutes.
    expect(onceADay?.minutesPerCycle).toBe(9);
    // Over 3.5 waterings a week: 2/7 in ÷ 1.0 in/h × 60 ≈ 17.1 → 17 minutes.
    expect(water.find((s) => s.date === "2026-10-09")?.minutesPerCycle).toBe(17);
  });

  it("then switches to 2–3 deep waterings a week that add up to about 1 inch (Nebraska Extension 2021; 1 in a week common practice)", () => {
    const plan = planFor();
    const establishment = plan.steps.filter((s) => s.kind === "water" && s.phase === "establishment");
    const firstWeek = establishment.filter((s) => s.date >= "2026-10-16" && daysBetween("2026-10-16", s.date) < 7);
    expect(firstWeek.length).toBeGreaterThanOrEqual(2);
    expect(firstWeek.length).toBeLessThanOrEqual(3);
    expect(firstWeek[0]?.title).toBe("Switch to deep watering: 20 minutes per zone today");
    expect(firstWeek[0]?.minutesPerCycle).toBe(20); // 1 in ÷ 3 waterings ÷ 1.0 in/h × 60
    const weeklyMinutes = firstWeek.reduce((sum, s) => sum + (s.minutesPerCycle ?? 0), 0);
    expect(weeklyMinutes).toBe(60); // 60 minutes at 1.0 in/h = 1 inch
    expect(firstWeek[0]?.detail).toMatch(/about 0\.33 inch .*about 1 inch a week in all/);
  });

  it("keeps maturing waterings to about 1 inch a week too, and never deeper than the program's deep-watering depth", () => {
    // A mild place (frost in late December), so the maturing weeks are not cut short by the frost.
    const plan = planFor(withChanges({ property: { expectedFirstFrost: "2026-12-20" }, program: { maturingWateringsPerWeek: 2 } }));
    const maturing = plan.steps.filter((s) => s.kind === "water" && s.phase === "maturing");
    expect(maturing.length).toBeGreaterThan(0);
    for (const s of maturing) expect(s.minutesPerCycle).toBe(30); // 1 in ÷ 2 = 0.5 in (the default depth) → 30 minutes at 1 in/h
    const shallow = planFor(withChanges({ property: { expectedFirstFrost: "2026-12-20" }, program: { maturingWateringsPerWeek: 1, deepWateringDepthIn: 0.75 } }));
    const shallowMaturing = shallow.steps.filter((s) => s.kind === "water" && s.phase === "maturing");
    expect(shallowMaturing.length).toBeGreaterThan(0);
    for (const s of shallowMaturing) expect(s.minutesPerCycle).toBe(45);
  });

  it("turns a heavy-rain day's watering into a skip note and leaves the next day alone", () => {
    const plan = planFor(withChanges({ options: { observations: [{ kind: "heavy_rain", date: "2026-09-15" }] } }));
    const onRainDay = plan.steps.filter((s) => s.date === "2026-09-15");
    expect(onRainDay.some((s) => s.kind === "water")).toBe(false);
    expect(onRainDay.find((s) => s.kind === "note")?.title).toMatch(/rain did the job/);
    expect(plan.steps.some((s) => s.key === "water:2026-09-16:1")).toBe(true);
  });

  it("speaks of sprinkler spots for hose-end sprinklers and of hand watering without one", () => {
    const hose = planFor(withChanges({ property: { irrigation: { kind: "hose_end" } } }));
    expect(hose.steps.find((s) => s.key === "water:2026-09-11:1")?.title).toMatch(/each spot you move the sprinkler to/);
    const none = planFor(withChanges({ property: { irrigation: { kind: "none" } } }));
    expect(none.steps.find((s) => s.key === "water:2026-09-11:1")?.title).toBe("Water the seeded areas lightly 3 times today");
  });
});

describe("mowing new grass", () => {
  it("first mow is after day 14 and after tall fescue can be up and growing (14 + 7 days), at the highest setting", () => {
    const plan = planFor();
    const firstMow = ofKind(plan.steps, "mow")[0];
    expect(firstMow?.date).toBe("2026-10-01");
    expect(firstMow?.heightIn).toBe(4);
    expect(plan.meta.firstMowDate).toBe(firstMow?.date);
  });

  it("then steps down one mower setting a week to the usual height (common practice)", () => {
    const raw = withChanges({ property: { currentMowingHeightIn: 3, mowerHighestSettingIn: 4, mowerSettingStepIn: 0.5 } });
    const heights = ofKind(planFor(raw).steps, "mow").map((s) => s.heightIn);
    expect(heights.slice(0, 4)).toEqual([4, 3.5, 3, 3]);
  });

  it("keeps a fast ryegrass-only seeding's first mow at the program minimum of 14 days or later", () => {
    const raw = withChanges({
      visit: { seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 2.5 },
    });
    const first = ofKind(planFor(raw).steps, "mow")[0];
    expect(daysBetween("2026-09-10", first?.date ?? "")).toBeGreaterThanOrEqual(14);
  });
});

describe("feeding and hold-offs", () => {
  it("adds a starter-fertiliser step when seed went down without one (Nebraska Extension 2021)", () => {
    const raw = withChanges({ visit: { services: ["aeration", "overseeding"], products: [] } });
    const starter = planFor(raw).steps.find((s) => s.key === "feed:starter");
    expect(starter?.date).toBe("2026-09-11");
    expect(starter?.cautions).toEqual(expect.arrayContaining(["label_is_law", "phosphorus_rules"]));
  });

  it("skips the starter step when a phosphorus-rich product went down at the visit", () => {
    const raw = withChanges({ visit: { services: ["aeration", "overseeding"] } });
    expect(planFor(raw).steps.some((s) => s.key === "feed:starter")).toBe(false);
  });

  it("holds off weed-and-feed for the program's days or until the third mowing, whichever is later", () => {
    const plan = planFor();
    const weedAndFeed = plan.holdOffs.find((h) => h.kind === "weed_and_feed");
    const thirdMow = ofKind(plan.steps, "mow")[2]?.date ?? "";
    expect(weedAndFeed?.end).toBe([addDays("2026-09-10", 60), thirdMow].sort().at(-1));
    expect(plan.holdOffs.map((h) => h.kind)).toEqual([
      "weed_and_feed",
      "broadleaf_herbicide",
      "crabgrass_pre_emergent",
      "high_n_quick_release",
      "heavy_traffic",
    ]);
  });

  it("schedules the follow-up feed the day after the high-N hold-off ends, and it is never quick-release", () => {
    const plan = planFor();
    const highN = plan.holdOffs.find((h) => h.kind === "high_n_quick_release");
    const followUp = plan.steps.find((s) => s.key === "feed:follow_up");
    expect(followUp?.date).toBe(addDays(highN?.end ?? "", 1));
    expect(followUp?.feed?.highNQuickRelease).toBe(false);
  });

  it("a visit with no seed has no hold-offs", () => {
    const raw = withChanges({ visit: { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined } });
    expect(planFor(raw).holdOffs).toEqual([]);
  });
});

describe("first frost", () => {
  it("stops regular watering at the expected first frost once the seedlings are past establishment", () => {
    // Light watering through the first mowing (day 21) + 28 establishment → maturing from 2026-10-04.
    const raw = withChanges({ visit: { date: "2026-08-15" }, property: { expectedFirstFrost: "2026-10-10" } });
    const plan = planFor(raw);
    expect(plan.steps.find((s) => s.key === "note:frost_stop_watering")?.date).toBe("2026-10-10");
    expect(plan.steps.filter((s) => s.kind === "water" && s.date >= "2026-10-10")).toEqual([]);
    expect(plan.meta.planEnds > "2026-10-10").toBe(true);
  });

  it("stops establishment watering (taper and deep) at the expected first frost, and says so (common practice)", () => {
    const plan = planFor(withChanges({ property: { expectedFirstFrost: "2026-10-20" } }));
    expect(plan.meta.germinationWateringEnds).toBe("2026-10-01");
    expect(plan.steps.filter((s) => s.kind === "water" && s.date >= "2026-10-20")).toEqual([]);
    // Deep waterings from 10-16 on days 0, 2, 4 of each week: 10-16, 10-18, then 10-20 falls on the frost.
    expect(plan.steps.filter((s) => s.kind === "water" && s.date >= "2026-10-16").map((s) => s.date)).toEqual(["2026-10-16", "2026-10-18"]);
    expect(plan.steps.find((s) => s.key === "note:frost_stop_watering")?.date).toBe("2026-10-20");
  });
});

describe("seasonal steps and check-ins", () => {
  it("adds weekly leaf clean-up for a September visit but not for a May one (northern hemisphere)", () => {
    expect(ofKind(planFor().steps, "leaf_cleanup").length).toBeGreaterThan(4);
    const may = withChanges({ visit: { date: "2026-05-10" }, property: { expectedFirstFrost: "2026-10-20" } });
    expect(ofKind(planFor(may).steps, "leaf_cleanup")).toEqual([]);
  });

  it("places photo check-ins at the first expected sprouts (day 7 for tall fescue) and after the slowest (day 17)", () => {
    const days = ofKind(planFor().steps, "check_in_photo").map((s) => daysBetween("2026-09-10", s.date));
    expect(days).toEqual(expect.arrayContaining([7, 17]));
  });

  it("lists the full text of every caution the plan uses", () => {
    const plan = planFor();
    const used = new Set([...plan.steps, ...plan.prepSteps, ...plan.holdOffs].flatMap((s) => s.cautions));
    expect(new Set(plan.cautions.map((c) => c.id))).toEqual(used);
    expect(plan.cautions.find((c) => c.id === "label_is_law")?.text).toMatch(/label is the law/);
  });
});

describe("calculator summary", () => {
  it("reports PLS, bulk seed and N-P-K delivered for the visit", () => {
    const { summary } = planFor();
    expect(summary.seed?.plsFraction).toBeCloseTo(pureLiveSeed(98, 90), 12);
    expect(summary.seed?.bulkSeedLb).toBeCloseTo(30, 12); // 5 lb/1,000 ft² × 6,000 ft²
    expect(summary.nutrientsPer1000.p).toBeCloseTo(0.96, 12); // 4 lb × 24 %
    expect(summary.products[0]?.totalLb).toBeCloseTo(24, 12);
  });

  it("gives seeds per ft² only when every species' seed count is published (Cornell: ryegrass ≈250,000/lb)", () => {
    const ryegrass = withChanges({
      visit: { seedMix: [{ species: "perennial_ryegrass", percent: 100, purityPct: 98, germinationPct: 90 }], seedRateLbPer1000: 4 },
    });
    expect(planFor(ryegrass).summary.seed?.seedsPerSqFt).toBeCloseTo(1000, 9);
    expect(planFor().summary.seed?.seedsPerSqFt).toBeNull();
  });
});
