import { describe, expect, it } from "vitest";
import { buildContext } from "../context.ts";
import { addDays } from "../dates.ts";
import { generatePlan } from "../generate.ts";
import { overseedingVisit, valid, withChanges } from "../testing/fixtures.ts";
import type { PlanInputRaw } from "../schemas/plan-input.ts";
import type { PlanStep } from "../types.ts";
import { seasonFeedCutoff } from "./season.ts";

const planFor = (raw: PlanInputRaw = overseedingVisit()) => generatePlan(valid(raw));
const seasonOf = (raw: PlanInputRaw) => planFor(raw).meta.season!;
const water = (steps: readonly PlanStep[]) => steps.filter((s) => s.kind === "water");
const codes = (raw: PlanInputRaw, audience: "crew" | "homeowner") =>
  planFor(raw).warnings.filter((w) => w.audience === audience).map((w) => w.code);

const ryegrass = [{ species: "perennial_ryegrass" as const, percent: 100, purityPct: 98, germinationPct: 90 }];
const bermudaLawn = { grassType: { species: ["bermudagrass" as const] } };
const careOnly = (date: string, services: PlanInputRaw["visit"]["services"] = ["aeration"]) => ({
  date,
  services,
  seedMix: [],
  seedRateLbPer1000: undefined,
  products: [],
});

describe("season check: cool-season seeding", () => {
  it("late summer to early fall is in window: 75 to 30 days before the frost (common practice: late summer to early fall; ≥ 30 days before frost)", () => {
    // Fixture: Sept 10, frost Nov 15 → window Sept 1 – Oct 16.
    const season = seasonOf(overseedingVisit());
    expect(season).toMatchObject({ verdict: "in_window", work: "seeding", family: "cool", period: "fall", firstFrost: "2026-11-15", firstFrostAssumed: false });
    expect(season.window).toEqual({ start: "2026-09-01", end: "2026-10-16" });
  });

  it("under 30 days before an entered frost is late, and the frost warning (not a second one) says so (FROST_RULE, common practice)", () => {
    const raw = withChanges({ visit: { date: "2026-10-20" } });
    expect(seasonOf(raw).verdict).toBe("late");
    expect(codes(raw, "crew")).toContain("frost_too_close");
    expect(codes(raw, "crew")).not.toContain("seeding_late");
  });

  it("without a frost date assumes mid-October in the north (from memory) and says it is assumed", () => {
    const raw = withChanges({ visit: { date: "2026-10-01" }, property: { expectedFirstFrost: undefined } });
    const season = seasonOf(raw);
    expect(season).toMatchObject({ verdict: "late", firstFrost: "2026-10-15", firstFrostAssumed: true });
    expect(codes(raw, "crew")).toEqual(expect.arrayContaining(["seeding_late", "first_frost_assumed"]));
    expect(codes(raw, "homeowner")).toContain("seeding_late");
    expect(codes(raw, "homeowner")).not.toContain("first_frost_assumed");
  });

  it("accepts a frost before the visit: the light waterings stop two weeks after it, with a note (cold soil, common practice)", () => {
    const raw = withChanges({ visit: { date: "2026-11-10" }, property: { expectedFirstFrost: "2026-11-01" } });
    const plan = planFor(raw);
    expect(plan.meta.season?.verdict).toBe("late");
    expect(water(plan.steps).at(-1)?.date).toBe("2026-11-14");
    expect(plan.steps.find((s) => s.key === "note:cold_ground_stop_watering")?.date).toBe("2026-11-15");
    // Only the germination's light cycles run after the frost; no taper or deep watering.
    for (const s of water(plan.steps)) expect(s.phase).toBe("germination");
  });

  it("spring is early: the plan warns about crabgrass preventers and says late summer is better, in plain words for the homeowner", () => {
    const raw = withChanges({ visit: { date: "2026-04-20" } });
    expect(seasonOf(raw)).toMatchObject({ verdict: "early", period: "spring" });
    const plan = planFor(raw);
    const crew = plan.warnings.find((w) => w.code === "spring_seeding" && w.audience === "crew");
    expect(crew?.message).toMatch(/crabgrass preventers stop grass seed/i);
    expect(crew?.message).toMatch(/label allows use at seeding/);
    expect(crew?.provenance).toBe("from memory");
    const homeowner = plan.warnings.find((w) => w.code === "spring_seeding" && w.audience === "homeowner");
    expect(homeowner?.message).toMatch(/crabgrass preventer/);
    expect(homeowner?.message).not.toMatch(/actives|label allows/);
  });

  it("summer is early too: one more light watering a day in the heat (common practice), and a heat warning", () => {
    const raw = withChanges({ visit: { date: "2026-07-01" } });
    expect(seasonOf(raw)).toMatchObject({ verdict: "early", period: "summer" });
    const day1 = planFor(raw).steps.find((s) => s.key === "water:2026-07-02:1");
    // Program default 3 cycles + 1: the 4-cycle default times.
    expect(day1?.times).toEqual(["07:00", "10:30", "13:30", "16:30"]);
    expect(codes(raw, "crew")).toContain("summer_seeding");
    expect(codes(raw, "homeowner")).toContain("summer_seeding");
    // A fall seeding keeps the program's three.
    expect(planFor().steps.find((s) => s.key === "water:2026-09-11:1")?.times).toHaveLength(3);
  });
});

