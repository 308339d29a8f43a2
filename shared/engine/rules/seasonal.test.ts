import { describe, expect, it } from "vitest";
import { generatePlan } from "../generate.ts";
import { valid, withChanges } from "../testing/fixtures.ts";

const leafDates = (raw: Parameters<typeof valid>[0]) => generatePlan(valid(raw)).steps.filter((s) => s.kind === "leaf_cleanup").map((s) => s.date);

describe("leaf clean-up follows the plan's dates, not the visit's month (leaf season: common practice)", () => {
  it("a late-August visit whose plan runs into autumn gets weekly clean-up from September on", () => {
    const dates = leafDates(withChanges({ visit: { date: "2026-08-20" }, property: { expectedFirstFrost: "2026-11-20" } }));
    expect(dates[0]).toBe("2026-09-03");
    expect(dates.every((d) => d >= "2026-09-01" && d <= "2026-12-15")).toBe(true);
    expect(dates.length).toBeGreaterThan(4);
  });

  it("stops at the end of the leaf season (December 15 in the north)", () => {
    const dates = leafDates(withChanges({ visit: { date: "2026-11-01" }, property: { expectedFirstFrost: "2026-12-20" } }));
    expect(dates.at(-1)).toBe("2026-12-13");
  });

  it("uses the southern leaf season (March to mid-June) below the equator", () => {
    const dates = leafDates(withChanges({ visit: { date: "2026-02-20" }, property: { timeZone: "Australia/Sydney", expectedFirstFrost: undefined } }));
    expect(dates[0]).toBe("2026-03-06");
    expect(dates.every((d) => d >= "2026-03-01" && d <= "2026-06-15")).toBe(true);
  });

  it("adds none to a plan that ends before autumn", () => {
    expect(leafDates(withChanges({ visit: { date: "2026-04-10" }, property: { expectedFirstFrost: undefined } }))).toEqual([]);
  });
});
