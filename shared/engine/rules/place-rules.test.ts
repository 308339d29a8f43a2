import { describe, expect, it } from "vitest";
import { toDayNumber } from "../dates.ts";
import { generatePlan, visitWarnings } from "../generate.ts";
import { hashInput } from "../hash.ts";
import type { PlaceRulesInput } from "../schemas/place-rules.ts";
import type { PlanInputRaw } from "../schemas/plan-input.ts";
import { FEED_DELAY_LIMIT_DAYS } from "../tables/place-rules.ts";
import { TAPER_RULE } from "../tables/watering.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import type { Plan } from "../types.ts";
import { inFertilizerBlackout, weekdayOfDayNumber } from "./place-rules.ts";

/*
 * The rules here are made-up examples of what a company might enter, not any real place's law:
 * the engine applies what it is given. Check values are calendar facts or follow from the rule.
 */
const withRules = (raw: PlanInputRaw, placeRules: PlaceRulesInput): PlanInputRaw => ({ ...raw, placeRules });
const plan = (raw: PlanInputRaw): Plan => generatePlan(valid(raw));
const weekday = (date: string) => weekdayOfDayNumber(toDayNumber(date));

/** The fixture's overseeding without the starter bought at the visit, so the plan schedules its own starter feed. */
const seedingWithoutStarter = () => withChanges({ visit: { services: ["aeration", "overseeding"], products: [] } });
const feedingVisit = (products: NonNullable<PlanInputRaw["visit"]["products"]>, date = "2026-09-10") =>
  withChanges({ visit: { date, services: ["fertiliser_only"], seedMix: [], seedRateLbPer1000: undefined, products }, property: { expectedFirstFrost: undefined } });

