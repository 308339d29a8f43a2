import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";

/**
 * A small company made by hand, whose report is worked out below without the code:
 *
 *   visit  tech  date        services                          callback
 *   V1     A     2026-09-02  aeration, overseeding              under-watering, 2 h + $30 (booked on V1's plan)
 *   V2     A     2026-09-05  aeration, overseeding              –   (also a fertiliser-only visit 09-10: not seeding, not counted)
 *   V3     A     2026-09-09  aeration, overseeding              –
 *   V4     A     2026-09-15  dethatching, slit seeding          –
 *   V5     A     2026-10-02  dethatching, slit seeding          –
 *   V6     B     2026-09-03  new seeding, starter fertiliser    –
 *   V7     B     2026-09-20  new seeding, starter fertiliser    washed out, 1.5 h + $10 (no plan: the lawn's latest seeding visit before 10-01 is V7)
 *   V8     B     2026-10-06  aeration, overseeding              –
 *   X      B     2026-08-20  overseeding on V7's lawn, outside the range; its own callback does not count
 *
 * Range 2026-09-01 … 2026-10-31: 8 seeding visits, 2 callbacks → 2 / 8 × 100 = 25 per 100.
 * By technician: A 1 of 5 → 20; B 1 of 3 → 33.3.
 * By service: aeration and overseeding 1 of 4 (V1, V2, V3, V8) → 25; dethatching and slit seeding 0 of 2 → 0;
 *   new seeding and starter fertiliser 1 of 2 (V6, V7) → 50.
 * By reason: under-watering 1 → 1 / 8 = 12.5; washed out 1 → 12.5.
 * By month: September 6 visits (V1–V4, V6, V7), 2 callbacks → 33.3; October 2 visits (V5, V8), 0 → 0.
 * Cost at $60 an hour: (2 + 1.5) h × 60 = $210 labour + $40 materials = $250; $125 per callback.
 * Adherence (steps dated up to today): customers with a callback (V1: 8 of 10 done, V7: 4 of 6) → 12 / 16 = 75 %;
 *   without (V2: 2 of 4, V6: 1 of 4) → 3 / 8 = 37.5 %. V2's plan also has 3 steps next year (one ticked ahead): not due, not counted.
 * Time to first answer: questions answered after 2 h, 5 h and 30 h, one unanswered → median of [2, 5, 30] = 5 h.
 */
let ctx: TestContext;
let manager: ReturnType<typeof request.agent>;
let companyId: number;
const ids: Record<string, number> = {};

const steps = (count: number, done: number, date = "2026-09-20") =>
  Array.from({ length: count }, (_, i) => ({ date, state: i < done ? ("done" as const) : i % 2 ? ("skipped" as const) : ("pending" as const) }));

async function ask(planId: number, askedAt: string, answeredAfterHours: number | null) {
  const conversation =
    (await ctx.db("conversations").where({ plan_id: planId }).first<{ id: number } | undefined>("id")) ??
    (await ctx.db("conversations").insert({ plan_id: planId }).returning<{ id: number }[]>("id"))[0]!;
  await ctx.db("messages").insert({ conversation_id: conversation.id, kind: "question", text: "Is this normal?", created_at: askedAt });
  if (answeredAfterHours !== null) {
    const answeredAt = new Date(Date.parse(askedAt) + answeredAfterHours * 3_600_000).toISOString();
    await ctx.db("messages").insert({ conversation_id: conversation.id, kind: "answer", text: "Yes.", created_at: answeredAt });
  }
}

