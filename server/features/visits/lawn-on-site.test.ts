import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";

let ctx: TestContext;
let technician: ReturnType<typeof request.agent>;
let propertyId: number;

beforeAll(async () => {
  ctx = await createTestContext();
  technician = await signInStaff(ctx, "marco@cobblefield.example");
  const row = await ctx.db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1007")
    .first<{ id: number }>("properties.id");
  propertyId = row!.id;
});
afterAll(async () => ctx.close());

const lawnOf = async () => (await ctx.db("properties").where({ id: propertyId }).first<{ lawn: Record<string, unknown> }>("lawn"))!.lawn;
const sodVisit = (lawn?: Record<string, unknown>) => ({
  propertyId,
  visit: { date: addDays(localDateAt("America/New_York"), -1), services: ["sod_installation"], areaFt2: 3600, products: [] },
  ...(lawn ? { lawn } : {}),
});

describe("slope and shade noted when a visit is logged", () => {
  it("are saved on the lawn, keep its other facts, and shape this visit's plan (sod on a steep slope)", async () => {
    // A first frost still weeks away, as the demo visits enter, so the plan waters whatever month the test runs in.
    const frost = addDays(localDateAt("America/New_York"), 50);
    await ctx.db("properties").where({ id: propertyId }).update({ lawn: ctx.db.raw("lawn || ?::jsonb", [JSON.stringify({ expectedFirstFrost: frost })]) });
    const before = await lawnOf();
    const res = await technician.post("/api/visits").send(sodVisit({ slope: "steep", shade: "heavy" })).expect(201);
    const after = await lawnOf();
    expect(after).toEqual({ ...before, slope: "steep", shade: "heavy" });

    const { plan } = (await technician.get(`/api/plans/${res.body.planId}`).expect(200)).body as { plan: {
      steps: { key: string; kind: string; title: string }[];
      warnings: { code: string; audience: string }[];
    } };
    expect(plan.steps.some((s) => s.key === "note:sod_tug_test")).toBe(true);
    const watering = plan.steps.filter((s) => s.kind === "water");
    expect(watering.length).toBeGreaterThan(0);
    // Steep slope: every watering is split into short runs (cycle-and-soak).
    expect(watering.every((s) => / runs of \d+ minutes per zone/.test(s.title))).toBe(true);
    expect(plan.warnings).toContainEqual(expect.objectContaining({ code: "slope_sod_pinning", audience: "crew" }));
  });

  it("leave the lawn's facts as recorded when the visit notes none", async () => {
    const before = await lawnOf();
    await technician.post("/api/visits").send(sodVisit()).expect(201);
    expect(await lawnOf()).toEqual(before);
  });

  it("refuse a value not on the list, with its field path", async () => {
    const res = await technician.post("/api/visits").send(sodVisit({ slope: "cliff" }));
    expect(res.status).toBe(400);
    expect(res.body.error.fields["lawn.slope"]).toBe("Pick the slope from the list");
  });
});
