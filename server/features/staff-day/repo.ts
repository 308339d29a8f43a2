import type { FollowUpReason, FollowUpStatus } from "#shared/schemas/follow-ups";
import type { StaffDayQuestion, StaffDayVisit } from "#shared/schemas/staff-day";
import type { Db } from "../../db.ts";

/** Enough for one person's day; a longer list would not be read on a phone anyway. */
const DAY_LIMIT = 100;

type VisitRow = {
  id: number; date: string; status: FollowUpStatus; arrival_start: string | null; arrival_end: string | null;
  reason: FollowUpReason; reason_note: string | null; customer_id: number; first_name: string; last_name: string;
  phone: string | null; street: string; town: string; plan_id: number | null; technician_id: number | null; technician_name: string | null;
};

export async function companyZone(db: Db, companyId: number): Promise<string> {
  const row = await db("companies").where({ id: companyId }).first<{ time_zone: string }>("time_zone");
  return row!.time_zone;
}

/**
 * Follow-up visits booked for `today` or `tomorrow` (any state but closed, so a visit done this
 * morning still shows as done), and those whose day has passed while still requested or scheduled.
 */
export async function dayVisits(db: Db, companyId: number, technicianId: number | null, today: string, tomorrow: string): Promise<StaffDayVisit[]> {
  const query = db("follow_up_visits as f")
    .join("properties as p", "p.id", "f.property_id")
    .join("customers as c", "c.id", "p.customer_id")
    .join("users as homeowner", "homeowner.id", "c.user_id")
    .leftJoin("users as t", "t.id", "f.technician_id")
    .where("c.company_id", companyId)
    .whereNotNull("f.scheduled_for")
    .andWhere((w) => {
      w.where((today_) => today_.whereIn("f.scheduled_for", [today, tomorrow]).andWhereNot("f.status", "closed"))
        .orWhere((late) => late.where("f.scheduled_for", "<", today).whereIn("f.status", ["requested", "scheduled"]));
    })
    // Today and tomorrow before the overdue ones, so a long overdue backlog never pushes today off the list.
    .orderByRaw("(f.scheduled_for >= ?) desc, f.scheduled_for, f.arrival_start nulls last, f.id", [today])
    .limit(DAY_LIMIT * 3)
    .select<VisitRow[]>(
      "f.id", db.raw("to_char(f.scheduled_for, 'YYYY-MM-DD') as date"), "f.status", "f.arrival_start", "f.arrival_end", "f.reason",
      "f.reason_note", "c.id as customer_id", "c.first_name", "c.last_name", "homeowner.phone", "p.street", "p.town", "f.plan_id",
      "f.technician_id", "t.name as technician_name",
    );
  if (technicianId !== null) query.andWhere("f.technician_id", technicianId);
  const rows = await query;
  return rows.map((r) => ({
    id: r.id, date: r.date, status: r.status, arrivalStart: r.arrival_start, arrivalEnd: r.arrival_end, reason: r.reason,
    reasonNote: r.reason_note, customerId: r.customer_id, customerName: `${r.first_name} ${r.last_name}`, phone: r.phone,
    street: r.street, town: r.town, planId: r.plan_id, technicianId: r.technician_id, technicianName: r.technician_name,
    overdue: r.date < today && (r.status === "requested" || r.status === "scheduled"),
  }));
}

type QuestionRow = {
  id: string; plan_id: number; first_name: string; last_name: string; street: string; text: string; created_at: Date;
  overdue: boolean; assigned_to_name: string | null;
};

/** Open questions (assigned to `assigneeId`, or all of the company), oldest first; overdue against the company's answer target at `now`. */
export async function dayQuestions(db: Db, companyId: number, assigneeId: number | null, now: Date): Promise<StaffDayQuestion[]> {
  const query = db("messages as m")
    .join("conversations as cv", "cv.id", "m.conversation_id")
    .join("care_plans as cp", "cp.id", "cv.plan_id")
    .join("properties as p", "p.id", "cp.property_id")
    .join("customers as c", "c.id", "p.customer_id")
    .join("companies as co", "co.id", "m.company_id")
    .leftJoin("users as a", "a.id", "m.assigned_to")
    .where({ "m.kind": "question", "m.company_id": companyId })
    .whereNull("m.resolved_at")
    .orderBy([{ column: "m.created_at" }, { column: "m.id" }])
    .limit(DAY_LIMIT)
    .select<QuestionRow[]>(
      "m.id", "cp.id as plan_id", "c.first_name", "c.last_name", "p.street", "m.text", "m.created_at", "a.name as assigned_to_name",
      db.raw("m.created_at + make_interval(hours => co.answer_target_hours) < ?::timestamptz as overdue", [now.toISOString()]),
    );
  if (assigneeId !== null) query.andWhere("m.assigned_to", assigneeId);
  const rows = await query;
  return rows.map((r) => ({
    messageId: Number(r.id), planId: r.plan_id, customerName: `${r.first_name} ${r.last_name}`, street: r.street, text: r.text,
    askedAt: r.created_at.toISOString(), overdue: r.overdue, assignedToName: r.assigned_to_name,
  }));
}

export async function unassignedQuestionCount(db: Db, companyId: number): Promise<number> {
  const [row] = await db("messages")
    .where({ kind: "question", company_id: companyId })
    .whereNull("resolved_at")
    .whereNull("assigned_to")
    .count<{ n: string }[]>({ n: "*" });
  return Number(row?.n ?? 0);
}

/** Active staff of the company, for a manager's picker. */
export async function activeStaff(db: Db, companyId: number): Promise<{ id: number; name: string; role: string }[]> {
  return db("users")
    .where({ company_id: companyId, active: true })
    .whereIn("role", ["technician", "manager"])
    .orderBy(["name", "id"])
    .select("id", "name", "role");
}
