import type { Db } from "../../db.ts";

export type Texter = { customerId: number; userId: number; companyId: number; senderName: string; companyName: string; companyPhone: string | null };
export type Company = { companyId: number | null; senderName: string; companyName: string; companyPhone: string | null };

/** The customer whose mobile number texted us (numbers are unique across users, stored in E.164). */
export async function findTexter(db: Db, phone: string): Promise<Texter | undefined> {
  const row = await db("users")
    .join("customers", "customers.user_id", "users.id")
    .join("companies", "companies.id", "customers.company_id")
    .where({ "users.phone": phone, "users.role": "customer" })
    .first<{ customer_id: number; user_id: number; company_id: number; sms_sender_name: string; name: string; phone: string | null } | undefined>(
      "customers.id as customer_id",
      "users.id as user_id",
      "companies.id as company_id",
      "companies.sms_sender_name",
      "companies.name",
      "companies.phone",
    );
  return (
    row && { customerId: row.customer_id, userId: row.user_id, companyId: row.company_id, senderName: row.sms_sender_name, companyName: row.name, companyPhone: row.phone }
  );
}

/**
 * A number we don't know is answered in the name of the company this deployment (and so its SMS
 * number) serves: the oldest, as GET /api/company has it.
 */
export async function fallbackCompany(db: Db): Promise<Company> {
  const company = await db("companies").orderBy("id").first<{ id: number; sms_sender_name: string; name: string; phone: string | null } | undefined>("id", "sms_sender_name", "name", "phone");
  return company
    ? { companyId: company.id, senderName: company.sms_sender_name, companyName: company.name, companyPhone: company.phone }
    : { companyId: null, senderName: "Sproutline", companyName: "your lawn care company", companyPhone: null };
}

/**
 * The plan a text is about: the customer's newest active plan (a customer with two lawns texting
 * from one phone is filed on the most recent service; staff see the thread and can follow up).
 */
export async function currentPlanId(db: Db, customerId: number): Promise<number | undefined> {
  const row = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .where({ "properties.customer_id": customerId, "care_plans.status": "active" })
    .orderBy([{ column: "care_plans.created_at", order: "desc" }, { column: "care_plans.id", order: "desc" }])
    .first<{ id: number } | undefined>("care_plans.id");
  return row?.id;
}

export async function textAlreadyFiled(db: Db, messageSid: string): Promise<boolean> {
  const row = await db("messages").where({ source: "sms", external_id: messageSid }).first("id");
  if (row) return true;
  return Boolean(await db("unmatched_inbound").where({ channel: "sms", external_id: messageSid }).first("id"));
}

/** Keeps an unmatched text; undefined when the same MessageSid was already kept (a repeated webhook). */
export async function insertUnmatched(
  db: Db,
  text: { companyId: number | null; sender: string; body: string; mediaCount: number; messageSid: string | null },
): Promise<number | undefined> {
  const result = await db.raw<{ rows: { id: string }[] }>(
    `insert into unmatched_inbound (company_id, channel, sender, body, media_count, external_id)
     values (?, 'sms', ?, ?, ?, ?)
     on conflict (channel, external_id) where external_id is not null do nothing
     returning id`,
    [text.companyId, text.sender, text.body, text.mediaCount, text.messageSid],
  );
  const id = result.rows[0]?.id;
  return id === undefined ? undefined : Number(id);
}

/** Whether this number already sent us an unmatched text (other than `exceptId`) within the window. */
export async function unmatchedRecently(db: Db, sender: string, exceptId: number, hours: number): Promise<boolean> {
  const row = await db("unmatched_inbound")
    .where({ channel: "sms", sender })
    .whereNot({ id: exceptId })
    .where("received_at", ">", db.raw("now() - make_interval(hours => ?)", [hours]))
    .first("id");
  return Boolean(row);
}

