import type { Db } from "../../db.ts";
import { queueNotice } from "./queue.ts";

/*
 * The events that reach the homeowner as notices. Callers have already saved what happened; a
 * notice that can't be queued is logged by them, never a reason to undo the answer or the plan.
 */

/** True when a question of this plan's conversation still waiting for an answer came in by text. */
export async function openQuestionCameBySms(db: Db, planId: number): Promise<boolean> {
  const row = await db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .where({ "conversations.plan_id": planId, "messages.kind": "question", "messages.source": "sms" })
    .whereNull("messages.answered_at")
    .first("messages.id");
  return row !== undefined;
}

/** Staff answered (or answered and closed) a question: tell the homeowner, by text too when they asked by text. */
export async function noticeOfAnswer(db: Db, planId: number, viaSms: boolean) {
  return queueNotice(db, { planId, kind: "conversation_update", context: { viaSms } });
}

/** A new plan (logged visit or import): the homeowner's first message, once per plan. */
export async function noticeOfNewPlan(db: Db, planId: number) {
  return queueNotice(db, { planId, kind: "welcome" });
}
