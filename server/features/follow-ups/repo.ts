import type { Knex } from "knex";
import type { CustomerResponse, FollowUp, FollowUpFilter, FollowUpOutcome, FollowUpReason, FollowUpStatus } from "#shared/schemas/follow-ups";
import type { Db } from "../../db.ts";

type Row = {
  id: number;
  property_id: number;
  street: string;
  customer_id: number;
  first_name: string;
  last_name: string;
  plan_id: number | null;
  question_message_id: string | null;
  status: FollowUpStatus;
  follow_up_date: string;
  scheduled_for: string | null;
  technician_id: number | null;
  technician_name: string | null;
  reason: FollowUpReason;
  reason_note: string | null;
  is_callback: boolean;
  labour_hours: string | null;
  materials_cost: string | null;
  outcome: FollowUpOutcome;
  outcome_note: string | null;
  created_by_name: string | null;
  created_at: Date;
  updated_at: Date;
  arrival_start: string | null;
  arrival_end: string | null;
  customer_prep: string | null;
  work_done: string | null;
  customer_response: CustomerResponse | null;
  customer_responded_at: Date | null;
};

const numberOrNull = (value: string | null) => (value === null ? null : Number(value));

export const toFollowUp = (r: Row): FollowUp => ({
  id: r.id,
  propertyId: r.property_id,
  street: r.street,
  customerId: r.customer_id,
  customerName: `${r.first_name} ${r.last_name}`,
  planId: r.plan_id,
  questionMessageId: numberOrNull(r.question_message_id),
  status: r.status,
  date: r.follow_up_date,
  scheduledFor: r.scheduled_for,
  technicianId: r.technician_id,
  technicianName: r.technician_name,
  reason: r.reason,
  reasonNote: r.reason_note,
  isCallback: r.is_callback,
  labourHours: numberOrNull(r.labour_hours),
  materialsCost: numberOrNull(r.materials_cost),
  outcome: r.outcome,
  outcomeNote: r.outcome_note,
  createdByName: r.created_by_name,
  createdAt: r.created_at.toISOString(),
  updatedAt: r.updated_at.toISOString(),
  arrivalStart: r.arrival_start,
  arrivalEnd: r.arrival_end,
  customerPrep: r.customer_prep,
  workDone: r.work_done,
  customerResponse: r.customer_response,
  customerRespondedAt: r.customer_responded_at?.toISOString() ?? null,
});

/** The follow-up's date: the day it is scheduled for, else the day it was requested at the lawn. */
const followUpDate = "coalesce(f.scheduled_for, (f.created_at at time zone properties.time_zone)::date)";

const sortColumns: Record<FollowUpFilter["sort"], string> = {
  date: followUpDate,
  status: "f.status",
  reason: "f.reason",
  technician: "technician.name",
  customer: "customers.last_name",
  createdAt: "f.created_at",
  labourHours: "f.labour_hours",
  materialsCost: "f.materials_cost",
};

