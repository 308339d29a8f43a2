import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays } from "../dates.ts";
import { generatePlan, visitWarnings } from "../generate.ts";
import { violatesHoldOff } from "./hold-offs.ts";
import { PRE_EMERGENT_INGREDIENTS, PRIOR_PRE_EMERGENT_PRODUCTS } from "../tables/pre-emergent.ts";
import { parsePlanInput } from "../schemas/parse.ts";
import { valid, withChanges } from "../testing/fixtures.ts";
import type { PlanWarning } from "../types.ts";

type Prior = NonNullable<Parameters<typeof withChanges>[0]["visit"]>["priorPreEmergent"];
/** The fixture: tall fescue overseeded on 2026-09-10, first mowing on day 21, plan to 2026-11-26. */
const planWith = (priorPreEmergent: Prior, visit: Parameters<typeof withChanges>[0]["visit"] = {}) =>
  generatePlan(valid(withChanges({ visit: { priorPreEmergent, ...visit } })));
const find = (warnings: readonly PlanWarning[], code: string, audience: PlanWarning["audience"]) =>
  warnings.find((w) => w.code === code && w.audience === audience);

describe("a pre-emergent put down before the seeding", () => {
  it("6 weeks before: inside the crabgrass preventer's 8–16 week label interval (TRADE-REFERENCES, from memory), so the crew is told to expect seed failure", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-07-30" });
    const crew = find(plan.warnings, "pre_emergent_before_seeding", "crew");
    expect(crew?.severity).toBe("risk");
    expect(crew?.message).toBe(
      "A crabgrass preventer went down 6 weeks before this seeding, inside the usual 8–16-week label interval: expect much of the seed to fail. Check the label; re-seed bare spots once its interval has passed.",
    );
    expect(crew?.provenance).toBe("from memory");
    expect(crew?.source).toMatch(/label/);
  });

  it("tells the homeowner what to expect and what to do, in plain words, with the same source", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-07-30" });
    const homeowner = find(plan.warnings, "pre_emergent_before_seeding", "homeowner");
    expect(homeowner?.message).toMatch(/^The crabgrass preventer put down on your lawn before the seeding may keep some of the new seed from sprouting/);
    expect(homeowner?.message).toMatch(/photo/);
    expect(homeowner?.message).not.toMatch(/interval|label|weeks|crew/);
    expect(homeowner?.source).toBe(find(plan.warnings, "pre_emergent_before_seeding", "crew")?.source);
  });

  it("holds off more seed from the day it went down until its 16-week interval ends (from memory), then says re-seeding is allowed", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-07-30" });
    const hold = plan.holdOffs.find((h) => h.kind === "new_seed");
    // 16 weeks = 112 days from 2026-07-30: the last held day is 2026-11-18.
    expect(hold).toMatchObject({ start: "2026-07-30", end: "2026-11-18", provenance: "from memory" });
    expect(hold?.cautions).toContain("label_is_law");
    expect(plan.cautions.map((c) => c.id)).toContain("label_is_law");
    const note = plan.steps.find((s) => s.key === "note:new_seed_allowed");
    expect(note?.date).toBe("2026-11-19");
    expect(note?.restrictedBy).toEqual(["new_seed"]);
  });

  it("keeps the after-seeding hold-offs as they were: they start on the seeding day", () => {
    const withPrior = planWith({ product: "crabgrass_preventer", appliedOn: "2026-07-30" });
    const without = generatePlan(valid(withChanges({})));
    expect(withPrior.holdOffs.filter((h) => h.kind !== "new_seed")).toEqual(without.holdOffs);
    expect(without.holdOffs.every((h) => h.start === "2026-09-10")).toBe(true);
  });

  it("13 weeks before: past the 8-week low end but within 16 weeks, a caution", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-06-11" });
    expect(find(plan.warnings, "pre_emergent_before_seeding", "crew")?.severity).toBe("caution");
    expect(find(plan.warnings, "pre_emergent_before_seeding", "crew")?.message).toMatch(/13 weeks before this seeding/);
    expect(find(plan.warnings, "pre_emergent_before_seeding", "homeowner")?.severity).toBe("caution");
  });

  it("more than 16 weeks before: the usual interval has passed, nothing to say", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-05-01" });
    expect(plan.warnings.filter((w) => w.code.startsWith("pre_emergent"))).toEqual([]);
    expect(plan.holdOffs.some((h) => h.kind === "new_seed")).toBe(false);
  });

  it("a weed-and-feed 2 weeks before: inside its 3–4 week interval (from memory); held off 4 weeks from the day it went down", () => {
    const plan = planWith({ product: "weed_and_feed", appliedOn: "2026-08-27" });
    expect(find(plan.warnings, "pre_emergent_before_seeding", "crew")?.message).toMatch(/^A weed-and-feed went down 2 weeks before this seeding, inside the usual 3–4-week/);
    // 4 weeks = 28 days from 2026-08-27: last held day 2026-09-23.
    expect(plan.holdOffs.find((h) => h.kind === "new_seed")).toMatchObject({ start: "2026-08-27", end: "2026-09-23" });
    expect(plan.steps.find((s) => s.key === "note:new_seed_allowed")?.date).toBe("2026-09-24");
  });

  it("siduron or mesotrione (labelled at seeding on some products, from memory): an info for the crew to check the label, no hold-off", () => {
    for (const activeIngredient of ["siduron", "mesotrione"] as const) {
      const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-09-01", activeIngredient });
      const crew = find(plan.warnings, "pre_emergent_labelled_at_seeding", "crew");
      expect(crew?.severity).toBe("info");
      expect(crew?.message).toContain(activeIngredient);
      expect(plan.warnings.some((w) => w.audience === "homeowner" && w.code.startsWith("pre_emergent"))).toBe(false);
      expect(plan.holdOffs.some((h) => h.kind === "new_seed")).toBe(false);
    }
  });

  it("a named ingredient not labelled at seeding (prodiamine) counts like any crabgrass preventer", () => {
    const plan = planWith({ product: "crabgrass_preventer", appliedOn: "2026-07-30", activeIngredient: "prodiamine" });
    expect(find(plan.warnings, "pre_emergent_before_seeding", "crew")?.severity).toBe("risk");
  });

  it("means nothing when no seed went down", () => {
    const plan = planWith(
      { product: "crabgrass_preventer", appliedOn: "2026-08-01" },
      { services: ["aeration"], seedMix: [], seedRateLbPer1000: undefined },
    );
    expect(plan.warnings.filter((w) => w.code.startsWith("pre_emergent"))).toEqual([]);
    expect(plan.holdOffs).toEqual([]);
  });

  it("shows on the visit form's live warnings too", () => {
    const warnings = visitWarnings(valid(withChanges({ visit: { priorPreEmergent: { product: "other_pre_emergent", appliedOn: "2026-08-10" } } })));
    expect(find(warnings, "pre_emergent_before_seeding", "crew")?.message).toMatch(/^A pre-emergent herbicide went down 4 weeks before this seeding, inside the usual 8–17-week/);
  });

  it("refuses a date after the visit, and a product not on the list", () => {
    const late = parsePlanInput(withChanges({ visit: { priorPreEmergent: { product: "crabgrass_preventer", appliedOn: "2026-09-11" } } }));
    expect(late.ok ? null : late.fields["visit.priorPreEmergent.appliedOn"]).toBe("Must be on or before the visit date");
    const unknown = parsePlanInput(withChanges({ visit: { priorPreEmergent: { product: "roundup" as never, appliedOn: "2026-08-01" } } }));
    expect(unknown.ok ? null : unknown.fields["visit.priorPreEmergent.product"]).toBe("Pick what was put down");
  });
});

