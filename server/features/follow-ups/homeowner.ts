import type { AnotherDay, PlanVisit, Weekday } from "#shared/schemas/follow-ups";
import type { Db } from "../../db.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import { ensureConversation, insertMessage } from "../questions/repo.ts";
import { newestActivePlan } from "./repo.ts";

/*
 * The homeowner's side of follow-up visits: what they see of them (no costs, outcomes or staff
 * notes) and their two answers, "confirmed" and "please pick another day".
 */

type VisitRow = {
  id: number;
  plan_id: number | null;
  property_id: number;
  status: PlanVisit["status"];
  scheduled_for: string | null;
  arrival_start: string | null;
  arrival_end: string | null;
  technician_first_name: string | null;
  reason: PlanVisit["reason"];
  customer_prep: string | null;
  work_done: string | null;
  customer_response: PlanVisit["customerResponse"];
};

const toVisit = (r: VisitRow): PlanVisit => ({
  id: r.id,
  planId: r.plan_id,
  status: r.status,
  scheduledFor: r.scheduled_for,
  arrivalStart: r.arrival_start,
  arrivalEnd: r.arrival_end,
  technicianName: r.technician_first_name,
  reason: r.reason,
  customerPrep: r.customer_prep,
  workDone: r.work_done,
  customerResponse: r.customer_response,
});

function visitQuery(db: Db) {
  return db("follow_up_visits as f")
    .leftJoin("users as technician", "technician.id", "f.technician_id")
    .select<VisitRow[]>(
      "f.id", "f.plan_id", "f.property_id", "f.status", db.raw("to_char(f.scheduled_for, 'YYYY-MM-DD') as scheduled_for"),
      "f.arrival_start", "f.arrival_end", db.raw("split_part(technician.name, ' ', 1) as technician_first_name"),
      "f.reason", "f.customer_prep", "f.work_done", "f.customer_response",
    );
}

/**
 * Visits the homeowner was told about: booked ones and those that happened. A request with no
 * date yet is the company's to-do, and a closed visit with no record of work was called off.
 */
function shownToHomeowner(query: ReturnType<typeof visitQuery>) {
  return query.whereNotNull("f.scheduled_for").andWhere((q) =>
    q.whereIn("f.status", ["scheduled", "done"]).orWhere((closed) => closed.where("f.status", "closed").andWhere((w) => w.whereNotNull("f.work_done").orWhereNotNull("f.labour_hours"))),
  );
}

/** The plan's visits, oldest first; a visit booked on the lawn without a plan shows on the lawn's plans. */
export async function visitsOfPlan(db: Db, plan: { planId: number; propertyId: number }): Promise<PlanVisit[]> {
  const rows = await shownToHomeowner(visitQuery(db))
    .andWhere((q) => q.where("f.plan_id", plan.planId).orWhere((noPlan) => noPlan.whereNull("f.plan_id").andWhere("f.property_id", plan.propertyId)))
    .orderBy([{ column: "f.scheduled_for" }, { column: "f.id" }]);
  return rows.map(toVisit);
}

/** A visit of this customer's lawns, else 404: another homeowner's visit is "not found", not "forbidden". */
async function ownVisit(db: Db, user: SessionUser, id: number): Promise<VisitRow> {
  const row = await shownToHomeowner(visitQuery(db))
    .join("properties", "properties.id", "f.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("f.id", id)
    .andWhere("customers.id", user.customerId ?? 0)
    .andWhere("customers.company_id", user.companyId)
    .first();
  if (!row) throw notFound("That visit");
  return row;
}

function stillBooked(row: VisitRow) {
  if (row.status !== "scheduled") throw new HttpError(409, "visit_not_booked", "This visit is no longer booked, so there is nothing to answer.");
}

export async function confirmVisit(db: Db, user: SessionUser, id: number): Promise<PlanVisit> {
  const row = await ownVisit(db, user, id);
  stillBooked(row);
  await db("follow_up_visits").where({ id }).update({ customer_response: "confirmed", customer_responded_at: db.fn.now(), updated_at: db.fn.now() });
  return { ...toVisit(row), customerResponse: "confirmed" };
}

const dayNames: Record<Weekday, string> = { mon: "Monday", tue: "Tuesday", wed: "Wednesday", thu: "Thursday", fri: "Friday", sat: "Saturday", sun: "Sunday" };

function longDate(date: string): string {
  return new Date(`${date}T12:00:00Z`).toLocaleDateString("en-US", { weekday: "long", month: "long", day: "numeric", timeZone: "UTC" });
}

function clock(time: string): string {
  const [h, m] = time.split(":").map(Number) as [number, number];
  return `${((h + 11) % 12) + 1}:${String(m).padStart(2, "0")} ${h < 12 ? "am" : "pm"}`;
}

/** The request as staff read it in the queue, in the homeowner's voice. */
export function anotherDayText(visit: { scheduledFor: string | null; arrivalStart: string | null; arrivalEnd: string | null }, request: AnotherDay): string {
  const when = visit.scheduledFor ? ` on ${longDate(visit.scheduledFor)}` : "";
  const window = visit.arrivalStart && visit.arrivalEnd ? ` (${clock(visit.arrivalStart)}–${clock(visit.arrivalEnd)})` : "";
  const lines = [`Could we move the visit${when}${window} to another day?`];
  if (request.preferredDays?.length) lines.push(`Days that suit me: ${request.preferredDays.map((d) => dayNames[d]).join(", ")}.`);
  if (request.note) lines.push(request.note);
  return lines.join("\n");
}

/**
 * Asks to move the visit: marks it and files the request as a question in the plan's
 * conversation, linked to the visit, so it lands in the technicians' queue.
 */
export async function askForAnotherDay(db: Db, user: SessionUser, id: number, request: AnotherDay): Promise<PlanVisit> {
  const row = await ownVisit(db, user, id);
  stillBooked(row);
  const planId = row.plan_id ?? (await newestActivePlan(db, row.property_id));
  if (planId === null) throw new HttpError(409, "no_plan", "We could not find a care plan to send your request with. Please call the office.");
  await db.transaction(async (trx) => {
    await trx("follow_up_visits").where({ id }).update({ customer_response: "another_day", customer_responded_at: trx.fn.now(), updated_at: trx.fn.now() });
    const conversation = await ensureConversation(trx, planId);
    await insertMessage(trx, {
      conversationId: conversation.id,
      kind: "question",
      authorUserId: user.id,
      text: anotherDayText({ scheduledFor: row.scheduled_for, arrivalStart: row.arrival_start, arrivalEnd: row.arrival_end }, request),
      followUpId: id,
    });
  });
  return { ...toVisit(row), customerResponse: "another_day" };
}