/** The company's follow-ups, joined to what the table shows; no columns selected yet. */
function scoped(db: Db, companyId: number) {
  return db("follow_up_visits as f")
    .join("properties", "properties.id", "f.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .leftJoin("users as technician", "technician.id", "f.technician_id")
    .leftJoin("users as creator", "creator.id", "f.created_by")
    .where("customers.company_id", companyId);
}

function selectColumns(query: Knex.QueryBuilder, db: Db) {
  return query.select(
    "f.id", "f.property_id", "properties.street", "customers.id as customer_id", "customers.first_name", "customers.last_name",
    "f.plan_id", "f.question_message_id", "f.status", db.raw(`${followUpDate} as follow_up_date`), "f.scheduled_for",
    "f.technician_id", "technician.name as technician_name", "f.reason", "f.reason_note", "f.is_callback", "f.labour_hours",
    "f.materials_cost", "f.outcome", "f.outcome_note", "creator.name as created_by_name", "f.created_at", "f.updated_at",
    "f.arrival_start", "f.arrival_end", "f.customer_prep", "f.work_done", "f.customer_response", "f.customer_responded_at",
  );
}

function applyFilter(query: Knex.QueryBuilder, db: Db, filter: Partial<FollowUpFilter>) {
  if (filter.status) query.andWhere("f.status", filter.status);
  if (filter.reason) query.andWhere("f.reason", filter.reason);
  if (filter.technicianId) query.andWhere("f.technician_id", filter.technicianId);
  if (filter.callback !== undefined) query.andWhere("f.is_callback", filter.callback);
  if (filter.from) query.andWhere(db.raw(followUpDate), ">=", filter.from);
  if (filter.to) query.andWhere(db.raw(followUpDate), "<=", filter.to);
  return query;
}

export async function listFollowUps(
  db: Db,
  companyId: number,
  filter: FollowUpFilter,
  page: { limit: number; offset: number },
): Promise<{ rows: FollowUp[]; total: number }> {
  const sort = sortColumns[filter.sort];
  const rowsQuery = selectColumns(applyFilter(scoped(db, companyId), db, filter), db)
    .orderByRaw(`${sort} ${filter.order} nulls last, f.id ${filter.order}`)
    .limit(page.limit)
    .offset(page.offset);
  const countQuery = applyFilter(scoped(db, companyId), db, filter).count<{ n: string }[]>({ n: "*" });
  const [rows, counted] = await Promise.all([rowsQuery, countQuery]);
  return { rows: (rows as Row[]).map(toFollowUp), total: Number(counted[0]?.n ?? 0) };
}

export async function findFollowUp(db: Db, companyId: number, id: number): Promise<FollowUp | undefined> {
  const row = (await selectColumns(scoped(db, companyId), db).where("f.id", id).first()) as Row | undefined;
  return row ? toFollowUp(row) : undefined;
}

/** Locks the row for the rest of the transaction, so two edits of one follow-up apply one after the other. */
export async function lockFollowUp(trx: Db, companyId: number, id: number): Promise<boolean> {
  const row = await trx("follow_up_visits as f")
    .join("properties", "properties.id", "f.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("f.id", id)
    .andWhere("customers.company_id", companyId)
    .forUpdate("f")
    .first("f.id");
  return row !== undefined;
}

export type FollowUpColumns = {
  property_id: number;
  plan_id: number | null;
  question_message_id: number | null;
  status: FollowUpStatus;
  scheduled_for: string | null;
  technician_id: number | null;
  reason: FollowUpReason;
  reason_note: string | null;
  is_callback: boolean;
  labour_hours: number | null;
  materials_cost: number | null;
  outcome: FollowUpOutcome;
  outcome_note: string | null;
  created_by: number | null;
  arrival_start: string | null;
  arrival_end: string | null;
  customer_prep: string | null;
  work_done: string | null;
  customer_response: CustomerResponse | null;
  customer_responded_at: Date | null;
};

export async function insertFollowUp(trx: Db, row: Partial<FollowUpColumns> & Pick<FollowUpColumns, "property_id" | "reason">): Promise<number> {
  const [created] = await trx("follow_up_visits").insert(row).returning<{ id: number }[]>("id");
  return created!.id;
}

export async function updateFollowUp(trx: Db, id: number, changes: Partial<FollowUpColumns>): Promise<void> {
  const defined = Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined));
  await trx("follow_up_visits").where({ id }).update({ ...defined, updated_at: trx.fn.now() });
}

/** A plan of this property (and so of the company); undefined when it is not. */
export async function planOfProperty(db: Db, planId: number, propertyId: number): Promise<boolean> {
  return (await db("care_plans").where({ id: planId, property_id: propertyId }).first("id")) !== undefined;
}

export async function isActiveStaff(db: Db, companyId: number, userId: number): Promise<boolean> {
  const row = await db("users").where({ id: userId, company_id: companyId, active: true }).whereIn("role", ["technician", "manager"]).first("id");
  return row !== undefined;
}

/**
 * The care plan a question was asked on, when the question is of this company. The
 * questions feature owns the messages table; until it exists this answers "unknown"
 * (null) rather than failing, and the id is stored unchecked.
 */
export async function planOfQuestion(db: Db, companyId: number, messageId: number): Promise<number | undefined | null> {
  if (!(await db.schema.hasTable("messages"))) return null;
  const row = await db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("messages.id", messageId)
    .andWhere("messages.kind", "question")
    .andWhere("customers.company_id", companyId)
    .first<{ plan_id: number } | undefined>("conversations.plan_id");
  return row?.plan_id;
}

/** Rows for the CSV export: the same filters, no paging, with a hard ceiling. */
export async function exportFollowUps(db: Db, companyId: number, filter: FollowUpFilter, max: number): Promise<FollowUp[]> {
  const rows = await selectColumns(applyFilter(scoped(db, companyId), db, filter), db)
    .orderByRaw(`${sortColumns[filter.sort]} ${filter.order} nulls last, f.id ${filter.order}`)
    .limit(max);
  return (rows as Row[]).map(toFollowUp);
}

export async function followUpsOfCustomer(db: Db, companyId: number, customerId: number): Promise<FollowUp[]> {
  const rows = await selectColumns(scoped(db, companyId), db).andWhere("customers.id", customerId).orderBy("f.created_at", "desc");
  return (rows as Row[]).map(toFollowUp);
}

/** The property's newest active care plan: where news of a visit booked without a plan goes. */
export async function newestActivePlan(db: Db, propertyId: number): Promise<number | null> {
  const row = await db("care_plans").where({ property_id: propertyId, status: "active" }).orderBy("id", "desc").first<{ id: number } | undefined>("id");
  return row?.id ?? null;
}