describe("a pre-emergent before seeding, for any product, ingredient and date up to 200 days before", () => {
  it("holds off more seed exactly while a warning says it may be active, from the day it went down, and no step falls inside a hold-off it is restricted by", () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...PRIOR_PRE_EMERGENT_PRODUCTS),
        fc.option(fc.constantFrom(...PRE_EMERGENT_INGREDIENTS), { nil: undefined }),
        fc.integer({ min: 0, max: 200 }),
        (product, activeIngredient, daysBefore) => {
          const appliedOn = addDays("2026-09-10", -daysBefore);
          const plan = planWith(activeIngredient ? { product, appliedOn, activeIngredient } : { product, appliedOn });
          const hold = plan.holdOffs.find((h) => h.kind === "new_seed");
          const warned = plan.warnings.some((w) => w.code === "pre_emergent_before_seeding" && w.audience === "crew");
          expect(warned).toBe(hold !== undefined);
          expect(warned).toBe(plan.warnings.some((w) => w.code === "pre_emergent_before_seeding" && w.audience === "homeowner"));
          if (hold) {
            expect(hold.start).toBe(appliedOn);
            expect(hold.end >= "2026-09-10").toBe(true);
          }
          for (const step of plan.steps) expect(violatesHoldOff(step, plan.holdOffs)).toBe(false);
        },
      ),
      { numRuns: 150 },
    );
  });
});

