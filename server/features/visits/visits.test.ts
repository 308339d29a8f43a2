import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { coolSeasonLawn, createCustomer } from "../follow-ups/testing/isolated-company.ts";

let ctx: TestContext;
let technician: ReturnType<typeof request.agent>;
let ruthId: number;
let ruthPropertyId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  technician = await signInStaff(ctx, "marco@cobblefield.example");
  const row = await ctx.db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1001")
    .first<{ id: number; customer_id: number }>("properties.id", "properties.customer_id");
  ruthPropertyId = row!.id;
  ruthId = row!.customer_id;
});
afterAll(async () => ctx.close());

const record = {
  product: "Weed-B-Gon Max (test)",
  epaRegistrationNumber: "9688-123",
  rate: { amount: 1.5, unit: "fl oz per 1,000 ft²" },
  areaTreated: 2000,
  targetPest: "Dandelion",
  applicatorName: "Marco Bellini",
  applicatorLicenceNumber: "OH-123456",
  windMph: 4,
  windDirection: "SW",
  temperatureF: 68,
};

function body(overrides: Record<string, unknown> = {}) {
  return {
    propertyId: ruthPropertyId,
    visit: { date: addDays(localDateAt("America/New_York"), -2), services: ["fertiliser_only"], areaFt2: 6000, products: [] },
    conditions: { temperatureF: 68, windMph: 4, windDirection: "SW" },
    applicationRecord: record,
    notes: "Spot-treated the front beds.",
    ...overrides,
  };
}