describe("fertilizer blackout windows", () => {
  it("include both ends and run over New Year when the end comes first (calendar facts)", () => {
    const winter = [{ from: "11-15", to: "03-01" }];
    expect(inFertilizerBlackout(winter, "2026-11-14")).toBe(false);
    expect(inFertilizerBlackout(winter, "2026-11-15")).toBe(true);
    expect(inFertilizerBlackout(winter, "2026-12-31")).toBe(true);
    expect(inFertilizerBlackout(winter, "2027-01-01")).toBe(true);
    expect(inFertilizerBlackout(winter, "2027-03-01")).toBe(true);
    expect(inFertilizerBlackout(winter, "2027-03-02")).toBe(false);
    // A window entered as ending February 28 leaves February 29 of a leap year outside it.
    expect(inFertilizerBlackout([{ from: "12-01", to: "02-28" }], "2028-02-29")).toBe(false);
    expect(inFertilizerBlackout([{ from: "12-01", to: "02-29" }], "2028-02-29")).toBe(true);
    expect(inFertilizerBlackout([{ from: "06-01", to: "09-30" }], "2026-07-04")).toBe(true);
    expect(inFertilizerBlackout([{ from: "06-01", to: "09-30" }], "2026-10-01")).toBe(false);
  });

  it("weekdays: 2026-09-10 is a Thursday, 2026-12-05 a Saturday (calendar)", () => {
    expect(weekday("2026-09-10")).toBe(4);
    expect(weekday("2026-12-05")).toBe(6);
    expect(weekday("1970-01-01")).toBe(4);
  });

  it("moves a feeding inside a blackout to the first day after it when the wait is short", () => {
    const without = plan(seedingWithoutStarter());
    expect(without.steps.find((s) => s.key === "feed:starter")?.date).toBe("2026-09-11");
    const moved = plan(withRules(seedingWithoutStarter(), { name: "Example County", fertilizerBlackouts: [{ from: "09-01", to: "09-20" }] }));
    const starter = moved.steps.find((s) => s.key === "feed:starter");
    // First day after the window: September 21, a 10-day wait, within the starter's limit.
    expect(FEED_DELAY_LIMIT_DAYS.starter).toBeGreaterThanOrEqual(10);
    expect(starter?.date).toBe("2026-09-21");
    expect(starter?.detail).toMatch(/Moved from September 11: Example County allows no fertilizer from September 1 to September 20\./);
    expect(starter?.cautions).toContain("local_ordinances");
    expect(moved.cautions.map((c) => c.id)).toContain("local_ordinances");
  });

  it("leaves a feeding out, with a note saying why, when the blackout lasts past the point it helps", () => {
    const dropped = plan(withRules(seedingWithoutStarter(), { name: "Example County", fertilizerBlackouts: [{ from: "09-01", to: "10-31" }] }));
    expect(dropped.steps.find((s) => s.key === "feed:starter")).toBeUndefined();
    // The later follow-up feeding (October 23) waits 9 days, to November 1, within its limit.
    expect(dropped.steps.find((s) => s.key === "feed:follow_up")?.date).toBe("2026-11-01");
    const note = dropped.steps.find((s) => s.key === "note:no_feed_feed_starter");
    expect(note?.date).toBe("2026-09-11");
    expect(note?.detail).toMatch(/Example County allows no fertilizer from September 1 to October 31/);
  });

  it("waits up to 30 days for other feedings, within the plan: the follow-up feeding of October 23", () => {
    const base = plan(seedingWithoutStarter());
    expect(base.steps.find((s) => s.key === "feed:follow_up")?.date).toBe("2026-10-23");
    expect(base.meta.planEnds >= "2026-11-23").toBe(true);
    expect(FEED_DELAY_LIMIT_DAYS.other).toBe(30);
    // Window ends November 21: November 22 is 30 days on, the longest wait allowed.
    const edge = plan(withRules(seedingWithoutStarter(), { name: "Example County", fertilizerBlackouts: [{ from: "10-20", to: "11-21" }] }));
    expect(edge.steps.find((s) => s.key === "feed:follow_up")?.date).toBe("2026-11-22");
    // One day longer: November 23 is still inside the plan, but 31 days on.
    const over = plan(withRules(seedingWithoutStarter(), { name: "Example County", fertilizerBlackouts: [{ from: "10-20", to: "11-22" }] }));
    expect(over.steps.find((s) => s.key === "feed:follow_up")).toBeUndefined();
    expect(over.steps.find((s) => s.key === "note:no_feed_feed_follow_up")?.date).toBe("2026-10-23");
  });

  it("leaves out a feeding on the plan's last day that falls in a blackout: the plan has no later day", () => {
    // A thick cool-season lawn fed lightly on September 10 gets the fall feeding program; its last feeding, 6 weeks after the first (AUTUMN_FEEDING_N), is the plan's last day.
    const thick = withChanges({ property: { lawnCondition: "thick" } }, feedingVisit([{ name: "Lawn food 24-0-6", analysis: { n: 24, p: 0, k: 6 }, rateLbPer1000: 2 }]));
    const base = plan(thick);
    expect(base.steps.find((s) => s.key === "feed:fall_program_2")?.date).toBe("2026-10-22");
    expect(base.meta.planEnds).toBe("2026-10-22");
    const blocked = plan(withRules(thick, { name: "Example County", fertilizerBlackouts: [{ from: "10-20", to: "10-31" }] }));
    expect(blocked.steps.some((s) => s.key === "feed:fall_program_2")).toBe(false);
    expect(blocked.steps.find((s) => s.key === "note:no_feed_feed_fall_program_2")?.date).toBe("2026-10-22");
  });

  it("moves a feeding out of a window that runs over New Year", () => {
    // A December seeding in the north now waits for spring (season check), so this one is near Sydney, where December is summer.
    const december = withChanges({
      visit: { date: "2026-12-20", services: ["overseeding"], products: [] },
      property: { expectedFirstFrost: undefined, timeZone: "Australia/Sydney" },
    });
    expect(plan(december).steps.find((s) => s.key === "feed:starter")?.date).toBe("2026-12-21");
    const moved = plan(withRules(december, { name: "Example State", fertilizerBlackouts: [{ from: "12-15", to: "01-02" }] }));
    // First day after January 2: January 3, 2027, a 13-day wait.
    expect(moved.steps.find((s) => s.key === "feed:starter")?.date).toBe("2027-01-03");
  });

  it("warns the crew when fertilizer went down on a blackout date", () => {
    const raw = withRules(feedingVisit([{ name: "Lawn food 24-0-6", analysis: { n: 24, p: 0, k: 6 }, rateLbPer1000: 3 }], "2026-12-05"), {
      name: "Example State",
      fertilizerBlackouts: [{ from: "11-15", to: "03-01" }],
    });
    const warning = visitWarnings(valid(raw)).find((w) => w.code === "fertilizer_in_blackout");
    expect(warning).toMatchObject({ audience: "crew", severity: "risk" });
    expect(warning?.message).toMatch(/November 15 to March 1/);
    expect(plan(raw).warnings.filter((w) => w.code === "fertilizer_in_blackout").map((w) => w.audience)).toEqual(["crew"]);
  });
});

