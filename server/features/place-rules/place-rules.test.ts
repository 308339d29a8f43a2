import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { addDays, weekdayOfDayNumber, type PlanInputRaw } from "#shared/engine/index";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { placeOfProperty } from "./repo.ts";

/*
 * The places here are made-up examples, not any real ordinance. Ruth's lawn (C-1001) is in OH,
 * ZIP 44990; Tomasz's (C-1002) too. Each test removes what it made, so other files see the seeds.
 */
let ctx: TestContext;
let companyId: number;
let ruthPropertyId: number;
const NAME = "Test place (invented)";

beforeAll(async () => {
  ctx = await createTestContext();
  const row = await ctx.db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.external_ref", "C-1001")
    .first<{ id: number; company_id: number }>("properties.id", "customers.company_id");
  ruthPropertyId = row!.id;
  companyId = row!.company_id;
});
afterAll(async () => {
  await ctx.db("place_rules").where("name", "like", "Test place%").delete();
  await ctx.close();
});

const place = (overrides: Record<string, unknown> = {}) => ({
  name: NAME,
  region: "oh",
  zipPrefixes: ["4499"],
  fertilizerBlackouts: [{ from: "11-15", to: "03-01" }],
  phosphorus: "needs_reason",
  watering: { allowedWeekdays: [1, 3, 6], newLawnExemptDays: 0 },
  ...overrides,
});

