import type { UnmatchedInbound } from "#shared/schemas/unmatched-inbound";
import type { Db } from "../../db.ts";

/** Enough for a screen: everything still open, and what was handled in the last month. */
const LIST_LIMIT = 200;
const HANDLED_SHOWN_DAYS = 30;

type Row = {
  id: string;
  channel: "sms" | "email";
  sender: string;
  body: string;
  media_count: number;
  received_at: Date;
  handled_at: Date | null;
  handled_by_name: string | null;
  customer_id: number | null;
  customer_first: string | null;
  customer_last: string | null;
};

const toItem = (r: Row): UnmatchedInbound => ({
  id: Number(r.id),
  channel: r.channel,
  sender: r.sender,
  body: r.body,
  mediaCount: r.media_count,
  receivedAt: r.received_at.toISOString(),
  handledAt: r.handled_at?.toISOString() ?? null,
  handledByName: r.handled_by_name,
  customer: r.customer_id === null ? null : { id: r.customer_id, name: `${r.customer_first ?? ""} ${r.customer_last ?? ""}`.trim() },
});

function itemQuery(db: Db, companyId: number) {
  // The sender may still be a customer of this company (one with no active plan): staff see who.
  return db("unmatched_inbound")
    .leftJoin("users as handler", "handler.id", "unmatched_inbound.handled_by")
    .joinRaw(
      `left join lateral (
         select customers.id, customers.first_name, customers.last_name from users
         join customers on customers.user_id = users.id
         where customers.company_id = unmatched_inbound.company_id and users.role = 'customer'
           and ((unmatched_inbound.channel = 'sms' and users.phone = unmatched_inbound.sender)
             or (unmatched_inbound.channel = 'email' and lower(users.email) = lower(unmatched_inbound.sender)))
         limit 1
       ) as customer on true`,
    )
    .where("unmatched_inbound.company_id", companyId)
    .select(
      "unmatched_inbound.id", "unmatched_inbound.channel", "unmatched_inbound.sender", "unmatched_inbound.body",
      "unmatched_inbound.media_count", "unmatched_inbound.received_at", "unmatched_inbound.handled_at",
      "handler.name as handled_by_name", "customer.id as customer_id", "customer.first_name as customer_first", "customer.last_name as customer_last",
    );
}

/** Open ones first (newest first), then the recently handled. */
export async function listUnmatched(db: Db, companyId: number): Promise<UnmatchedInbound[]> {
  const rows: Row[] = await itemQuery(db, companyId)
    .where((q) => q.whereNull("unmatched_inbound.handled_at").orWhere("unmatched_inbound.handled_at", ">", db.raw("now() - make_interval(days => ?)", [HANDLED_SHOWN_DAYS])))
    .orderByRaw("(unmatched_inbound.handled_at is not null), unmatched_inbound.received_at desc, unmatched_inbound.id desc")
    .limit(LIST_LIMIT);
  return rows.map(toItem);
}

/** Marks one handled (once: the first manager's name and time stay); undefined when not the company's. */
export async function markHandled(db: Db, companyId: number, id: number, userId: number): Promise<UnmatchedInbound | undefined> {
  await db("unmatched_inbound").where({ id, company_id: companyId }).whereNull("handled_at").update({ handled_at: db.fn.now(), handled_by: userId });
  const row: Row | undefined = await itemQuery(db, companyId).where("unmatched_inbound.id", id).first();
  return row && toItem(row);
}
