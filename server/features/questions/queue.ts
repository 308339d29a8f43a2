import type { OpenQuestion } from "#shared/schemas/question-queue";
import type { Db } from "../../db.ts";

/** Enough for a screen; a company with more open questions than this has a bigger problem. */
const QUEUE_LIMIT = 200;

/**
 * Open questions of a company, oldest first, read through the partial index on open
 * questions. Overdue is decided in SQL against the company's answer target.
 */
export async function openQuestions(db: Db, companyId: number): Promise<OpenQuestion[]> {
  const rows = await db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("companies", "companies.id", "customers.company_id")
    .where({ "messages.kind": "question", "customers.company_id": companyId })
    .whereNull("messages.resolved_at")
    .orderBy([{ column: "messages.created_at" }, { column: "messages.id" }])
    .limit(QUEUE_LIMIT)
    .select<{ id: string; plan_id: number; first_name: string; last_name: string; street: string; text: string; created_at: Date; overdue: boolean; photo_count: string; first_photo_id: string | null }[]>(
      "messages.id", "care_plans.id as plan_id", "customers.first_name", "customers.last_name", "properties.street",
      "messages.text", "messages.created_at",
      db.raw("messages.created_at + make_interval(hours => companies.answer_target_hours) < now() as overdue"),
      db.raw("(select count(*) from photos where photos.message_id = messages.id) as photo_count"),
      db.raw("(select photos.id from photos where photos.message_id = messages.id and photos.position = 0) as first_photo_id"),
    );
  return rows.map((r) => ({
    messageId: Number(r.id),
    planId: r.plan_id,
    customerName: `${r.first_name} ${r.last_name}`,
    street: r.street,
    text: r.text,
    photoCount: Number(r.photo_count),
    thumbUrl: r.first_photo_id ? `/api/photos/${r.first_photo_id}/thumb` : null,
    askedAt: r.created_at.toISOString(),
    overdue: r.overdue,
  }));
}
