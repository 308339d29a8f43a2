import type { Knex } from "knex";
import type { Db } from "../../db.ts";

export type FeedRow = { id: number; token_sealed: string };

export async function findActiveFeed(db: Db | Knex.Transaction, customerId: number): Promise<FeedRow | undefined> {
  return db("calendar_feeds").where({ customer_id: customerId }).whereNull("revoked_at").first<FeedRow | undefined>("id", "token_sealed");
}

/** Serialises feed changes of one customer across server processes (row lock until commit). */
export async function lockCustomer(trx: Knex.Transaction, customerId: number): Promise<void> {
  await trx("customers").where({ id: customerId }).forUpdate().first("id");
}

export async function revokeActiveFeeds(trx: Knex.Transaction, customerId: number): Promise<void> {
  await trx("calendar_feeds").where({ customer_id: customerId }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
}

export async function insertFeed(trx: Knex.Transaction, customerId: number, tokenHash: string, tokenSealed: string): Promise<void> {
  await trx("calendar_feeds").insert({ customer_id: customerId, token_hash: tokenHash, token_sealed: tokenSealed });
}

/** The customer of a live feed, with the company name the calendar is titled with. */
export async function findFeedOwner(db: Db, tokenHash: string): Promise<{ customerId: number; companyName: string } | undefined> {
  const row = await db("calendar_feeds")
    .join("customers", "customers.id", "calendar_feeds.customer_id")
    .join("companies", "companies.id", "customers.company_id")
    .join("users", "users.id", "customers.user_id")
    .where("calendar_feeds.token_hash", tokenHash)
    .whereNull("calendar_feeds.revoked_at")
    // A deactivated account's feed stops too.
    .andWhere("users.active", true)
    .first<{ customer_id: number; company_name: string } | undefined>("customers.id as customer_id", "companies.name as company_name");
  return row ? { customerId: row.customer_id, companyName: row.company_name } : undefined;
}

export type FeedPlan = { planId: number; timeZone: string; street: string; holdOffs: unknown[] };
export type FeedStep = { planId: number; key: string; date: string; kind: string; title: string; state: string; content: Record<string, unknown> };

export type FeedVisit = {
  id: number;
  date: string;
  arrivalStart: string | null;
  arrivalEnd: string | null;
  timeZone: string;
  street: string;
  reason: string;
  technicianName: string | null;
  customerPrep: string | null;
};

/** The customer's booked follow-up visits that have a date, on any of their lawns. */
export async function loadFeedVisits(db: Db, customerId: number): Promise<FeedVisit[]> {
  const rows = await db("follow_up_visits as f")
    .join("properties", "properties.id", "f.property_id")
    .leftJoin("users as technician", "technician.id", "f.technician_id")
    .where({ "properties.customer_id": customerId, "f.status": "scheduled" })
    .whereNotNull("f.scheduled_for")
    .orderBy([{ column: "f.scheduled_for" }, { column: "f.id" }])
    .select<{ id: number; date: string; arrival_start: string | null; arrival_end: string | null; time_zone: string; street: string; reason: string; technician_first_name: string | null; customer_prep: string | null }[]>(
      "f.id", db.raw("to_char(f.scheduled_for, 'YYYY-MM-DD') as date"), "f.arrival_start", "f.arrival_end", "properties.time_zone", "properties.street",
      "f.reason", db.raw("split_part(technician.name, ' ', 1) as technician_first_name"), "f.customer_prep",
    );
  return rows.map((r) => ({
    id: r.id, date: r.date, arrivalStart: r.arrival_start, arrivalEnd: r.arrival_end, timeZone: r.time_zone, street: r.street,
    reason: r.reason, technicianName: r.technician_first_name, customerPrep: r.customer_prep,
  }));
}

/** The customer's active care plans and their steps (skipped steps left out: nothing to do then). */
export async function loadFeedPlans(db: Db, customerId: number): Promise<{ plans: FeedPlan[]; steps: FeedStep[] }> {
  const planRows = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .where({ "properties.customer_id": customerId, "care_plans.status": "active" })
    .orderBy("care_plans.id")
    .select<{ id: number; time_zone: string; street: string; hold_offs: unknown[] }[]>(
      "care_plans.id", "properties.time_zone", "properties.street", "care_plans.hold_offs",
    );
  const plans = planRows.map((p) => ({ planId: p.id, timeZone: p.time_zone, street: p.street, holdOffs: Array.isArray(p.hold_offs) ? p.hold_offs : [] }));
  if (plans.length === 0) return { plans, steps: [] };
  const stepRows = await db("plan_steps")
    .whereIn("plan_id", plans.map((p) => p.planId))
    .whereNot("state", "skipped")
    .orderBy([{ column: "date" }, { column: "id" }])
    .select<{ plan_id: number; key: string; date: string; kind: string; title: string; state: string; content: Record<string, unknown> }[]>(
      "plan_id", "key", db.raw("to_char(date, 'YYYY-MM-DD') as date"), "kind", "title", "state", "content",
    );
  return {
    plans,
    steps: stepRows.map((s) => ({ planId: s.plan_id, key: s.key, date: s.date, kind: s.kind, title: s.title, state: s.state, content: s.content ?? {} })),
  };
}
