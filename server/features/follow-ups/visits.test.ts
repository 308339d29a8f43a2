import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import ICAL from "ical.js";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { anotherDayText } from "./homeowner.ts";
import { visitChange } from "./announce.ts";
import { createCustomer, createHandMadePlan, createIsolatedCompany, createVisit } from "./testing/isolated-company.ts";

type Agent = ReturnType<typeof request.agent>;
let ctx: TestContext;
let manager: Agent;
let technician: Agent;
let homeowner: Agent;
let neighbour: Agent;
let techId: number;
let lawn: { propertyId: number; planId: number };
let neighbourLawn: { propertyId: number; planId: number };
let companyId: number;

async function customerWithPlan(companyId: number, first: string, last: string) {
  const customer = await createCustomer(ctx.db, companyId, { first, last });
  const visitId = await createVisit(ctx.db, customer.propertyId, techId, "2026-09-01", ["overseeding"]);
  return { ...customer, planId: await createHandMadePlan(ctx.db, customer.propertyId, visitId, []) };
}

beforeAll(async () => {
  ctx = await createTestContext();
  const made = await createIsolatedCompany(ctx.db, `visits-${Date.now()}`, [
    { email: "boss@visits.example", role: "manager", name: "Vera Boss" },
    { email: "tech@visits.example", role: "technician", name: "Theo Turf" },
  ]);
  techId = made.staffIds["tech@visits.example"]!;
  companyId = made.companyId;
  const owner = await customerWithPlan(made.companyId, "Hana", "Moss");
  const other = await customerWithPlan(made.companyId, "Nils", "Burr");
  lawn = { propertyId: owner.propertyId, planId: owner.planId };
  neighbourLawn = { propertyId: other.propertyId, planId: other.planId };
  manager = await signInStaff(ctx, "boss@visits.example");
  technician = await signInStaff(ctx, "tech@visits.example");
  homeowner = await signInCustomer(ctx, owner.email);
  neighbour = await signInCustomer(ctx, other.email);
});
afterAll(async () => ctx.close());

const booking = { reason: "no_germination", scheduledFor: "2026-12-18", arrivalStart: "09:00", arrivalEnd: "11:00", customerPrep: "Don't mow the day before" };

async function book(agent: Agent, body: Record<string, unknown> = {}, where = lawn) {
  const res = await agent.post("/api/follow-ups").send({ propertyId: where.propertyId, planId: where.planId, technicianId: techId, ...booking, ...body }).expect(201);
  return res.body.followUp as { id: number; status: string; planId: number | null };
}

/**
 * A lawn of its own for a test that counts notices: the ledger keeps one notice per plan,
 * kind, channel and minute, so two visits of one plan changed in the same minute share a row.
 */
let lawns = 0;
async function freshLawn() {
  lawns += 1;
  const customer = await customerWithPlan(companyId, "Ola", `Fresh${lawns}`);
  return { propertyId: customer.propertyId, planId: customer.planId };
}

/** The visit notices queued for one follow-up, as the reminders ledger holds them. */
async function visitNotices(followUpId: number) {
  const rows = await ctx.db("reminders").where({ kind: "visit_update" }).whereRaw("(context->>'followUpId')::int = ?", [followUpId]).orderBy("id");
  return rows as { plan_id: number; state: string; channel: string; context: { followUpId: number; change: string } }[];
}

