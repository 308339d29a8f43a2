import type { Db } from "../../db.ts";

export type PlanUnread = { planId: number; unread: number };

/**
 * One query, per plan of the customer: messages newer than the homeowner's "last read" mark
 * that the company wrote (staff answers and system messages; not the homeowner's own, never
 * staff-only notes). The same rule the thread uses for its "new" marks, so opening the
 * thread brings the count to zero. Uses the (conversation_id, created_at) index per plan.
 */
export async function unreadByPlan(db: Db, customerId: number): Promise<PlanUnread[]> {
  const rows = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("conversations", "conversations.plan_id", "care_plans.id")
    .join("messages", function () {
      this.on("messages.conversation_id", "conversations.id").andOn(
        "messages.created_at",
        ">",
        db.raw("coalesce(conversations.customer_last_read_at, '-infinity')"),
      );
    })
    .leftJoin("users", "users.id", "messages.author_user_id")
    .where("properties.customer_id", customerId)
    .whereNot("messages.kind", "note")
    .whereRaw("coalesce(users.role::text, 'system') <> 'customer'")
    .groupBy("care_plans.id")
    .orderBy("care_plans.id")
    .select<{ plan_id: number; unread: string }[]>("care_plans.id as plan_id", db.raw("count(*) as unread"));
  return rows.map((r) => ({ planId: Number(r.plan_id), unread: Number(r.unread) }));
}
