import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import { addDays } from "#shared/engine/dates";
import { staffDayResponseSchema, type StaffDayResponse } from "#shared/schemas/staff-day";
import { createTestContext, signInStaff, type TestContext } from "../../test/harness.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "../follow-ups/testing/isolated-company.ts";
import { staffDay } from "./service.ts";

type Agent = ReturnType<typeof request.agent>;
const HOUR = 3_600_000;

let ctx: TestContext;
let stamp: number;
let manager: Agent;
let techA: Agent;
const ids: Record<string, number> = {};
let today: string;

async function day(agent: Agent, query = ""): Promise<StaffDayResponse> {
  const res = await agent.get(`/api/staff/day${query}`).expect(200);
  return staffDayResponseSchema.parse(res.body);
}

async function followUp(propertyId: number, values: Record<string, unknown>): Promise<number> {
  const [row] = await ctx.db("follow_up_visits")
    .insert({ property_id: propertyId, reason: "no_germination", status: "scheduled", ...values })
    .returning<{ id: number }[]>("id");
  return row!.id;
}

async function question(planId: number, values: { hoursAgo: number; assignedTo?: number | null; resolved?: boolean; now?: number }) {
  const conversation =
    (await ctx.db("conversations").where({ plan_id: planId }).first<{ id: number } | undefined>("id")) ??
    (await ctx.db("conversations").insert({ plan_id: planId }).returning<{ id: number }[]>("id"))[0]!;
  const at = new Date((values.now ?? Date.now()) - values.hoursAgo * HOUR);
  const [row] = await ctx.db("messages")
    .insert({
      conversation_id: conversation.id, kind: "question", text: `Asked ${values.hoursAgo} h ago`, created_at: at,
      assigned_to: values.assignedTo ?? null, resolved_at: values.resolved ? new Date() : null,
    })
    .returning<{ id: string }[]>("id");
  return Number(row!.id);
}

/** A phone number unique to this run (users.phone is unique), exchange 2-9 as real numbers have. */
const phone = (n: number) => `+1330${200 + (stamp % 700)}${String(1000 + n).slice(-4)}`;