describe("booking with what the homeowner needs to know", () => {
  it("keeps the arrival window and what to do before the visit", async () => {
    const visit = await book(technician);
    expect(visit).toMatchObject({ status: "scheduled", arrivalStart: "09:00", arrivalEnd: "11:00", customerPrep: "Don't mow the day before", customerResponse: null });
  });

  it("refuses half a window and a window that ends before it starts", async () => {
    const half = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, reason: "other", arrivalStart: "09:00" }).expect(400);
    expect(Object.keys(half.body.error.fields)).toEqual(["arrivalEnd"]);
    const backwards = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, reason: "other", arrivalStart: "11:00", arrivalEnd: "09:00" }).expect(400);
    expect(backwards.body.error.fields.arrivalEnd).toMatch(/after/);
    const badTime = await technician.post("/api/follow-ups").send({ propertyId: lawn.propertyId, reason: "other", arrivalStart: "25:00", arrivalEnd: "26:00" }).expect(400);
    expect(badTime.body.error.fields.arrivalStart).toBeDefined();
  });

  it("lets a manager add a follow-up from the follow-ups page, with no question behind it", async () => {
    const own = await freshLawn();
    const res = await manager.post("/api/follow-ups").send({ propertyId: own.propertyId, reason: "disease", scheduledFor: "2026-12-21", technicianId: techId, arrivalStart: "13:00", arrivalEnd: "15:00" }).expect(201);
    // No plan given: the lawn's plan still hears of it.
    expect(res.body.followUp).toMatchObject({ questionMessageId: null, planId: null, status: "scheduled", createdByName: "Vera Boss" });
    const notices = await visitNotices(res.body.followUp.id);
    expect(notices.map((n) => [n.plan_id, n.context.change])).toEqual([[own.planId, "booked"]]);
  });

  it("records what was done when the visit is done", async () => {
    const { id } = await book(technician, { isCallback: false });
    const done = await technician.patch(`/api/follow-ups/${id}`).send({ status: "done", workDone: "Reseeded two bare patches by the drive" }).expect(200);
    expect(done.body.followUp).toMatchObject({ status: "done", workDone: "Reseeded two bare patches by the drive" });
  });
});

describe("announcing visit changes to the homeowner", () => {
  it("queues a visit notice on the homeowner's channel when a visit is booked, moved, cancelled or done", async () => {
    const own = await freshLawn();
    const requested = await book(technician, { scheduledFor: undefined, technicianId: undefined }, own);
    expect(requested.status).toBe("requested");
    // A request with no date is not news for the homeowner yet.
    expect(await visitNotices(requested.id)).toEqual([]);

    await technician.patch(`/api/follow-ups/${requested.id}`).send({ status: "scheduled", scheduledFor: "2026-12-19", technicianId: techId }).expect(200);
    const booked = await visitNotices(requested.id);
    expect(booked.map((n) => [n.plan_id, n.state, n.channel, n.context.change])).toEqual([[own.planId, "scheduled", "email", "booked"]]);

    // Changing the window moves the visit; the waiting notice now says so instead of queuing a second one.
    await technician.patch(`/api/follow-ups/${requested.id}`).send({ arrivalStart: "14:00", arrivalEnd: "16:00" }).expect(200);
    const moved = await visitNotices(requested.id);
    expect(moved.map((n) => n.context.change)).toEqual(["moved"]);

    // A note changes nothing for the homeowner.
    await technician.patch(`/api/follow-ups/${requested.id}`).send({ reasonNote: "bring the slit seeder" }).expect(200);
    expect((await visitNotices(requested.id)).map((n) => n.context.change)).toEqual(["moved"]);

    await technician.patch(`/api/follow-ups/${requested.id}`).send({ status: "closed" }).expect(200);
    expect((await visitNotices(requested.id)).map((n) => n.context.change)).toEqual(["cancelled"]);
  });

  it("queues a separate notice once the first has gone, and on completion", async () => {
    const { id } = await book(technician, { isCallback: false }, await freshLawn());
    expect((await visitNotices(id)).map((n) => n.context.change)).toEqual(["booked"]);
    // The booking notice went out days ago; the next change is news of its own.
    await ctx.db("reminders").where({ kind: "visit_update" }).whereRaw("(context->>'followUpId')::int = ?", [id])
      .update({ state: "sent", attempts: 1, body: "sent", local_date: "2026-12-01", due_at: new Date("2026-12-01T15:00:00Z") });
    await technician.patch(`/api/follow-ups/${id}`).send({ status: "done", workDone: "Overseeded the thin strip" }).expect(200);
    expect((await visitNotices(id)).map((n) => [n.state, n.context.change])).toEqual([["sent", "booked"], ["scheduled", "done"]]);
  });

  it("names the change from the visit before and after", () => {
    const at = (status: "requested" | "scheduled" | "done" | "closed", scheduledFor: string | null = "2026-12-18", arrivalStart: string | null = null) =>
      ({ status, scheduledFor, arrivalStart, arrivalEnd: arrivalStart ? "17:00" : null });
    expect(visitChange(null, at("scheduled"))).toBe("booked");
    expect(visitChange(null, at("requested", null))).toBeNull();
    expect(visitChange(at("scheduled"), at("scheduled", "2026-12-19"))).toBe("moved");
    expect(visitChange(at("scheduled"), at("scheduled", "2026-12-18", "15:00"))).toBe("moved");
    expect(visitChange(at("scheduled"), at("scheduled"))).toBeNull();
    expect(visitChange(at("scheduled"), at("closed"))).toBe("cancelled");
    expect(visitChange(at("requested", null), at("closed", null))).toBeNull();
    expect(visitChange(at("scheduled"), at("done"))).toBe("done");
    expect(visitChange(at("done"), at("closed"))).toBeNull();
  });
});

