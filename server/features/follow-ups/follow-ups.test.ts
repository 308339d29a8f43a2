import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import Papa from "papaparse";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { neutraliseFormula } from "./csv.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "./testing/isolated-company.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let manager: Agent;
let technician: Agent;
let techId: number;
let lawn: { propertyId: number; planId: number };
let otherCompanyProperty: number;

beforeAll(async () => {
  ctx = await createTestContext();
  const made = await createIsolatedCompany(ctx.db, `follow-ups-${Date.now()}`, [
    { email: "boss@follow-ups.example", role: "manager", name: "Fay Boss" },
    { email: "tech@follow-ups.example", role: "technician", name: "Tam Tech" },
  ]);
  techId = made.staffIds["tech@follow-ups.example"]!;
  const customer = await createCustomer(ctx.db, made.companyId, { first: "Hedda", last: "Gable", street: "1 Formula Way" });
  const visitId = await createVisit(ctx.db, customer.propertyId, techId, "2026-09-01", ["overseeding"]);
  lawn = { propertyId: customer.propertyId, planId: await createHandMadePlan(ctx.db, customer.propertyId, visitId, []) };
  const ruth = await ctx.db("properties").join("customers", "customers.id", "properties.customer_id").where("customers.external_ref", "C-1001").first<{ id: number }>("properties.id");
  otherCompanyProperty = ruth!.id;
  manager = await signInStaff(ctx, "boss@follow-ups.example");
  technician = await signInStaff(ctx, "tech@follow-ups.example");
});
afterAll(async () => ctx.close());

async function book(body: Record<string, unknown> = {}) {
  const res = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, planId: lawn.planId, reason: "no_germination", isCallback: true, ...body }).expect(201);
  return res.body.followUp as { id: number; status: string };
}

describe("booking a follow-up visit", () => {
  it("waits as requested without a date, and is scheduled straight away with a date and a technician", async () => {
    const requested = await book();
    expect(requested).toMatchObject({ status: "requested", isCallback: true, outcome: "pending", planId: lawn.planId, customerName: "Hedda Gable", createdByName: "Tam Tech" });
    const scheduled = await book({ scheduledFor: "2026-09-20", technicianId: techId });
    expect(scheduled).toMatchObject({ status: "scheduled", scheduledFor: "2026-09-20", date: "2026-09-20", technicianName: "Tam Tech" });
  });

  it("refuses another company's lawn (404), a plan of another lawn and an unknown technician", async () => {
    await technician.post("/api/follow-ups").send({ propertyId: otherCompanyProperty, reason: "other" }).expect(404);
    const ruthPlan = await ctx.db("care_plans").where({ property_id: otherCompanyProperty }).first<{ id: number }>("id");
    const wrongPlan = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, planId: ruthPlan!.id, reason: "other" }).expect(400);
    expect(wrongPlan.body.error.fields.planId).toBeDefined();
    const dana = await ctx.db("users").where({ email: "dana@cobblefield.example" }).first<{ id: number }>("id");
    const wrongTech = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, reason: "other", technicianId: dana!.id }).expect(400);
    expect(wrongTech.body.error.fields.technicianId).toBeDefined();
    const badReason = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, reason: "bad_luck" }).expect(400);
    expect(badReason.body.error.fields.reason).toBeDefined();
  });

  it("links the question it was booked from, and refuses a question of another company", async () => {
    if (!(await ctx.db.schema.hasTable("messages"))) return; // the questions feature's table is not there yet
    const [conversation] = await ctx.db("conversations").insert({ plan_id: lawn.planId }).returning<{ id: number }[]>("id");
    const [question] = await ctx.db("messages").insert({ conversation_id: conversation!.id, kind: "question", text: "Bare patch?" }).returning<{ id: string }[]>("id");
    const res = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, questionMessageId: Number(question!.id), reason: "no_germination" }).expect(201);
    expect(res.body.followUp).toMatchObject({ questionMessageId: Number(question!.id), planId: lawn.planId });
    await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, questionMessageId: 2_000_000_000, reason: "other" }).expect(404);
  });
});