beforeAll(async () => {
  ctx = await createTestContext();
  const made = await createIsolatedCompany(ctx.db, `report-${Date.now()}`, [
    { email: "boss@report.example", role: "manager", name: "Report Boss" },
    { email: "tech-a@report.example", role: "technician", name: "Aldo A" },
    { email: "tech-b@report.example", role: "technician", name: "Bea B" },
  ]);
  companyId = made.companyId;
  await ctx.db("companies").where({ id: companyId }).update({ labour_rate_per_hour: 60 });
  const A = made.staffIds["tech-a@report.example"]!;
  const B = made.staffIds["tech-b@report.example"]!;
  const visits: [string, number, string, string[]][] = [
    ["V1", A, "2026-09-02", ["aeration", "overseeding"]],
    ["V2", A, "2026-09-05", ["aeration", "overseeding"]],
    ["V3", A, "2026-09-09", ["aeration", "overseeding"]],
    ["V4", A, "2026-09-15", ["dethatching", "slit_seeding"]],
    ["V5", A, "2026-10-02", ["dethatching", "slit_seeding"]],
    ["V6", B, "2026-09-03", ["new_seeding", "starter_fertiliser"]],
    ["V7", B, "2026-09-20", ["new_seeding", "starter_fertiliser"]],
    ["V8", B, "2026-10-06", ["aeration", "overseeding"]],
  ];
  for (const [name, tech, date, services] of visits) {
    const customer = await createCustomer(ctx.db, companyId, { first: name, last: "Lawn" });
    ids[`${name}.property`] = customer.propertyId;
    ids[`${name}.customer`] = customer.customerId;
    ids[name] = await createVisit(ctx.db, customer.propertyId, tech, date, services);
  }
  await createVisit(ctx.db, ids["V2.property"]!, A, "2026-09-10", ["fertiliser_only"]);
  ids.X = await createVisit(ctx.db, ids["V7.property"]!, B, "2026-08-20", ["overseeding"]);

  ids["V1.plan"] = await createHandMadePlan(ctx.db, ids["V1.property"]!, ids.V1!, steps(10, 8));
  ids["V7.plan"] = await createHandMadePlan(ctx.db, ids["V7.property"]!, ids.V7!, steps(6, 4));
  ids["V2.plan"] = await createHandMadePlan(ctx.db, ids["V2.property"]!, ids.V2!, [...steps(4, 2), ...steps(3, 1, "2099-05-01")]);
  ids["V6.plan"] = await createHandMadePlan(ctx.db, ids["V6.property"]!, ids.V6!, steps(4, 1));
  ids["X.plan"] = await createHandMadePlan(ctx.db, ids["V7.property"]!, ids.X!, []);
  ids["V3.plan"] = await createHandMadePlan(ctx.db, ids["V3.property"]!, ids.V3!, []);

  const callback = { is_callback: true, status: "closed", outcome: "resolved" };
  await ctx.db("follow_up_visits").insert([
    { ...callback, property_id: ids["V1.property"], plan_id: ids["V1.plan"], reason: "under_watering", labour_hours: 2, materials_cost: 30, created_at: "2026-09-20T15:00:00Z" },
    { ...callback, property_id: ids["V7.property"], plan_id: null, reason: "washed_out", labour_hours: 1.5, materials_cost: 10, created_at: "2026-10-01T15:00:00Z" },
    // Not callbacks, or not from the range's visits: none of these count.
    { property_id: ids["V2.property"], plan_id: ids["V2.plan"], reason: "disease", is_callback: false, created_at: "2026-09-25T15:00:00Z" },
    { ...callback, property_id: ids["V7.property"], plan_id: ids["X.plan"], reason: "no_germination", labour_hours: 4, materials_cost: 50, created_at: "2026-09-01T15:00:00Z" },
  ]);

  if (await ctx.db.schema.hasTable("messages")) {
    await ask(ids["V1.plan"]!, "2026-09-10T14:00:00Z", 2);
    await ask(ids["V2.plan"]!, "2026-09-11T14:00:00Z", 5);
    await ask(ids["V6.plan"]!, "2026-09-12T14:00:00Z", 30);
    await ask(ids["V7.plan"]!, "2026-10-03T14:00:00Z", null);
  }
  manager = await signInStaff(ctx, "boss@report.example");
});
afterAll(async () => ctx.close());

const range = { from: "2026-09-01", to: "2026-10-31" };