describe("the homeowner's visits", () => {
  it("shows the homeowner their own booked visits and what was done, and hides another homeowner's", async () => {
    const upcoming = await book(technician, { scheduledFor: "2026-12-22" });
    const past = await book(technician, { scheduledFor: "2026-12-02", isCallback: false });
    await technician.patch(`/api/follow-ups/${past.id}`).send({ status: "done", workDone: "Topdressed and reseeded the low corner" }).expect(200);
    const requestOnly = await book(technician, { scheduledFor: undefined, technicianId: undefined });
    const calledOff = await book(technician, { scheduledFor: "2026-12-23" });
    await technician.patch(`/api/follow-ups/${calledOff.id}`).send({ status: "closed" }).expect(200);
    const neighbours = await book(technician, {}, neighbourLawn);

    const res = await homeowner.get(`/api/plans/${lawn.planId}/visits`).expect(200);
    const visits = res.body.visits as { id: number; status: string; workDone: string | null; technicianName: string | null }[];
    const ids = visits.map((v) => v.id);
    expect(ids).toContain(upcoming.id);
    expect(ids).not.toContain(requestOnly.id);
    expect(ids).not.toContain(calledOff.id);
    expect(ids).not.toContain(neighbours.id);
    expect(visits.find((v) => v.id === upcoming.id)).toEqual({
      id: upcoming.id, planId: lawn.planId, status: "scheduled", scheduledFor: "2026-12-22", arrivalStart: "09:00", arrivalEnd: "11:00",
      technicianName: "Theo", reason: "no_germination", customerPrep: "Don't mow the day before", workDone: null, customerResponse: null,
    });
    expect(visits.find((v) => v.id === past.id)).toMatchObject({ status: "done", workDone: "Topdressed and reseeded the low corner" });
    // No costs, outcomes or staff notes on the homeowner's side.
    expect(Object.keys(visits[0]!)).not.toContain("labourHours");

    await neighbour.get(`/api/plans/${lawn.planId}/visits`).expect(404);
    await technician.get(`/api/plans/${lawn.planId}/visits`).expect(200);
  });

  it("lets the homeowner confirm their visit, and not another homeowner's", async () => {
    const { id } = await book(technician, { scheduledFor: "2026-12-24" });
    await neighbour.post(`/api/follow-ups/${id}/confirm`).expect(404);
    const res = await homeowner.post(`/api/follow-ups/${id}/confirm`).expect(200);
    expect(res.body.visit).toMatchObject({ id, customerResponse: "confirmed" });
    const staffView = await technician.get(`/api/follow-ups/${id}`).expect(200);
    expect(staffView.body.followUp.customerResponse).toBe("confirmed");
    expect(staffView.body.followUp.customerRespondedAt).not.toBeNull();
    // Moving the visit asks the homeowner again.
    const moved = await technician.patch(`/api/follow-ups/${id}`).send({ scheduledFor: "2026-12-28" }).expect(200);
    expect(moved.body.followUp.customerResponse).toBeNull();
  });

  it("files a request for another day as a question in the queue, with the visit attached", async () => {
    const { id } = await book(technician, { scheduledFor: "2026-12-18" });
    await neighbour.post(`/api/follow-ups/${id}/another-day`).send({}).expect(404);
    await homeowner.post(`/api/follow-ups/${id}/another-day`).send({ preferredDays: ["someday"] }).expect(400);
    const res = await homeowner.post(`/api/follow-ups/${id}/another-day`).send({ note: "We're away that week.", preferredDays: ["mon", "sat"] }).expect(200);
    expect(res.body.visit).toMatchObject({ id, customerResponse: "another_day" });

    const message = await ctx.db("messages").where({ follow_up_id: id }).first<{ id: string; kind: string; text: string; source: string }>("id", "kind", "text", "source");
    expect(message).toMatchObject({ kind: "question", source: "portal" });
    expect(message!.text).toBe("Could we move the visit on Friday, December 18 (9:00 am–11:00 am) to another day?\nDays that suit me: Monday, Saturday.\nWe're away that week.");

    const queue = await technician.get("/api/questions/open").expect(200);
    const queued = (queue.body.questions as { messageId: number; planId: number; text: string }[]).find((q) => q.messageId === Number(message!.id));
    expect(queued).toMatchObject({ planId: lawn.planId, text: message!.text });

    const staffView = await technician.get(`/api/follow-ups/${id}`).expect(200);
    expect(staffView.body.followUp.customerResponse).toBe("another_day");
  });

  it("refuses an answer to a visit that is no longer booked", async () => {
    const { id } = await book(technician, { isCallback: false });
    await technician.patch(`/api/follow-ups/${id}`).send({ status: "done" }).expect(200);
    const res = await homeowner.post(`/api/follow-ups/${id}/confirm`).expect(409);
    expect(res.body.error.code).toBe("visit_not_booked");
  });

  it("words a request without a window or preferences plainly", () => {
    expect(anotherDayText({ scheduledFor: "2026-07-04", arrivalStart: null, arrivalEnd: null }, {})).toBe("Could we move the visit on Saturday, July 4 to another day?");
    expect(anotherDayText({ scheduledFor: "2026-07-04", arrivalStart: "12:30", arrivalEnd: "13:00" }, {})).toBe("Could we move the visit on Saturday, July 4 (12:30 pm–1:00 pm) to another day?");
  });
});

