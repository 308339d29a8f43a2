import { describe, expect, it } from "vitest";
import { buildCallbackReport, callbackCost, median, monthsBetween, ratePer100, sharePct, type CallbackRow, type SeedingVisitRow } from "./arithmetic.ts";

describe("report arithmetic", () => {
  it("rates callbacks per 100 seeding visits, to one decimal", () => {
    expect(ratePer100(2, 8)).toBe(25); // 2 / 8 × 100
    expect(ratePer100(1, 3)).toBe(33.3); // 33.33… rounds down
    expect(ratePer100(2, 3)).toBe(66.7); // 66.66… rounds up
    expect(ratePer100(0, 5)).toBe(0);
    expect(ratePer100(0, 0)).toBeNull(); // no visits: no rate, rather than 0 or NaN
  });

  it("takes the middle value as the median, and the mean of the two middle ones for an even count", () => {
    expect(median([30, 2, 5])).toBe(5); // sorted 2, 5, 30
    expect(median([2, 5, 30, 40])).toBe(17.5); // (5 + 30) / 2
    expect(median([7])).toBe(7);
    expect(median([])).toBeNull();
  });

  it("gives shares in per cent", () => {
    expect(sharePct(12, 16)).toBe(75);
    expect(sharePct(3, 8)).toBe(37.5);
    expect(sharePct(0, 0)).toBeNull();
  });

  it("prices labour at the company's rate and adds materials; a missing figure is nothing spent yet", () => {
    const callbacks: CallbackRow[] = [
      { id: 1, originVisitId: 1, customerId: 1, reason: "washed_out", labourHours: 2, materialsCost: 30 },
      { id: 2, originVisitId: 2, customerId: 2, reason: "washed_out", labourHours: 1.5, materialsCost: null },
      { id: 3, originVisitId: 3, customerId: 3, reason: "other", labourHours: null, materialsCost: 10 },
    ];
    // labour 3.5 h × $60 = $210; materials $30 + $10 = $40; total $250 over 3 callbacks = $83.33 each
    expect(callbackCost(callbacks, 60)).toEqual({ callbacks: 3, labourHours: 3.5, labourCost: 210, materialsCost: 40, totalCost: 250, averagePerCallback: 83.33 });
    expect(callbackCost([], 60).averagePerCallback).toBeNull();
  });

  it("lists every month of the range, across a year end", () => {
    expect(monthsBetween("2026-11-20", "2027-02-03")).toEqual(["2026-11", "2026-12", "2027-01", "2027-02"]);
    expect(monthsBetween("2026-09-01", "2026-09-30")).toEqual(["2026-09"]);
  });

  it("groups by technician, service, reason and month of the original visit", () => {
    const visit = (id: number, date: string, technicianId: number | null, services: string[]): SeedingVisitRow => ({
      id, visitDate: date, services, technicianId, technicianName: technicianId === null ? null : `Tech ${technicianId}`, customerId: id,
    });
    const visits = [
      visit(1, "2026-09-02", 1, ["aeration", "overseeding"]),
      visit(2, "2026-09-10", 1, ["overseeding"]),
      visit(3, "2026-10-01", 2, ["slit_seeding"]),
      visit(4, "2026-10-05", null, ["overseeding"]),
    ];
    const callbacks: CallbackRow[] = [
      { id: 1, originVisitId: 1, customerId: 1, reason: "under_watering", labourHours: 1, materialsCost: 0 },
      { id: 2, originVisitId: 3, customerId: 3, reason: "under_watering", labourHours: 1, materialsCost: 5 },
      // Its visit is not among the range's seeding visits, so it must not count anywhere.
      { id: 3, originVisitId: 99, customerId: 9, reason: "disease", labourHours: 9, materialsCost: 99 },
    ];
    const report = buildCallbackReport({
      from: "2026-09-01", to: "2026-10-31", labourRatePerHour: 50, visits, callbacks, answerWaits: null,
      plans: [{ customerId: 1, planId: 1, stepsDue: 4, stepsDone: 1 }, { customerId: 2, planId: 2, stepsDue: 10, stepsDone: 9 }],
    });
    expect(report.overall).toEqual({ seedingVisits: 4, callbacks: 2, ratePer100: 50 }); // 2 / 4
    expect(report.byTechnician).toEqual([
      { technicianId: null, technicianName: "Not recorded", seedingVisits: 1, callbacks: 0, ratePer100: 0 },
      { technicianId: 1, technicianName: "Tech 1", seedingVisits: 2, callbacks: 1, ratePer100: 50 },
      { technicianId: 2, technicianName: "Tech 2", seedingVisits: 1, callbacks: 1, ratePer100: 100 },
    ]);
    // overseeding: visits 1, 2, 4 with one callback (visit 1) → 33.3; slit seeding 1 of 1 → 100
    expect(report.byService).toEqual([
      { service: "aeration", seedingVisits: 1, callbacks: 1, ratePer100: 100 },
      { service: "overseeding", seedingVisits: 3, callbacks: 1, ratePer100: 33.3 },
      { service: "slit_seeding", seedingVisits: 1, callbacks: 1, ratePer100: 100 },
    ]);
    // both callbacks are under-watering: 2 per 4 visits; cost 2 h × $50 + $5
    expect(report.byReason).toEqual([{ reason: "under_watering", callbacks: 2, ratePer100: 50, labourHours: 2, totalCost: 105 }]);
    expect(report.byMonth).toEqual([
      { month: "2026-09", seedingVisits: 2, callbacks: 1, ratePer100: 50, totalCost: 50 },
      { month: "2026-10", seedingVisits: 2, callbacks: 1, ratePer100: 50, totalCost: 55 },
    ]);
    expect(report.answerTime).toBeNull();
    expect(report.notes[0]).toMatch(/questions feature/);
    // customer 1 had a callback (1 of 4 steps done); customer 2 did not (9 of 10)
    expect(report.adherence).toEqual([
      { group: "had_callback", customers: 1, plans: 1, stepsDue: 4, stepsDone: 1, sharePct: 25 },
      { group: "no_callback", customers: 1, plans: 1, stepsDue: 10, stepsDone: 9, sharePct: 90 },
    ]);
  });
});