describe("phosphorus only with a reason", () => {
  const rules: PlaceRulesInput = { name: "Example Lake County", phosphorus: "needs_reason" };
  const withP = [{ name: "Balanced 10-10-10", analysis: { n: 10, p: 10, k: 10 }, rateLbPer1000: 5 }];
  const code = "phosphorus_without_reason";

  it("warns the crew about a phosphorus product on an established lawn with no soil test", () => {
    const warnings = plan(withRules(feedingVisit(withP), rules)).warnings.filter((w) => w.code === code);
    expect(warnings.map((w) => [w.audience, w.severity])).toEqual([["crew", "risk"]]);
    expect(warnings[0]?.message).toMatch(/Balanced 10-10-10/);
  });

  it("accepts a soil test, seed sown at the visit, a product without phosphorus, or a place that allows it", () => {
    expect(plan(withRules(withChanges({ visit: { soilTestCallsForPhosphorus: true } }, feedingVisit(withP)), rules)).warnings.some((w) => w.code === code)).toBe(false);
    expect(plan(withRules(withChanges({}), rules)).warnings.some((w) => w.code === code)).toBe(false);
    const noP = [{ name: "Lawn food 24-0-6", analysis: { n: 24, p: 0, k: 6 }, rateLbPer1000: 3 }];
    expect(plan(withRules(feedingVisit(noP), rules)).warnings.some((w) => w.code === code)).toBe(false);
    expect(plan(withRules(feedingVisit(withP), { ...rules, phosphorus: "allowed" })).warnings.some((w) => w.code === code)).toBe(false);
  });
});

describe("watering days", () => {
  // Monday, Wednesday and Saturday, an example of an alternate-day schedule.
  const allowed = [1, 3, 6];

  it("moves every deep watering of an established lawn to an allowed day, never two on one day", () => {
    const raw = withChanges({ visit: { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined, products: [] } });
    const before = plan(raw).steps.filter((s) => s.kind === "water");
    const after = plan(withRules(raw, { name: "Example Water District", watering: { allowedWeekdays: allowed } })).steps.filter((s) => s.kind === "water");
    expect(before.some((s) => !allowed.includes(weekday(s.date)))).toBe(true);
    expect(after.length).toBeGreaterThan(0);
    for (const s of after) expect(allowed).toContain(weekday(s.date));
    expect(new Set(after.map((s) => s.date)).size).toBe(after.length);
    expect(new Set(after.map((s) => s.key)).size).toBe(after.length);
    for (const s of after) expect(s.key).toBe(`water:${s.date}:1`);
    expect(after.find((s) => s.detail.includes("Moved to a day Example Water District allows watering (Monday, Wednesday and Saturday)"))).toBeDefined();
  });

  it("keeps new seed watered daily and tells the crew and the homeowner when no exemption covers it", () => {
    const base = plan(withChanges({}));
    const restricted = plan(withRules(withChanges({}), { name: "Example Water District", watering: { allowedWeekdays: allowed } }));
    const germinationEnd = toDayNumber(base.meta.germinationWateringEnds ?? "") - toDayNumber("2026-09-10");
    const lightDays = (p: Plan) => p.steps.filter((s) => s.kind === "water" && toDayNumber(s.date) - toDayNumber("2026-09-10") <= germinationEnd).length;
    expect(lightDays(restricted)).toBe(lightDays(base));
    const found = restricted.warnings.filter((w) => w.code === "watering_days_limit_new_lawn");
    expect(found.map((w) => w.audience)).toEqual(["crew", "homeowner"]);
    expect(found[1]?.message).toMatch(/only on Monday, Wednesday and Saturday/);
    expect(found[1]?.message).not.toMatch(/Example Water District/);
    // Established watering after the taper still keeps to the allowed days.
    const newLawnLast = germinationEnd + TAPER_RULE.onceADayDays + TAPER_RULE.everyOtherDayDays;
    for (const s of restricted.steps) {
      if (s.kind === "water" && toDayNumber(s.date) - toDayNumber("2026-09-10") > newLawnLast) expect(allowed).toContain(weekday(s.date));
    }
  });

  it("says nothing about new seed when the place's new-lawn exemption covers the whole of its daily watering", () => {
    const covered = plan(withRules(withChanges({}), { name: "Example Water District", watering: { allowedWeekdays: allowed, newLawnExemptDays: 90 } }));
    expect(covered.warnings.some((w) => w.code === "watering_days_limit_new_lawn")).toBe(false);
  });
});

describe("a place without restrictions", () => {
  it("changes no step, but the rules are part of the input hash", () => {
    const bare = plan(withChanges({}));
    const open = plan(withRules(withChanges({}), { name: "Example Town" }));
    expect(open.steps).toEqual(bare.steps);
    expect(open.warnings).toEqual(bare.warnings);
    expect(hashInput(valid(withRules(withChanges({}), { name: "Example Town" })))).not.toBe(hashInput(valid(withChanges({}))));
  });
});
