import { SEEDING_SERVICES } from "#shared/engine/index";
import type { FollowUpReason } from "#shared/schemas/follow-ups";
import type { Db } from "../../db.ts";
import type { AnswerWaitRow, CallbackRow, PlanStepsRow, SeedingVisitRow } from "./arithmetic.ts";

/** `services && {overseeding,…}`: the visit sowed seed. */
const isSeeding = (column: string) => `${column} && ?::text[]`;
/** A PostgreSQL array literal, bound as one parameter (knex would spread a JS array into a list). */
const seedingServices = `{${SEEDING_SERVICES.join(",")}}`;

export type Range = { from: string; to: string };

export async function companyFacts(db: Db, companyId: number): Promise<{ timeZone: string; labourRatePerHour: number }> {
  const row = await db("companies").where({ id: companyId }).first<{ time_zone: string; labour_rate_per_hour: string }>("time_zone", "labour_rate_per_hour");
  return { timeZone: row.time_zone, labourRatePerHour: Number(row.labour_rate_per_hour) };
}

export async function seedingVisits(db: Db, companyId: number, range: Range): Promise<SeedingVisitRow[]> {
  const rows = await db("service_visits as v")
    .join("properties as p", "p.id", "v.property_id")
    .join("customers as c", "c.id", "p.customer_id")
    .leftJoin("users as t", "t.id", "v.technician_id")
    .where("c.company_id", companyId)
    .whereBetween("v.visit_date", [range.from, range.to])
    .whereRaw(isSeeding("v.services"), [seedingServices])
    .select<{ id: number; visit_date: string; services: string[]; technician_id: number | null; technician_name: string | null; customer_id: number }[]>(
      "v.id", "v.visit_date", "v.services", "v.technician_id", "t.name as technician_name", "c.id as customer_id",
    );
  return rows.map((r) => ({ id: r.id, visitDate: r.visit_date, services: r.services, technicianId: r.technician_id, technicianName: r.technician_name, customerId: r.customer_id }));
}

/**
 * Callbacks with the visit they came from: the visit of their care plan, or without a plan
 * the lawn's latest seeding visit on or before the day the callback was booked. Only those
 * whose original visit falls in the range are read.
 */
export async function callbacksOfRange(db: Db, companyId: number, range: Range): Promise<CallbackRow[]> {
  const { rows } = await db.raw<{ rows: { id: number; origin_visit_id: number; customer_id: number; reason: FollowUpReason; labour_hours: string | null; materials_cost: string | null }[] }>(
    `
    select f.id, origin.id as origin_visit_id, c.id as customer_id, f.reason, f.labour_hours, f.materials_cost
    from follow_up_visits f
    join properties p on p.id = f.property_id
    join customers c on c.id = p.customer_id
    left join care_plans cp on cp.id = f.plan_id
    left join lateral (
      select v.id from service_visits v
      where v.property_id = f.property_id
        and v.visit_date <= (f.created_at at time zone p.time_zone)::date
        and ${isSeeding("v.services")}
      order by v.visit_date desc, v.id desc
      limit 1
    ) latest on cp.id is null
    join service_visits origin on origin.id = coalesce(cp.visit_id, latest.id)
    where c.company_id = ? and f.is_callback and origin.visit_date between ? and ?
    `,
    [seedingServices, companyId, range.from, range.to],
  );
  return rows.map((r) => ({
    id: r.id,
    originVisitId: r.origin_visit_id,
    customerId: r.customer_id,
    reason: r.reason,
    labourHours: r.labour_hours === null ? null : Number(r.labour_hours),
    materialsCost: r.materials_cost === null ? null : Number(r.materials_cost),
  }));
}

/**
 * Hours from each question asked in the range (by the company's calendar) to the first
 * answer after it in the same conversation; null while unanswered. The messages and
 * conversations tables belong to the questions feature: until they exist this returns null.
 */
export async function answerWaits(db: Db, companyId: number, timeZone: string, range: Range): Promise<AnswerWaitRow[] | null> {
  const [messages, conversations] = await Promise.all([db.schema.hasTable("messages"), db.schema.hasTable("conversations")]);
  if (!messages || !conversations) return null;
  const { rows } = await db.raw<{ rows: { month: string; hours: string | null }[] }>(
    `
    select to_char((q.created_at at time zone ?)::date, 'YYYY-MM') as month,
      extract(epoch from (
        select min(a.created_at) from messages a
        where a.conversation_id = q.conversation_id and a.kind = 'answer' and a.created_at >= q.created_at
      ) - q.created_at) / 3600.0 as hours
    from messages q
    join conversations cv on cv.id = q.conversation_id
    join care_plans cp on cp.id = cv.plan_id
    join properties p on p.id = cp.property_id
    join customers c on c.id = p.customer_id
    where c.company_id = ? and q.kind = 'question'
      and (q.created_at at time zone ?)::date between ? and ?
    `,
    [timeZone, companyId, timeZone, range.from, range.to],
  );
  return rows.map((r) => ({ month: r.month, hours: r.hours === null ? null : Number(r.hours) }));
}

/**
 * Per care plan of the range's seeding visits: steps already due (dated on or before today
 * at the lawn, which also stops at the plan's end) and how many of those were done.
 */
export async function planSteps(db: Db, companyId: number, range: Range): Promise<PlanStepsRow[]> {
  const { rows } = await db.raw<{ rows: { customer_id: number; plan_id: number; due: string; done: string }[] }>(
    `
    select c.id as customer_id, cp.id as plan_id,
      count(s.id) filter (where s.date <= (now() at time zone p.time_zone)::date) as due,
      count(s.id) filter (where s.date <= (now() at time zone p.time_zone)::date and s.state = 'done') as done
    from care_plans cp
    join service_visits v on v.id = cp.visit_id
    join properties p on p.id = cp.property_id
    join customers c on c.id = p.customer_id
    left join plan_steps s on s.plan_id = cp.id
    where c.company_id = ? and cp.status = 'active' and v.visit_date between ? and ? and ${isSeeding("v.services")}
    group by c.id, cp.id
    `,
    [companyId, range.from, range.to, seedingServices],
  );
  return rows.map((r) => ({ customerId: r.customer_id, planId: r.plan_id, stepsDue: Number(r.due), stepsDone: Number(r.done) }));
}
