import {
  CUSTOMER_REMINDERS_LIMIT, type CustomerConversation, type CustomerReminder, type CustomerSummary, type CustomerVisit,
} from "#shared/schemas/customers";
import type { ApplicationRecord, VisitConditions } from "#shared/schemas/visits";
import type { Db } from "../../db.ts";

type CustomerRow = {
  id: number; first_name: string; last_name: string; email: string | null; phone: string | null;
  external_ref: string | null; created_at: Date;
};

/** Makes typed text match literally inside LIKE: %, _ and \ lose their wildcard meaning. */
export const likeLiteral = (text: string) => text.replace(/[\\%_]/g, "\\$&");

function customersOf(db: Db, companyId: number) {
  return db("customers as c")
    .join("users as u", "u.id", "c.user_id")
    .where("c.company_id", companyId)
    .select<CustomerRow[]>("c.id", "c.first_name", "c.last_name", "u.email", "u.phone", "c.external_ref", "c.created_at");
}

export async function searchCustomers(db: Db, companyId: number, q: string, limit: number): Promise<CustomerSummary[]> {
  const query = customersOf(db, companyId).orderBy(["c.last_name", "c.first_name", "c.id"]).limit(limit);
  if (q) {
    const pattern = `%${likeLiteral(q)}%`;
    // Phone numbers are stored in E.164; "(330) 555-0111" finds +13305550111 by its digits.
    const digits = q.replace(/\D/g, "");
    query.andWhere((w) => {
      w.whereRaw("(c.first_name || ' ' || c.last_name) ilike ?", [pattern])
        .orWhereRaw("u.email::text ilike ?", [pattern])
        .orWhereRaw("c.external_ref ilike ?", [pattern])
        .orWhereExists(db("properties as p").whereRaw("p.customer_id = c.id").andWhereRaw("p.street ilike ?", [pattern]));
      if (digits.length >= 3) w.orWhereRaw("regexp_replace(coalesce(u.phone, ''), '\\D', '', 'g') like ?", [`%${digits}%`]);
    });
  }
  const rows = await query;
  const ids = rows.map((r) => r.id);
  const [properties, plans] = await Promise.all([
    db("properties").whereIn("customer_id", ids).orderBy("id").select<{ id: number; customer_id: number; label: string; street: string; town: string }[]>("id", "customer_id", "label", "street", "town"),
    db("care_plans as cp")
      .join("properties as p", "p.id", "cp.property_id")
      .whereIn("p.customer_id", ids)
      .andWhere("cp.status", "active")
      .groupBy("p.customer_id")
      .select<{ customer_id: number; n: string }[]>("p.customer_id", db.raw("count(*) as n")),
  ]);
  return rows.map((r) => ({
    ...toCustomer(r),
    properties: properties.filter((p) => p.customer_id === r.id).map(({ customer_id: _c, ...p }) => p),
    activePlans: Number(plans.find((p) => p.customer_id === r.id)?.n ?? 0),
  }));
}

const toCustomer = (r: CustomerRow) => ({
  id: r.id, firstName: r.first_name, lastName: r.last_name, email: r.email, phone: r.phone, externalRef: r.external_ref,
});

export async function findCustomer(db: Db, companyId: number, id: number) {
  const row = await customersOf(db, companyId).where("c.id", id).first();
  return row ? { ...toCustomer(row), createdAt: row.created_at.toISOString() } : undefined;
}

