import type { Knex } from "knex";
import type { Db } from "../../db.ts";

/** The conversation a reply token belongs to, with the homeowner it is for. */
export type ReplyTarget = {
  conversationId: number;
  planId: number;
  companyId: number;
  customerUserId: number;
  customerEmail: string | null;
  /** The homeowner's language for automatic e-mails. */
  language: "en" | "es";
};

export async function replyTarget(db: Db, token: string): Promise<ReplyTarget | undefined> {
  const row = await db("conversations")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("users", "users.id", "customers.user_id")
    .leftJoin("notification_preferences", "notification_preferences.customer_id", "customers.id")
    .where("conversations.reply_token", token)
    .first<{ conversation_id: number; plan_id: number; company_id: number; user_id: number; email: string | null; language: string | null } | undefined>(
      "conversations.id as conversation_id", "care_plans.id as plan_id", "customers.company_id", "users.id as user_id", "users.email",
      "notification_preferences.language",
    );
  return (
    row && {
      conversationId: row.conversation_id,
      planId: row.plan_id,
      companyId: row.company_id,
      customerUserId: row.user_id,
      customerEmail: row.email,
      language: row.language === "es" ? "es" : "en",
    }
  );
}

export async function emailAlreadyFiled(db: Db, externalId: string): Promise<boolean> {
  const row = await db("messages").where({ source: "email", external_id: externalId }).first("id");
  return Boolean(row);
}

/** A staff-only note written by the system (no author) in the same thread. */
export async function insertSystemNote(trx: Knex.Transaction, conversationId: number, text: string): Promise<void> {
  await trx("messages").insert({ conversation_id: conversationId, kind: "note", author_user_id: null, text, source: "email" });
}

/**
 * The company of a sender we know as a homeowner, when exactly one company has them: an unmatched
 * e-mail (e.g. a mistyped token) then reaches that company's managers instead of nobody.
 */
export async function companyOfSender(db: Db, email: string): Promise<number | null> {
  const companies = await db("customers")
    .join("users", "users.id", "customers.user_id")
    .whereRaw("lower(users.email) = ?", [email.toLowerCase()])
    .distinct()
    .pluck<number[]>("customers.company_id");
  return companies.length === 1 ? companies[0]! : null;
}

/** Kept for managers instead of dropped; the same e-mail delivered twice is kept once. */
export async function keepUnmatched(
  db: Db,
  email: { companyId: number | null; sender: string; body: string; mediaCount: number; externalId: string },
): Promise<void> {
  await db.raw(
    `INSERT INTO unmatched_inbound (company_id, channel, sender, body, media_count, external_id)
     VALUES (?, 'email', ?, ?, ?, ?)
     ON CONFLICT (channel, external_id) WHERE external_id IS NOT NULL DO NOTHING`,
    [email.companyId, email.sender, email.body, email.mediaCount, email.externalId],
  );
}
