import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { addDays } from "#shared/engine/index";

let ctx: TestContext;
let technician: ReturnType<typeof request.agent>;
let ruth: ReturnType<typeof request.agent>;
let ruthPropertyId: number;
let timeZone: string;

beforeAll(async () => {
  ctx = await createTestContext();
  technician = await signInStaff(ctx, "marco@cobblefield.example");
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  const property = await ctx.db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1001")
    .first<{ id: number; time_zone: string }>("properties.id", "properties.time_zone");
  ruthPropertyId = property!.id;
  timeZone = property!.time_zone;
});
afterAll(async () => ctx.close());

const today = () => localDateAt(timeZone);

type Warning = { code: string; audience: string; message: string };
type Step = { date: string; kind: string; phase: string; state: string };

function logVisit(visit: Record<string, unknown>) {
  return technician
    .post("/api/visits")
    .send({
      propertyId: ruthPropertyId,
      visit: {
        date: today(),
        services: ["aeration", "overseeding"],
        seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
        seedRateLbPer1000: 5,
        areaFt2: 6000,
        products: [],
        ...visit,
      },
    })
    .expect(201);
}

describe("warnings reach the right person", () => {
  it("a seed rate far above the range: staff read the crew warning, the homeowner only a plain note, on the plan and on Today", async () => {
    const { planId } = (await logVisit({ seedRateLbPer1000: 12, date: addDays(today(), -3) })).body;

    const staffPlan = (await technician.get(`/api/plans/${planId}`).expect(200)).body.plan;
    const crew = staffPlan.warnings.find((w: Warning) => w.code === "seed_rate_high" && w.audience === "crew");
    expect(crew?.message).toMatch(/^Seed rate 12 lb per 1,000 ft² is above the usual/);
    expect(staffPlan.warnings.some((w: Warning) => w.code === "seed_rate_high" && w.audience === "homeowner")).toBe(true);
    const staffToday = (await technician.get(`/api/plans/${planId}/today`).expect(200)).body;
    expect(staffToday.warnings).toEqual(staffPlan.warnings);

    const customerPlan = (await ruth.get(`/api/plans/${planId}`).expect(200)).body.plan;
    const customerToday = (await ruth.get(`/api/plans/${planId}/today`).expect(200)).body;
    for (const answer of [customerPlan.warnings, customerToday.warnings] as Warning[][]) {
      expect(answer.length).toBeGreaterThan(0);
      expect(answer.every((w) => w.audience === "homeowner")).toBe(true);
      expect(answer.map((w) => w.message)).toContain("Your lawn got a generous seeding. Keep watering as planned.");
      expect(answer.some((w) => /above the usual|lb per 1,000/.test(w.message))).toBe(false);
    }
    expect(customerToday.warnings).toEqual(staffPlan.warnings.filter((w: Warning) => w.audience === "homeowner"));

    // The plan a customer gets back after reporting sprouts is filtered the same way.
    const afterSprouts = (await ruth.post(`/api/plans/${planId}/observations`).send({ kind: "sprouts_seen", onDay: 2 }).expect(200)).body.plan;
    expect(afterSprouts.warnings.every((w: Warning) => w.audience === "homeowner")).toBe(true);
  });

  it("warnings stored before they had an audience reach staff as crew warnings and never the homeowner", async () => {
    const { planId } = (await logVisit({ seedRateLbPer1000: 12 })).body;
    const old = [{ code: "seed_rate_high", severity: "risk", message: "Seed rate 12 lb is above the usual.", reason: "r", source: "s", provenance: "published" }];
    await ctx.db("care_plans").where({ id: planId }).update({ warnings: JSON.stringify(old) });
    expect((await ruth.get(`/api/plans/${planId}`).expect(200)).body.plan.warnings).toEqual([]);
    expect((await ruth.get(`/api/plans/${planId}/today`).expect(200)).body.warnings).toEqual([]);
    expect((await technician.get(`/api/plans/${planId}`).expect(200)).body.plan.warnings).toEqual([{ ...old[0], audience: "crew" }]);
  });
});

describe("no step is born missed", () => {
  it("a visit logged today: no 'before the visit' step and nothing dated before today, on the plan or on Today", async () => {
    const { planId } = (await logVisit({})).body;
    const plan = (await ruth.get(`/api/plans/${planId}`).expect(200)).body.plan;
    expect(plan.steps.length).toBeGreaterThan(0);
    expect(plan.steps.filter((s: Step) => s.phase === "prep")).toEqual([]);
    expect(plan.steps.filter((s: Step) => s.date < today())).toEqual([]);
    const view = (await ruth.get(`/api/plans/${planId}/today`).expect(200)).body;
    expect(view.steps.length).toBeGreaterThan(0);
    expect(view.steps.every((s: Step) => s.date === today() && s.state === "pending")).toBe(true);
  });

  it("a visit from ten days ago starts its plan today, and regenerating it keeps it that way", async () => {
    const { planId } = (await logVisit({ date: addDays(today(), -10) })).body;
    const dates = async () => (await ruth.get(`/api/plans/${planId}`).expect(200)).body.plan.steps.map((s: Step) => s.date).sort() as string[];
    const first = await dates();
    expect(first.length).toBeGreaterThan(0);
    expect(first[0]! >= today()).toBe(true);
    await technician.post(`/api/plans/${planId}/regenerate`).expect(200);
    expect(await dates()).toEqual(first);
  });

  it("a visit booked for next week keeps the prep steps still ahead", async () => {
    const { planId } = (await logVisit({ date: addDays(today(), 7) })).body;
    const plan = (await technician.get(`/api/plans/${planId}`).expect(200)).body.plan;
    const prep = plan.steps.filter((s: Step) => s.phase === "prep");
    expect(prep.length).toBeGreaterThan(0);
    expect(prep.every((s: Step) => s.date >= today())).toBe(true);
  });
});