describe("place rules", () => {
  it("managers add, edit and delete places; technicians read them; every change is audited", async () => {
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const technician = await signInStaff(ctx, "marco@cobblefield.example");

    const created = (await manager.post("/api/place-rules").send(place()).expect(201)).body.place;
    expect(created).toMatchObject({ name: NAME, region: "OH", zipPrefixes: ["4499"], phosphorus: "needs_reason", isExample: false });

    const listed = (await technician.get("/api/place-rules").expect(200)).body.places as { id: number; name: string; isExample: boolean }[];
    expect(listed.find((p) => p.id === created.id)?.name).toBe(NAME);
    // The seeded example is there and says it is one.
    expect(listed.find((p) => p.name.startsWith("Example place"))?.isExample).toBe(true);

    await technician.post("/api/place-rules").send(place({ name: "Test place 2" })).expect(403);
    await technician.put(`/api/place-rules/${created.id}`).send(place()).expect(403);
    await technician.delete(`/api/place-rules/${created.id}`).expect(403);

    const edited = (await manager.put(`/api/place-rules/${created.id}`).send(place({ watering: null, phosphorus: "allowed" })).expect(200)).body.place;
    expect(edited).toMatchObject({ id: created.id, watering: null, phosphorus: "allowed" });

    await manager.post("/api/place-rules").send(place()).expect(409);
    await manager.delete(`/api/place-rules/${created.id}`).expect(204);
    await manager.delete(`/api/place-rules/${created.id}`).expect(404);

    // The audit row is written once the answer has gone out.
    const actionsOf = () => ctx.db("audit_log").where({ subject_type: "place", subject_id: String(created.id) }).orderBy("id").pluck("action");
    for (let i = 0; i < 40 && (await actionsOf()).length < 3; i++) await new Promise((r) => setTimeout(r, 50));
    // Creating names the new place too, so all three changes are found under its number.
    expect(await actionsOf()).toEqual(["place.created", "place.updated", "place.deleted"]);
  });

  it("refuses rules that can't be applied, with field errors", async () => {
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const res = await manager.post("/api/place-rules").send(place({ fertilizerBlackouts: [{ from: "02-30", to: "03-01" }], zipPrefixes: ["44"], watering: { allowedWeekdays: [] } }));
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields)).toEqual(expect.arrayContaining(["fertilizerBlackouts.0.from", "zipPrefixes.0", "watering.allowedWeekdays"]));
  });

  it("a place of another company is not found", async () => {
    const [other] = await ctx.db("companies").insert({ slug: `test-other-${Date.now()}`, name: "Other lawn co", time_zone: "America/New_York", sms_sender_name: "Other" }).returning<{ id: number }[]>("id");
    const [foreign] = await ctx.db("place_rules").insert({ company_id: other!.id, name: "Test place foreign", region: "OH", rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "allowed" }) }).returning<{ id: number }[]>("id");
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    await manager.put(`/api/place-rules/${foreign!.id}`).send(place({ name: "Test place taken over" })).expect(404);
    await manager.delete(`/api/place-rules/${foreign!.id}`).expect(404);
    expect((await manager.get("/api/place-rules").expect(200)).body.places.some((p: { id: number }) => p.id === foreign!.id)).toBe(false);
    await ctx.db("companies").where({ id: other!.id }).delete();
  });

  it("a lawn belongs to the place of its state whose ZIP prefix matches longest, else the state-wide one", async () => {
    const ids = await ctx.db("place_rules").insert([
      { company_id: companyId, name: "Test place state-wide", region: "OH", rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "allowed" }) },
      { company_id: companyId, name: "Test place 449", region: "OH", zip_prefixes: ["449"], rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "allowed" }) },
      { company_id: companyId, name: "Test place 44990", region: "OH", zip_prefixes: ["12345", "44990"], rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "needs_reason" }) },
    ]).returning<{ id: number }[]>("id");
    try {
      expect((await placeOfProperty(ctx.db, companyId, "OH", "44990"))?.name).toBe("Test place 44990");
      expect((await placeOfProperty(ctx.db, companyId, "oh", "44991"))?.name).toBe("Test place 449");
      expect((await placeOfProperty(ctx.db, companyId, "OH", "43001"))?.name).toBe("Test place state-wide");
      expect(await placeOfProperty(ctx.db, companyId, "PA", "44990")).toBeUndefined();
    } finally {
      await ctx.db("place_rules").whereIn("id", ids.map((r) => r.id)).delete();
    }
    // With only a prefixed place, a lawn outside its prefixes has no place.
    const [only] = await ctx.db("place_rules").insert({ company_id: companyId, name: "Test place 430", region: "OH", zip_prefixes: ["430"], rules: JSON.stringify({ fertilizerBlackouts: [], phosphorus: "allowed" }) }).returning<{ id: number }[]>("id");
    expect(await placeOfProperty(ctx.db, companyId, "OH", "44990")).toBeUndefined();
    await ctx.db("place_rules").where({ id: only!.id }).delete();
  });

  it("a new plan carries its place's rules: deep watering only on allowed days, phosphorus without a reason warns the crew", async () => {
    const manager = await signInStaff(ctx, "dana@cobblefield.example");
    const technician = await signInStaff(ctx, "marco@cobblefield.example");
    const created = (await manager.post("/api/place-rules").send(place({ name: "Test place for plans", fertilizerBlackouts: [] })).expect(201)).body.place;
    try {
      const visit = { date: addDays(localDateAt("America/New_York"), -1), services: ["fertiliser_only"], areaFt2: 6000, products: [{ name: "Balanced 10-10-10", analysis: { n: 10, p: 10, k: 10 }, rateLbPer1000: 5 }] };
      const { planId } = (await technician.post("/api/visits").send({ propertyId: ruthPropertyId, visit }).expect(201)).body as { planId: number };
      const stored = await ctx.db("care_plans").where({ id: planId }).first<{ input: PlanInputRaw }>("input");
      expect(stored!.input.placeRules).toMatchObject({ name: "Test place for plans", phosphorus: "needs_reason", watering: { allowedWeekdays: [1, 3, 6] } });
      // The visit form reads the same rules with the lawn, so its live warnings match the saved plan's.
      const lawn = (await technician.get(`/api/properties/${ruthPropertyId}`).expect(200)).body.property as { placeRules: { name: string } | null };
      expect(lawn.placeRules?.name).toBe("Test place for plans");

      const plan = (await technician.get(`/api/plans/${planId}`).expect(200)).body.plan as { steps: { kind: string; date: string }[]; warnings: { code: string; audience: string }[] };
      const waterings = plan.steps.filter((s) => s.kind === "water");
      expect(waterings.length).toBeGreaterThan(0);
      for (const s of waterings) expect([1, 3, 6]).toContain(weekdayOfDayNumber(Date.parse(`${s.date}T00:00:00Z`) / 86_400_000));
      expect(plan.warnings.filter((w) => w.code === "phosphorus_without_reason").map((w) => w.audience)).toEqual(["crew"]);
    } finally {
      await ctx.db("place_rules").where({ id: created.id }).delete();
    }
    const lawnWithoutPlace = (await technician.get(`/api/properties/${ruthPropertyId}`).expect(200)).body.property as { placeRules: unknown };
    expect(lawnWithoutPlace.placeRules).toBeNull();
  });
});