describe("callback report on a hand-made data set", () => {
  it("rates callbacks per 100 seeding visits overall, by technician, service, reason and month", async () => {
    const { body } = await manager.get("/api/reports/callbacks").query(range).expect(200);
    const report = body.report;
    expect(report.range).toEqual(range);
    expect(report.overall).toEqual({ seedingVisits: 8, callbacks: 2, ratePer100: 25 });
    expect(report.byTechnician.map((r: { technicianName: string; seedingVisits: number; callbacks: number; ratePer100: number }) => [r.technicianName, r.seedingVisits, r.callbacks, r.ratePer100])).toEqual([
      ["Aldo A", 5, 1, 20],
      ["Bea B", 3, 1, 33.3],
    ]);
    expect(Object.fromEntries(report.byService.map((r: { service: string; ratePer100: number }) => [r.service, r.ratePer100]))).toEqual({
      aeration: 25, overseeding: 25, dethatching: 0, slit_seeding: 0, new_seeding: 50, starter_fertiliser: 50,
    });
    expect(report.byReason.map((r: { reason: string; callbacks: number; ratePer100: number }) => [r.reason, r.callbacks, r.ratePer100])).toEqual([
      ["under_watering", 1, 12.5],
      ["washed_out", 1, 12.5],
    ]);
    expect(report.byMonth).toEqual([
      { month: "2026-09", seedingVisits: 6, callbacks: 2, ratePer100: 33.3, totalCost: 250 },
      { month: "2026-10", seedingVisits: 2, callbacks: 0, ratePer100: 0, totalCost: 0 },
    ]);
  });

  it("prices callbacks at the company's labour rate plus materials", async () => {
    const { body } = await manager.get("/api/reports/callbacks").query(range).expect(200);
    expect(body.report.labourRatePerHour).toBe(60);
    expect(body.report.cost).toEqual({ callbacks: 2, labourHours: 3.5, labourCost: 210, materialsCost: 40, totalCost: 250, averagePerCallback: 125 });
  });

  it("compares plan adherence of customers with and without a callback", async () => {
    const { body } = await manager.get("/api/reports/callbacks").query(range).expect(200);
    expect(body.report.adherence).toEqual([
      { group: "had_callback", customers: 2, plans: 2, stepsDue: 16, stepsDone: 12, sharePct: 75 },
      // V3's plan has no steps: it counts as a plan with nothing due
      { group: "no_callback", customers: 3, plans: 3, stepsDue: 8, stepsDone: 3, sharePct: 37.5 },
    ]);
  });

  it("gives the median time to the first answer on questions", async () => {
    const { body } = await manager.get("/api/reports/callbacks").query(range).expect(200);
    if (!(await ctx.db.schema.hasTable("messages"))) {
      expect(body.report.answerTime).toBeNull();
      return;
    }
    expect(body.report.answerTime).toEqual({
      questions: 4, answered: 3, unanswered: 1, medianHours: 5,
      byMonth: [{ month: "2026-09", answered: 3, medianHours: 5 }, { month: "2026-10", answered: 0, medianHours: null }],
    });
    expect(body.report.notes).toEqual([]);
  });

  it("moves the rate when a manager records a callback", async () => {
    await manager.post("/api/follow-ups").send({ propertyId: ids["V3.property"], planId: ids["V3.plan"], reason: "mowed_too_early", isCallback: true }).expect(201);
    const { body } = await manager.get("/api/reports/callbacks").query(range).expect(200);
    expect(body.report.overall).toEqual({ seedingVisits: 8, callbacks: 3, ratePer100: 37.5 }); // 3 / 8
    expect(body.report.byTechnician[0]).toMatchObject({ technicianName: "Aldo A", callbacks: 2, ratePer100: 40 }); // 2 / 5
  });

  it("is for managers only, and refuses a range that ends before it starts", async () => {
    const technician = await signInStaff(ctx, "tech-a@report.example");
    await technician.get("/api/reports/callbacks").expect(403);
    const customer = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await customer.get("/api/reports/callbacks").expect(403);
    const bad = await manager.get("/api/reports/callbacks").query({ from: "2026-10-01", to: "2026-09-01" }).expect(400);
    expect(bad.body.error.fields["query.from"]).toBeDefined();
  });

  it("shows the demo company only its own visits", async () => {
    const dana = await signInStaff(ctx, "dana@cobblefield.example");
    const { body } = await dana.get("/api/reports/callbacks").query(range).expect(200);
    const names = body.report.byTechnician.map((r: { technicianName: string }) => r.technicianName);
    expect(names).not.toContain("Aldo A");
  });
});
