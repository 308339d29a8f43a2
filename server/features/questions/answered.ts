import type { AnsweredQuestion } from "#shared/schemas/question-queue";
import type { Db } from "../../db.ts";

/** A week of answers fits one screen for a company of our size; more is for the audit log. */
const ANSWERED_LIMIT = 200;

type AnsweredRow = {
  id: string; plan_id: number; first_name: string; last_name: string; street: string; text: string; created_at: Date;
  answered_at: Date; resolved_at: Date | null; answered_by_name: string | null; answer_text: string;
};

/**
 * Questions of the company a staff answer followed within the last `days` days before `now`,
 * most recently answered first. "Who answered" is the author of that first answer: the one
 * that took the question out of the unanswered part of the queue (`messages.answered_at`).
 */
export async function recentlyAnswered(db: Db, companyId: number, days: number, now: Date = new Date()): Promise<AnsweredQuestion[]> {
  const since = new Date(now.getTime() - days * 86_400_000);
  const rows = await db("messages as q")
    .join("conversations as cv", "cv.id", "q.conversation_id")
    .join("care_plans as cp", "cp.id", "cv.plan_id")
    .join("properties as p", "p.id", "cp.property_id")
    .join("customers as c", "c.id", "p.customer_id")
    .joinRaw(
      `join lateral (
         select answer.text, answer.author_user_id from messages as answer
         where answer.conversation_id = q.conversation_id and answer.kind = 'answer' and answer.created_at = q.answered_at
         order by answer.id limit 1
       ) as first_answer on true`,
    )
    .leftJoin("users as author", "author.id", "first_answer.author_user_id")
    .where({ "q.kind": "question", "q.company_id": companyId })
    .where("q.answered_at", ">=", since)
    .where("q.answered_at", "<=", now)
    .orderBy([{ column: "q.answered_at", order: "desc" }, { column: "q.id", order: "desc" }])
    .limit(ANSWERED_LIMIT)
    .select<AnsweredRow[]>(
      "q.id", "cp.id as plan_id", "c.first_name", "c.last_name", "p.street", "q.text", "q.created_at", "q.answered_at", "q.resolved_at",
      "author.name as answered_by_name", "first_answer.text as answer_text",
    );
  return rows.map((r) => ({
    messageId: Number(r.id),
    planId: r.plan_id,
    customerName: `${r.first_name} ${r.last_name}`,
    street: r.street,
    text: r.text,
    askedAt: r.created_at.toISOString(),
    answeredAt: r.answered_at.toISOString(),
    answeredByName: r.answered_by_name,
    answerText: r.answer_text,
    resolved: r.resolved_at !== null,
  }));
}