describe("dormant seeding", () => {
  // The case: a December seeding with no frost entered used to water three times a day in December.
  const december = withChanges({ visit: { date: "2026-12-05", services: ["aeration", "overseeding"], products: [] }, property: { expectedFirstFrost: undefined } });

  it("seed on cold soil waits for spring: no water, mowing or feeding until the soil warms (April 1 in the north, from memory)", () => {
    const plan = planFor(december);
    expect(plan.meta.season).toMatchObject({ verdict: "dormant_seeding", period: "winter", sowingStarts: "2027-04-01" });
    for (const s of plan.steps) {
      if (s.kind === "water" || s.kind === "mow" || s.kind === "feed") expect(s.date >= "2027-04-01", s.key).toBe(true);
    }
  });

  it("tells the homeowner there is nothing to water, then starts the light waterings when sprouts are due", () => {
    const plan = planFor(december);
    expect(plan.steps.find((s) => s.key === "note:seed_rests")?.date).toBe("2026-12-05");
    expect(plan.steps.find((s) => s.key === "note:spring_wake_up")?.date).toBe("2027-04-01");
    // Tall fescue shows from day 7 (emergence 7–14 days, from memory): light watering from April 8.
    expect(water(plan.steps)[0]?.date).toBe("2027-04-08");
    // Up by day 14, mowable 7 days later (common practice): first mowing April 22, light watering through it.
    expect(plan.meta.firstMowDate).toBe("2027-04-22");
    expect(plan.meta.germinationWateringEnds! >= "2027-04-22").toBe(true);
    // The starter is spread when the seed starts to grow, not on frozen ground.
    expect(plan.steps.find((s) => s.key === "feed:starter")?.date).toBe("2027-04-01");
    // Measuring the sprinkler waits for spring too.
    expect(plan.steps.find((s) => s.key === "note:catch_can_test")?.date).toBe("2027-04-01");
    const homeowner = plan.warnings.find((w) => w.code === "dormant_seeding" && w.audience === "homeowner");
    expect(homeowner?.message).toMatch(/April 1/);
  });

  it("the crabgrass-preventer hold-off counts from the soil warming, so it covers the spring the seed sprouts in (label intervals 8–16 weeks, from memory)", () => {
    const plan = planFor(december);
    // Program default 112 days after April 1, 2027.
    expect(plan.holdOffs.find((h) => h.kind === "crabgrass_pre_emergent")?.end).toBe(addDays("2027-04-01", 112));
    expect(plan.warnings.find((w) => w.code === "dormant_seeding" && w.audience === "homeowner")?.message).toMatch(/crabgrass preventer/);
  });

  it("photo check-ins count from the soil warming, not from the visit", () => {
    const checkIns = planFor(december).steps.filter((s) => s.kind === "check_in_photo").map((s) => s.date);
    // Tall fescue: first sprouts day 7 and slowest up by day 14 (+3): April 8 and April 18.
    expect(checkIns).toEqual(expect.arrayContaining(["2027-04-08", "2027-04-18"]));
    expect(checkIns.every((d) => d >= "2027-04-01")).toBe(true);
  });

  it("in the south the cold season is the middle of the year: a June seeding near Sydney waits for October 1 (from memory)", () => {
    const season = seasonOf(withChanges({ visit: { date: "2026-06-20" }, property: { timeZone: "Australia/Sydney", expectedFirstFrost: undefined } }));
    expect(season).toMatchObject({ verdict: "dormant_seeding", firstFrost: "2026-04-15", sowingStarts: "2026-10-01" });
  });

  it("a later entered frost means a milder place whose soil warms earlier, by at most 60 days (Sproutline estimate)", () => {
    // Frost Dec 14 = Oct 15 + 60 days → soil warm April 1 − 60 days = January 31.
    const season = seasonOf(withChanges({ visit: { date: "2027-01-10" }, property: { expectedFirstFrost: "2026-12-14" } }));
    expect(season).toMatchObject({ verdict: "dormant_seeding", firstFrost: "2026-12-14", sowingStarts: "2027-01-31" });
  });
});

describe("frost-free places", () => {
  it("Hawaii without a frost date has no cold season: in window, nothing closed", () => {
    const season = seasonOf(withChanges({ visit: { date: "2026-12-05" }, property: { timeZone: "Pacific/Honolulu", expectedFirstFrost: undefined } }));
    expect(season).toMatchObject({ verdict: "in_window", firstFrost: null, period: null, noWatering: [], noFeeding: [] });
  });
});