export async function visitsOfCustomer(db: Db, customerId: number): Promise<CustomerVisit[]> {
  const rows = await db("service_visits as v")
    .join("properties as p", "p.id", "v.property_id")
    .leftJoin("users as t", "t.id", "v.technician_id")
    .leftJoin("care_plans as cp", "cp.visit_id", "v.id")
    .where("p.customer_id", customerId)
    .orderBy([{ column: "v.visit_date", order: "desc" }, { column: "v.id", order: "desc" }])
    .select<{
      id: number; property_id: number; visit_date: string; services: string[]; technician_name: string | null; notes: string | null; plan_id: number | null;
      conditions: VisitConditions | null; application_record: ApplicationRecord | null;
    }[]>(
      "v.id", "v.property_id", "v.visit_date", "v.services", "t.name as technician_name", "v.notes", "cp.id as plan_id",
      "v.conditions", "v.application_record",
    );
  return rows.map((r) => ({
    id: r.id, propertyId: r.property_id, visitDate: r.visit_date, services: r.services, technicianName: r.technician_name, notes: r.notes, planId: r.plan_id,
    conditions: r.conditions, applicationRecord: r.application_record,
  }));
}

/** Each of the customer's plan threads: how many messages, how many questions still open, the latest. */
export async function conversationsOfCustomer(db: Db, customerId: number): Promise<CustomerConversation[]> {
  const rows = await db("conversations as c")
    .join("care_plans as cp", "cp.id", "c.plan_id")
    .join("properties as p", "p.id", "cp.property_id")
    .leftJoin("messages as m", "m.conversation_id", "c.id")
    .where("p.customer_id", customerId)
    .groupBy("c.id", "c.plan_id")
    .orderByRaw("max(m.created_at) desc nulls last, c.plan_id desc")
    .select<{ plan_id: number; message_count: string; open_questions: string; last_message_at: Date | null }[]>(
      "c.plan_id",
      db.raw("count(m.id) as message_count"),
      db.raw("count(m.id) filter (where m.kind = 'question' and m.resolved_at is null) as open_questions"),
      db.raw("max(m.created_at) as last_message_at"),
    );
  return rows.map((r) => ({
    planId: r.plan_id,
    messageCount: Number(r.message_count),
    openQuestions: Number(r.open_questions),
    lastMessageAt: r.last_message_at ? r.last_message_at.toISOString() : null,
  }));
}

/**
 * The customer's most recent reminders (by due time) with their delivery state. `local_time` is
 * the time the plan asked for; `due_at` is when the worker really sends it (held to the allowed
 * hours), so the page shows `due_at` on the lawn's clock.
 */
export async function remindersOfCustomer(db: Db, customerId: number): Promise<CustomerReminder[]> {
  const rows = await db("reminders")
    .where({ customer_id: customerId })
    .orderBy([{ column: "due_at", order: "desc" }, { column: "id", order: "desc" }])
    .limit(CUSTOMER_REMINDERS_LIMIT)
    .select<{
      id: string | number; plan_id: number; kind: CustomerReminder["kind"]; channel: CustomerReminder["channel"]; local_date: string; local_time: string;
      due_at: Date; send_date: string; send_time: string; time_zone: string; state: CustomerReminder["state"]; attempts: number;
      last_error: string | null; sent_at: Date | null; fallback_for: string | number | null;
    }[]>(
      "id", "plan_id", "kind", "channel", "local_date", "local_time", "due_at", "time_zone", "fallback_for", "state", "attempts", "last_error", "sent_at",
      db.raw("to_char(due_at at time zone time_zone, 'YYYY-MM-DD') as send_date"),
      db.raw("to_char(due_at at time zone time_zone, 'HH24:MI') as send_time"),
    );
  return rows.map((r) => ({
    id: Number(r.id), planId: r.plan_id, kind: r.kind, channel: r.channel, localDate: r.local_date, localTime: r.local_time,
    dueAt: r.due_at.toISOString(), sendDate: r.send_date, sendTime: r.send_time, timeZone: r.time_zone,
    // A fallback on the other channel is due when the first one failed, not because of the hours.
    heldForQuietHours: r.fallback_for === null && (r.send_date !== r.local_date || r.send_time !== r.local_time),
    state: r.state, attempts: r.attempts, lastError: r.last_error, sentAt: r.sent_at ? r.sent_at.toISOString() : null,
  }));
}