describe("visits in the homeowner's calendar feed", () => {
  it("has the booked visit as an event over its arrival window in the lawn's time zone", async () => {
    const { id } = await book(technician, { scheduledFor: "2026-12-29", arrivalStart: "08:30", arrivalEnd: "10:00" });
    const noWindow = await book(technician, { scheduledFor: "2026-12-30", arrivalStart: undefined, arrivalEnd: undefined });
    const { body } = await homeowner.get("/api/my/calendar").expect(200);
    const res = await request(ctx.app).get(new URL(body.url).pathname).buffer(true).parse((r, done) => {
      let text = "";
      r.setEncoding("utf8");
      r.on("data", (chunk: string) => (text += chunk));
      r.on("end", () => done(null, text));
    }).expect(200);
    const calendar = new ICAL.Component(ICAL.parse(res.body as string));
    for (const zone of calendar.getAllSubcomponents("vtimezone")) ICAL.TimezoneService.register(zone);
    const events = calendar.getAllSubcomponents("vevent").map((v) => new ICAL.Event(v));

    const timed = events.find((e) => e.uid === `follow-up.${id}@sproutline`)!;
    expect(timed).toBeDefined();
    expect(timed.startDate.toString()).toBe("2026-12-29T08:30:00");
    expect(timed.endDate.toString()).toBe("2026-12-29T10:00:00");
    expect(timed.startDate.zone.tzid).toBe("America/New_York");
    // 08:30 in New York in December (EST, UTC−5) is 13:30 UTC.
    expect(timed.startDate.toJSDate().toISOString()).toBe("2026-12-29T13:30:00.000Z");
    expect(timed.description).toContain("Before the visit: Don't mow the day before");
    expect(timed.description).toContain("Theo");

    const allDay = events.find((e) => e.uid === `follow-up.${noWindow.id}@sproutline`)!;
    expect(allDay.startDate.isDate).toBe(true);
    expect(allDay.startDate.toString()).toBe("2026-12-30");

    // Visits of another homeowner never appear in this feed.
    const theirs = await book(technician, { scheduledFor: "2026-12-29" }, neighbourLawn);
    const again = await request(ctx.app).get(new URL(body.url).pathname).buffer(true).parse((r, done) => {
      let text = "";
      r.setEncoding("utf8");
      r.on("data", (chunk: string) => (text += chunk));
      r.on("end", () => done(null, text));
    });
    expect(again.body as string).not.toContain(`follow-up.${theirs.id}@sproutline`);
  });
});