describe("regulated application record", () => {
  it("is stored as structured data, not in the notes, and comes back on the customer page", async () => {
    const { visitId } = (await technician.post("/api/visits").send(body()).expect(201)).body as { visitId: number };
    const stored = await ctx.db("service_visits").where({ id: visitId }).first<{ notes: string; conditions: unknown; application_record: unknown }>();
    expect(stored!.notes).toBe("Spot-treated the front beds.");
    expect(stored!.conditions).toEqual({ temperatureF: 68, windMph: 4, windDirection: "SW" });
    expect(stored!.application_record).toEqual(record);

    const page = (await technician.get(`/api/customers/${ruthId}`).expect(200)).body as { visits: { id: number; applicationRecord: unknown; conditions: unknown }[] };
    const visit = page.visits.find((v) => v.id === visitId);
    expect(visit).toMatchObject({ applicationRecord: record, conditions: { temperatureF: 68, windMph: 4, windDirection: "SW" } });
  });

  it("leaves both empty when a visit has neither", async () => {
    const { visitId } = (await technician.post("/api/visits").send(body({ conditions: undefined, applicationRecord: undefined })).expect(201)).body as { visitId: number };
    const stored = await ctx.db("service_visits").where({ id: visitId }).first<{ conditions: unknown; application_record: unknown }>();
    expect(stored).toMatchObject({ conditions: null, application_record: null });
  });

  it("refuses a bad record with field paths under applicationRecord", async () => {
    const { applicatorLicenceNumber: _licence, epaRegistrationNumber: _epa, ...incomplete } = record;
    const res = await technician
      .post("/api/visits")
      .send(body({ applicationRecord: { ...incomplete, rate: { amount: -1, unit: "fl oz per 1,000 ft²" }, areaTreated: 0, windMph: 300 } }));
    expect(res.status).toBe(400);
    const fields = res.body.error.fields as Record<string, string>;
    expect(fields["applicationRecord.rate.amount"]).toBe("Must be more than 0");
    expect(fields["applicationRecord.applicatorLicenceNumber"]).toBe("Give the applicator's licence number");
    expect(fields["applicationRecord.areaTreated"]).toBeDefined();
    expect(fields["applicationRecord.windMph"]).toBeDefined();
    expect(Object.keys(fields).every((path) => path.startsWith("applicationRecord."))).toBe(true);

    const conditions = await technician.post("/api/visits").send(body({ conditions: { temperatureF: 500, windDirection: "up" } }));
    expect(conditions.status).toBe(400);
    expect(Object.keys(conditions.body.error.fields as object).sort()).toEqual(["conditions.temperatureF", "conditions.windDirection"]);
  });

  it("asks for a registration number when neither is given", async () => {
    const { epaRegistrationNumber: _epa, ...noNumbers } = record;
    const res = await technician.post("/api/visits").send(body({ applicationRecord: { ...noNumbers, stateRegistrationNumber: "  " } }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields["applicationRecord.epaRegistrationNumber"]).toMatch(/registration number/);
  });
});

describe("what the visit form asks that decides the plan", () => {
  it("records the lawn's condition as found, keeps the weed preventer put down before and the organic tick, and the plan follows them", async () => {
    const company = await ctx.db("customers").where({ id: ruthId }).first<{ company_id: number }>("company_id");
    const lawnOwner = await createCustomer(ctx.db, company!.company_id, { first: "Thea", last: "Thick" });
    // The fixture's fixed frost date may be before today's visit, which the engine refuses.
    const { expectedFirstFrost: _frost, ...lawnFacts } = coolSeasonLawn;
    await ctx.db("properties").where({ id: lawnOwner.propertyId }).update({ lawn: JSON.stringify(lawnFacts) });
    const visitDate = addDays(localDateAt("America/New_York"), -2);
    const visit = {
      date: visitDate,
      services: ["overseeding"],
      seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
      seedRateLbPer1000: 5,
      areaFt2: 5000,
      products: [{ name: "Milorganite 6-4-0", analysis: { n: 6, p: 4, k: 0 }, rateLbPer1000: 8, organic: true }],
      // Six weeks before: inside a crabgrass preventer's usual 8–16 weeks (from memory).
      priorPreEmergent: { product: "crabgrass_preventer", appliedOn: addDays(visitDate, -42) },
    };
    const res = await technician
      .post("/api/visits")
      .send({ propertyId: lawnOwner.propertyId, lawn: { lawnCondition: "thick" }, visit })
      .expect(201);
    const { visitId, planId } = res.body as { visitId: number; planId: number };

    const lawn = await ctx.db("properties").where({ id: lawnOwner.propertyId }).first<{ lawn: Record<string, unknown> }>("lawn");
    expect(lawn!.lawn).toEqual({ ...lawnFacts, lawnCondition: "thick" });
    const stored = await ctx.db("service_visits").where({ id: visitId }).first<{ details: Record<string, unknown> }>("details");
    expect(stored!.details.priorPreEmergent).toEqual(visit.priorPreEmergent);
    expect((stored!.details.products as { organic?: boolean }[])[0]?.organic).toBe(true);

    const plan = (await technician.get(`/api/plans/${planId}`).expect(200)).body as {
      plan: { warnings: { code: string; audience: string }[]; holdOffs: { kind: string; start: string }[]; steps: { key: string }[] };
    };
    const codes = plan.plan.warnings.map((w) => `${w.audience}:${w.code}`);
    expect(codes).toEqual(expect.arrayContaining(["crew:pre_emergent_before_seeding", "homeowner:pre_emergent_before_seeding", "crew:thick_lawn_feeding_program"]));
    expect(plan.plan.holdOffs.find((h) => h.kind === "new_seed")?.start).toBe(visit.priorPreEmergent.appliedOn);
    // The organic product counts as the starter (Nebraska Extension 2021: "starter or organic"), so none is added.
    expect(plan.plan.steps.some((s) => s.key === "feed:starter")).toBe(false);
  });

  it("refuses a lawn condition not on the list, and a weed preventer dated after the visit", async () => {
    const visitDate = addDays(localDateAt("America/New_York"), -2);
    const res = await technician.post("/api/visits").send({
      propertyId: ruthPropertyId,
      lawn: { lawnCondition: "lush" },
      visit: {
        date: visitDate,
        services: ["overseeding"],
        seedMix: [{ species: "tall_fescue", percent: 100, purityPct: 98, germinationPct: 90 }],
        seedRateLbPer1000: 5,
        areaFt2: 5000,
        priorPreEmergent: { product: "crabgrass_preventer", appliedOn: addDays(visitDate, 1) },
      },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toMatchObject({
      "lawn.lawnCondition": "Pick the lawn's condition from the list",
      "visit.priorPreEmergent.appliedOn": "Must be on or before the visit date",
    });
  });
});
