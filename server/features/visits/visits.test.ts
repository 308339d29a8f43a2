import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";

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
