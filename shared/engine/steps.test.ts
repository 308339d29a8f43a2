import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { compareSteps, sortSteps } from "./steps.ts";
import type { PlanStep, StepKind } from "./types.ts";

const KINDS: readonly StepKind[] = ["water", "mow", "feed", "leaf_cleanup", "check_in_photo", "prep_mow", "flag_hazards", "clear_debris", "note"];

const stepArb = fc.record({
  date: fc.oneof(
    fc.integer({ min: 0, max: 60 }).map((d) => new Date(Date.UTC(2026, 8, 1 + d)).toISOString().slice(0, 10)),
    // Years before 1000 and other odd-but-valid texts must still sort as strings do.
    fc.constantFrom("0999-12-31", "1000-01-01", "9999-12-31"),
  ),
  kind: fc.constantFrom(...KINDS),
  key: fc.constantFrom("water:a", "water:b", "mow:a", "feed:starter", "note:rain", "x"),
  tag: fc.nat(),
});

const asSteps = (records: readonly { date: string; kind: StepKind; key: string; tag: number }[]): PlanStep[] =>
  records.map((r) => ({ ...r, phase: "germination", title: "", detail: "", why: { text: "", source: "", provenance: "published" }, cautions: [] }) as PlanStep);

describe("step order", () => {
  it("is the comparator's stable order (date, kind, key, then input order) for any list", () => {
    fc.assert(
      fc.property(fc.array(stepArb, { maxLength: 120 }), (records) => {
        const steps = asSteps(records);
        // Reference: Array.prototype.sort is stable, so ties keep input order.
        const expected = [...steps].sort(compareSteps);
        expect(sortSteps([...steps])).toEqual(expected);
        expect(sortSteps([...steps]).map((s) => s)).toStrictEqual(expected);
      }),
      { numRuns: 300 },
    );
  });

  it("keeps input order among steps equal in date, kind and key", () => {
    const steps = asSteps([
      { date: "2026-09-02", kind: "water", key: "water:x", tag: 1 },
      { date: "2026-09-01", kind: "mow", key: "mow:x", tag: 2 },
      { date: "2026-09-02", kind: "water", key: "water:x", tag: 3 },
      { date: "2026-09-02", kind: "note", key: "note:x", tag: 4 },
    ]);
    expect(sortSteps(steps).map((s) => (s as unknown as { tag: number }).tag)).toEqual([2, 4, 1, 3]);
  });

  it("still sorts dates that are not YYYY-MM-DD, as text", () => {
    const steps = asSteps([
      { date: "2026-9-10", kind: "water", key: "a", tag: 1 },
      { date: "2026-09-10", kind: "water", key: "a", tag: 2 },
    ]);
    expect(sortSteps(steps).map((s) => s.date)).toEqual(["2026-09-10", "2026-9-10"]);
  });
});