beforeAll(async () => {
  ctx = await createTestContext();
  stamp = Date.now();
  const made = await createIsolatedCompany(ctx.db, `day-${stamp}`, [
    { email: `boss-${stamp}@day.example`, role: "manager", name: "Dora Boss" },
    { email: `tech-a-${stamp}@day.example`, role: "technician", name: "Abe Tech" },
    { email: `tech-b-${stamp}@day.example`, role: "technician", name: "Bo Tech" },
  ]);
  ids.A = made.staffIds[`tech-a-${stamp}@day.example`]!;
  ids.B = made.staffIds[`tech-b-${stamp}@day.example`]!;
  today = localDateAt("America/New_York");

  const hal = await createCustomer(ctx.db, made.companyId, { first: "Hal", last: "Greene", phone: phone(1), street: "12 Clover Way" });
  const ivy = await createCustomer(ctx.db, made.companyId, { first: "Ivy", last: "Moss", street: "40 Fescue Ct" });
  const visit = await createVisit(ctx.db, hal.propertyId, ids.A, addDays(today, -20), ["overseeding"]);
  ids.halPlan = await createHandMadePlan(ctx.db, hal.propertyId, visit, []);
  const ivyVisit = await createVisit(ctx.db, ivy.propertyId, ids.B, addDays(today, -20), ["overseeding"]);
  ids.ivyPlan = await createHandMadePlan(ctx.db, ivy.propertyId, ivyVisit, []);

  ids.aToday = await followUp(hal.propertyId, { technician_id: ids.A, scheduled_for: today, arrival_start: "09:00", arrival_end: "11:00", plan_id: ids.halPlan, reason_note: "Bare patch by the drive" });
  ids.aTomorrow = await followUp(ivy.propertyId, { technician_id: ids.A, scheduled_for: addDays(today, 1), reason: "washed_out" });
  ids.aLate = await followUp(ivy.propertyId, { technician_id: ids.A, scheduled_for: addDays(today, -3) });
  ids.aLateRequested = await followUp(hal.propertyId, { technician_id: ids.A, scheduled_for: addDays(today, -1), status: "requested" });
  ids.aDoneEarlier = await followUp(hal.propertyId, { technician_id: ids.A, scheduled_for: addDays(today, -2), status: "done" });
  ids.aClosedToday = await followUp(hal.propertyId, { technician_id: ids.A, scheduled_for: today, status: "closed" });
  ids.aLater = await followUp(hal.propertyId, { technician_id: ids.A, scheduled_for: addDays(today, 2) });
  ids.bToday = await followUp(ivy.propertyId, { technician_id: ids.B, scheduled_for: today, arrival_start: "13:00", arrival_end: "15:00" });
  ids.unassignedToday = await followUp(ivy.propertyId, { scheduled_for: today });

  ids.qAOld = await question(ids.halPlan, { hoursAgo: 30, assignedTo: ids.A });
  ids.qANew = await question(ids.halPlan, { hoursAgo: 2, assignedTo: ids.A });
  ids.qAResolved = await question(ids.halPlan, { hoursAgo: 50, assignedTo: ids.A, resolved: true });
  ids.qB = await question(ids.ivyPlan, { hoursAgo: 3, assignedTo: ids.B });
  ids.qNobody = await question(ids.ivyPlan, { hoursAgo: 1 });

  // Another company's visit today and question, which no one above may see.
  const other = await createIsolatedCompany(ctx.db, `day-other-${stamp}`, [{ email: `other-${stamp}@day.example`, role: "technician", name: "Otto Other" }]);
  const olga = await createCustomer(ctx.db, other.companyId, { first: "Olga", last: "Other" });
  const olgaVisit = await createVisit(ctx.db, olga.propertyId, null, addDays(today, -20), ["overseeding"]);
  const olgaPlan = await createHandMadePlan(ctx.db, olga.propertyId, olgaVisit, []);
  ids.otherToday = await followUp(olga.propertyId, { technician_id: other.staffIds[`other-${stamp}@day.example`], scheduled_for: today });
  ids.otherQuestion = await question(olgaPlan, { hoursAgo: 40 });

  manager = await signInStaff(ctx, `boss-${stamp}@day.example`);
  techA = await signInStaff(ctx, `tech-a-${stamp}@day.example`);
});

afterAll(async () => {
  await ctx.close();
});

const visitIds = (visits: { id: number }[]) => visits.map((v) => v.id);

describe("GET /api/staff/day for a technician", () => {
  it("shows only their own visits today and tomorrow, with the arrival window, the homeowner's phone and the plan", async () => {
    const body = await day(techA);
    expect(body.today).toBe(today);
    expect(body.tomorrow).toBe(addDays(today, 1));
    expect(body.scope).toEqual({ kind: "technician", technicianId: ids.A, name: "Abe Tech" });
    expect(visitIds(body.visitsToday)).toEqual([ids.aToday]);
    expect(visitIds(body.visitsTomorrow)).toEqual([ids.aTomorrow]);
    expect(body.visitsToday[0]).toMatchObject({
      customerName: "Hal Greene", phone: phone(1), street: "12 Clover Way", town: "Wrenmoor", arrivalStart: "09:00", arrivalEnd: "11:00",
      reason: "no_germination", reasonNote: "Bare patch by the drive", planId: ids.halPlan, status: "scheduled", overdue: false,
    });
    expect(body.visitsTomorrow[0]).toMatchObject({ customerName: "Ivy Moss", phone: null, reason: "washed_out", arrivalStart: null });
    expect(body.technicians).toEqual([]);
  });

  it("flags follow-ups past their day that are not done as overdue, oldest first", async () => {
    const body = await day(techA);
    expect(visitIds(body.overdueVisits)).toEqual([ids.aLate, ids.aLateRequested]);
    expect(body.overdueVisits.every((v) => v.overdue)).toBe(true);
  });

  it("lists their open questions oldest first, overdue past the company's answer target, and counts the unassigned ones", async () => {
    const body = await day(techA);
    expect(body.questions.map((q) => [q.messageId, q.overdue])).toEqual([[ids.qAOld, true], [ids.qANew, false]]);
    expect(body.unassignedQuestions).toBe(1);
  });

  it("may not look at a colleague's day", async () => {
    await techA.get(`/api/staff/day?technicianId=${ids.B}`).expect(403);
    const own = await day(techA, `?technicianId=${ids.A}`);
    expect(visitIds(own.visitsToday)).toEqual([ids.aToday]);
  });
});