describe("warm-season lawns", () => {
  it("winter ryegrass on bermudagrass is in window about 3–4 weeks before the frost (Clemson/UGA, from memory), early before", () => {
    const sown = (date: string) => withChanges({ visit: { date, seedMix: ryegrass }, property: bermudaLawn });
    expect(seasonOf(sown("2026-10-20"))).toMatchObject({ verdict: "in_window", work: "winter_overseeding", family: "cool" });
    expect(seasonOf(sown("2026-10-20")).window).toEqual({ start: "2026-10-04", end: "2026-11-01" });
    expect(seasonOf(sown("2026-09-01")).verdict).toBe("early");
    expect(codes(sown("2026-09-01"), "crew")).toContain("winter_overseeding_early");
  });

  it("no nitrogen on a warm-season lawn from six weeks before the frost (from memory): its cut-off is Oct 4 for a Nov 15 frost", () => {
    const raw = withChanges({ visit: careOnly("2026-09-10", ["aeration", "fertiliser_only"]), property: bermudaLawn });
    const season = seasonOf(raw);
    expect(season).toMatchObject({ work: "care", family: "warm", verdict: "in_window" });
    // Until the lawn greens up: May 1 (from memory), 31 days earlier since the entered frost is 31 days after Oct 15.
    expect(season.noFeeding[0]).toEqual({ start: "2026-10-04", end: "2027-03-30" });
  });

  it("nitrogen put down after the cut-off warns the crew", () => {
    const raw = withChanges({
      visit: { ...careOnly("2026-10-20", ["fertiliser_only"]), products: [{ name: "Lawn food 29-0-4", analysis: { n: 29, p: 0, k: 4 }, rateLbPer1000: 3 }] },
      property: bermudaLawn,
    });
    expect(codes(raw, "crew")).toContain("nitrogen_after_cutoff");
  });
});

describe("the feeding cut-off is a post-pass over every feed step", () => {
  const ctx = buildContext(valid(withChanges({ visit: careOnly("2026-09-10", ["aeration", "fertiliser_only"]), property: bermudaLawn })));
  const feed = (key: string, date: string): PlanStep => ({
    key,
    date,
    phase: "establishment",
    kind: "feed",
    title: "Feed",
    detail: "Spread it.",
    why: { text: "Test step.", source: "test", provenance: "common practice" },
    cautions: [],
  });

  it("keeps feedings before the cut-off, drops dated ones after it, and moves a one-off to spring only if the plan still runs then", () => {
    const out = seasonFeedCutoff(ctx, [feed("feed:early", "2026-10-01"), feed("feed:2026-10-10:x", "2026-10-10"), feed("feed:late_one_off", "2026-10-10")]);
    // Plan: 14 recovery + 28 maturing days → ends Oct 22, before the lawn greens up (May 1): the one-off is dropped too.
    expect(out.map((s) => s.key)).toEqual(["feed:early"]);
  });

  it("leaves every other kind of step alone", () => {
    const note: PlanStep = { ...feed("note:x", "2026-12-01"), kind: "note" };
    expect(seasonFeedCutoff(ctx, [note])).toEqual([note]);
  });

  it("a late visit no longer feeds on New Year's Day: the thick lawn's second fall feeding is cut (the issue's case)", () => {
    const raw = withChanges({
      visit: { ...careOnly("2026-11-20", ["fertiliser_only"]), products: [{ name: "Fall 24-0-10", analysis: { n: 24, p: 0, k: 10 }, rateLbPer1000: 2 }] },
      property: { lawnCondition: "thick", expectedFirstFrost: undefined },
    });
    const feeds = planFor(raw).steps.filter((s) => s.kind === "feed");
    expect(feeds).toEqual([]);
  });
});

describe("establishment watering and the frost (issue 12, item 10)", () => {
  it("with no frost entered, no taper or deep watering on or after the assumed Oct 15 frost (from memory)", () => {
    const plan = planFor(withChanges({ property: { expectedFirstFrost: undefined } }));
    const afterFrost = water(plan.steps).filter((s) => s.date >= "2026-10-15");
    expect(afterFrost).toEqual([]);
    expect(plan.steps.find((s) => s.key === "note:frost_stop_watering")?.date).toBe("2026-10-15");
  });

  it("a non-seeding visit after the frost does not start with a watering", () => {
    const plan = planFor(withChanges({ visit: careOnly("2026-10-20", ["fertiliser_only"]), property: { expectedFirstFrost: "2026-10-10" } }));
    expect(water(plan.steps)).toEqual([]);
    expect(addDays("2026-10-10", 14)).toBe(plan.meta.season?.noWatering[0]?.start);
    // Nothing left to water this year, so nothing to measure either.
    expect(plan.steps.some((s) => s.key === "note:catch_can_test")).toBe(false);
  });
});