describe("follow-up status", () => {
  it("goes requested → scheduled → done → closed, each step checked", async () => {
    const { id } = await book();
    const patch = (body: Record<string, unknown>, agent: Agent = technician) => agent.patch(`/api/follow-ups/${id}`).send(body);

    // scheduled needs a date and a technician
    const noDate = await patch({ status: "scheduled" }).expect(400);
    expect(Object.keys(noDate.body.error.fields).sort()).toEqual(["scheduledFor", "technicianId"]);
    // skipping a step is refused
    const skip = await patch({ status: "done" }).expect(409);
    expect(skip.body.error.code).toBe("invalid_transition");
    await patch({ status: "scheduled", scheduledFor: "2026-09-22", technicianId: techId }).expect(200);

    // a callback is done only with its labour recorded
    const noHours = await patch({ status: "done" }).expect(400);
    expect(noHours.body.error.fields.labourHours).toBeDefined();
    await patch({ status: "done", labourHours: 1.5, materialsCost: 22.4 }).expect(200);

    // and closed only with its outcome
    const noOutcome = await patch({ status: "closed" }).expect(400);
    expect(noOutcome.body.error.fields.outcome).toBeDefined();
    const closed = await patch({ status: "closed", outcome: "resolved", outcomeNote: "Came up well" }).expect(200);
    expect(closed.body.followUp).toMatchObject({ status: "closed", outcome: "resolved", labourHours: 1.5, materialsCost: 22.4 });

    // closed is final; only a manager corrects the cost afterwards
    expect((await patch({ status: "scheduled" }).expect(409)).body.error.code).toBe("invalid_transition");
    expect((await patch({ materialsCost: 30 }).expect(409)).body.error.code).toBe("follow_up_closed");
    const corrected = await patch({ materialsCost: 30 }, manager).expect(200);
    expect(corrected.body.followUp.materialsCost).toBe(30);
    expect((await patch({ reasonNote: "edited" }, manager).expect(409)).body.error.code).toBe("follow_up_closed");
  });

  it("lets a follow-up that turns out unnecessary close without a visit", async () => {
    const { id } = await book({ isCallback: false });
    const res = await technician.patch(`/api/follow-ups/${id}`).send({ status: "closed" }).expect(200);
    expect(res.body.followUp.status).toBe("closed");
  });

  it("keeps cost and outcome for callbacks, and a recorded cost for the manager to change", async () => {
    const plain = await book({ isCallback: false });
    const refused = await technician.patch(`/api/follow-ups/${plain.id}`).send({ labourHours: 2 }).expect(400);
    expect(refused.body.error.fields.labourHours).toMatch(/callback/);

    const callback = await book();
    await technician.patch(`/api/follow-ups/${callback.id}`).send({ labourHours: 2 }).expect(200);
    const change = await technician.patch(`/api/follow-ups/${callback.id}`).send({ labourHours: 3 }).expect(403);
    expect(change.body.error.code).toBe("manager_only");
    await manager.patch(`/api/follow-ups/${callback.id}`).send({ labourHours: 3 }).expect(200);

    // no longer a callback: its cost stops counting
    const unmarked = await manager.patch(`/api/follow-ups/${callback.id}`).send({ isCallback: false }).expect(200);
    expect(unmarked.body.followUp).toMatchObject({ isCallback: false, labourHours: null, materialsCost: null, outcome: "pending" });
  });

  it("refuses an empty change and a follow-up of another company", async () => {
    const { id } = await book();
    await technician.patch(`/api/follow-ups/${id}`).send({}).expect(400);
    const dana = await signInStaff(ctx, "dana@cobblefield.example");
    await dana.patch(`/api/follow-ups/${id}`).send({ reasonNote: "x" }).expect(404);
    await dana.get(`/api/follow-ups/${id}`).expect(404);
  });
});

describe("follow-up table and CSV export", () => {
  it("filters, sorts and pages with a total count", async () => {
    const all = await manager.get("/api/follow-ups").query({ limit: 200 }).expect(200);
    expect(all.body.total).toBe(all.body.rows.length);
    const page = await manager.get("/api/follow-ups").query({ limit: 2, offset: 1, sort: "createdAt", order: "asc" }).expect(200);
    expect(page.body.total).toBe(all.body.total);
    expect(page.body.rows.map((r: { id: number }) => r.id)).toEqual([...all.body.rows].sort((a: { id: number }, b: { id: number }) => a.id - b.id).slice(1, 3).map((r: { id: number }) => r.id));

    const closed = await manager.get("/api/follow-ups").query({ status: "closed", callback: "true" }).expect(200);
    expect(closed.body.rows.every((r: { status: string; isCallback: boolean }) => r.status === "closed" && r.isCallback)).toBe(true);
    const scheduled = await manager.get("/api/follow-ups").query({ technicianId: techId, from: "2026-09-20", to: "2026-09-20" }).expect(200);
    expect(scheduled.body.rows.length).toBeGreaterThan(0);
    expect(scheduled.body.rows.every((r: { date: string }) => r.date === "2026-09-20")).toBe(true);
    await manager.get("/api/follow-ups").query({ status: "lost" }).expect(400);
  });

  it("exports CSV as an attachment with formula-like cells made harmless", async () => {
    const { id } = await book({ reasonNote: '=HYPERLINK("http://evil.example","click")' });
    await ctx.db("customers").where({ id: (await ctx.db("properties").where({ id: lawn.propertyId }).first()).customer_id }).update({ first_name: "@SUM(A1)" });
    try {
      const res = await manager.get("/api/follow-ups.csv").query({ sort: "createdAt", order: "desc" }).expect(200);
      expect(res.headers["content-type"]).toMatch(/^text\/csv/);
      expect(res.headers["content-disposition"]).toMatch(/^attachment; filename=/);
      const parsed = Papa.parse<Record<string, string>>(res.text, { header: true, skipEmptyLines: true });
      const row = parsed.data.find((r) => Number(r.id) === id)!;
      expect(row.reason_note).toBe(`'=HYPERLINK("http://evil.example","click")`);
      expect(row.customer).toBe("'@SUM(A1) Gable");
      expect(parsed.data.every((r) => Object.values(r).every((cell) => !/^[=+\-@]/.test(cell)))).toBe(true);
    } finally {
      await ctx.db("customers").where({ first_name: "@SUM(A1)" }).update({ first_name: "Hedda" });
    }
  });

  it("neutralises every formula starter", () => {
    expect(["=1+1", "+1", "-1", "@A1", "\tx", "\rx", "plain", ""].map(neutraliseFormula)).toEqual(["'=1+1", "'+1", "'-1", "'@A1", "'\tx", "'\rx", "plain", ""]);
  });

  it("is staff-only: customers get 403", async () => {
    const ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
    await ruth.get("/api/follow-ups").expect(403);
    await ruth.get("/api/follow-ups.csv").expect(403);
    await ruth.post("/api/follow-ups").send({ propertyId: otherCompanyProperty, reason: "other" }).expect(403);
  });
});