describe("GET /api/staff/day for a manager", () => {
  it("shows the whole company and nothing of another company", async () => {
    const body = await day(manager);
    expect(body.scope).toEqual({ kind: "company" });
    // Ordered by arrival window, visits with none last.
    expect(visitIds(body.visitsToday)).toEqual([ids.aToday, ids.bToday, ids.unassignedToday]);
    expect(body.questions.map((q) => q.messageId)).toEqual([ids.qAOld, ids.qB, ids.qANew, ids.qNobody]);
    expect(body.questions.map((q) => q.messageId)).not.toContain(ids.otherQuestion);
    expect(body.technicians.map((t) => t.name)).toEqual(["Abe Tech", "Bo Tech", "Dora Boss"]);
  });

  it("picks one technician's day", async () => {
    const body = await day(manager, `?technicianId=${ids.B}`);
    expect(body.scope).toEqual({ kind: "technician", technicianId: ids.B, name: "Bo Tech" });
    expect(visitIds(body.visitsToday)).toEqual([ids.bToday]);
    expect(body.questions.map((q) => q.messageId)).toEqual([ids.qB]);
  });

  it("refuses a technician of another company", async () => {
    const outsider = await ctx.db("users").where({ email: `other-${stamp}@day.example` }).first<{ id: number }>("id");
    const res = await manager.get(`/api/staff/day?technicianId=${outsider!.id}`).expect(400);
    expect(res.body.error.fields).toHaveProperty("technicianId");
  });
});

describe("the day on a fixed clock", () => {
  it("takes today from the company's time zone and judges overdue at that moment", async () => {
    const fixed = await createIsolatedCompany(ctx.db, `day-fixed-${stamp}`, [{ email: `fixed-${stamp}@day.example`, role: "technician", name: "Fay Fixed" }]);
    const tech = fixed.staffIds[`fixed-${stamp}@day.example`]!;
    const kim = await createCustomer(ctx.db, fixed.companyId, { first: "Kim", last: "Lawn" });
    const visit = await createVisit(ctx.db, kim.propertyId, tech, "2026-02-20", ["overseeding"]);
    const plan = await createHandMadePlan(ctx.db, kim.propertyId, visit, []);
    // 04:30 UTC on March 8 is still 23:30 on March 7 in New York (EST, UTC-5).
    const now = new Date("2026-03-08T04:30:00Z");
    const onThe7th = await followUp(kim.propertyId, { technician_id: tech, scheduled_for: "2026-03-07" });
    const onThe8th = await followUp(kim.propertyId, { technician_id: tech, scheduled_for: "2026-03-08" });
    const onThe6th = await followUp(kim.propertyId, { technician_id: tech, scheduled_for: "2026-03-06" });
    const justOverdue = await question(plan, { hoursAgo: 24.5, assignedTo: tech, now: now.getTime() });
    const justInTime = await question(plan, { hoursAgo: 23.5, assignedTo: tech, now: now.getTime() });

    const user = { id: tech, companyId: fixed.companyId, role: "technician" as const, name: "Fay Fixed", email: null, phone: null, customerId: null };
    const body = await staffDay(ctx.db, user, {}, now);
    expect(body.today).toBe("2026-03-07");
    expect(visitIds(body.visitsToday)).toEqual([onThe7th]);
    expect(visitIds(body.visitsTomorrow)).toEqual([onThe8th]);
    expect(visitIds(body.overdueVisits)).toEqual([onThe6th]);
    expect(body.questions.map((q) => [q.messageId, q.overdue])).toEqual([[justOverdue, true], [justInTime, false]]);
  });
});
