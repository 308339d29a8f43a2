import { daysBetween } from "#shared/engine/dates";
import type { AssignQuestionResponse, OpenQuestion, QueuePlanDay } from "#shared/schemas/question-queue";
import type { Db } from "../../db.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { HttpError, notFound } from "../../http/errors.ts";
import type { SessionUser } from "../../auth/session-user.ts";

/** Enough for a screen; a company with more open questions than this has a bigger problem. */
const QUEUE_LIMIT = 200;

type PhaseRange = { phase: string; start: string; end: string };

type QueueRow = {
  id: string;
  plan_id: number;
  first_name: string;
  last_name: string;
  street: string;
  time_zone: string;
  visit_date: string;
  services: string[];
  phases: PhaseRange[] | null;
  text: string;
  created_at: Date;
  overdue: boolean;
  photo_count: string;
  first_photo_id: string | null;
  assigned_to: number | null;
  assigned_to_name: string | null;
  last_answered_at: Date | null;
};

/** Where the lawn is in its plan on `today` (the plan's own calendar date). */
export function planDayOn(phases: readonly PhaseRange[], visitDate: string, today: string): QueuePlanDay {
  const current = phases.find((p) => p.start <= today && today <= p.end);
  return {
    phase: current?.phase ?? null,
    dayOfPhase: current ? daysBetween(current.start, today) + 1 : null,
    dayOfPlan: visitDate <= today ? daysBetween(visitDate, today) + 1 : null,
  };
}

/** Unanswered first (no staff answer after the question), then the longest waiting. */
const queueOrder = "(messages.answered_at is not null), messages.created_at, messages.id";

/**
 * Open questions of a company in two steps: first the page in queue order, straight off the
 * queue index (company and answered-or-not are kept on the question for this), then everything
 * shown for those 200: the plan's phases, the photos, the assignee and the thread's latest
 * answer, one index lookup each. Overdue is decided in SQL against the company's answer target.
 */
export async function openQuestions(db: Db, companyId: number, now: Date = new Date()): Promise<OpenQuestion[]> {
  const page = db("messages")
    .where({ "messages.kind": "question", "messages.company_id": companyId })
    .whereNull("messages.resolved_at")
    .orderByRaw(queueOrder)
    .limit(QUEUE_LIMIT)
    .select("id", "conversation_id", "text", "created_at", "assigned_to", db.raw(`row_number() over (order by ${queueOrder}) as page_order`));
  const rows = await db
    .with("page", page)
    .from({ messages: "page" })
    .join("conversations", "conversations.id", "messages.conversation_id")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("service_visits", "service_visits.id", "care_plans.visit_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("companies", "companies.id", "customers.company_id")
    .leftJoin("users as assignee", "assignee.id", "messages.assigned_to")
    .joinRaw(
      `left join lateral (
         select answer.created_at from messages as answer
         where answer.conversation_id = messages.conversation_id and answer.kind = 'answer'
         order by answer.created_at desc limit 1
       ) as last_answer on true`,
    )
    .joinRaw(
      `left join lateral (
         select count(*) as photo_count, min(photos.id) filter (where photos.position = 0) as first_photo_id
         from photos where photos.message_id = messages.id
       ) as photo on true`,
    )
    .orderBy("messages.page_order")
    .select<QueueRow[]>(
      "messages.id", "care_plans.id as plan_id", "customers.first_name", "customers.last_name", "properties.street",
      "properties.time_zone", "service_visits.services", db.raw("to_char(service_visits.visit_date, 'YYYY-MM-DD') as visit_date"),
      db.raw("care_plans.figures -> 'meta' -> 'phases' as phases"),
      "messages.text", "messages.created_at", "messages.assigned_to", "assignee.name as assigned_to_name",
      db.raw("messages.created_at + make_interval(hours => companies.answer_target_hours) < now() as overdue"),
      "photo.photo_count", "photo.first_photo_id", "last_answer.created_at as last_answered_at",
    );
  return rows.map((r) => {
    const today = localDateAt(r.time_zone, now);
    return {
      messageId: Number(r.id),
      planId: r.plan_id,
      customerName: `${r.first_name} ${r.last_name}`,
      street: r.street,
      text: r.text,
      photoCount: Number(r.photo_count),
      thumbUrl: r.first_photo_id ? `/api/photos/${r.first_photo_id}/thumb` : null,
      askedAt: r.created_at.toISOString(),
      overdue: r.overdue,
      services: r.services,
      planDay: planDayOn(Array.isArray(r.phases) ? r.phases : [], r.visit_date, today),
      assignedToId: r.assigned_to,
      assignedToName: r.assigned_to_name,
      lastAnsweredAt: r.last_answered_at ? r.last_answered_at.toISOString() : null,
      waitingSince: r.created_at.toISOString(),
    };
  });
}

/**
 * Assigns an open question to a staff member, or unassigns it (userId null). A technician may
 * take a question for themselves or let go of their own (or an unassigned) one; a manager may
 * assign it to any active staff member of the company. Another company's question, an
 * unknown one or one already resolved is not found.
 */
export async function assignQuestion(db: Db, user: SessionUser, messageId: number, userId: number | null): Promise<AssignQuestionResponse> {
  const question = await db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where({ "messages.id": messageId, "messages.kind": "question", "customers.company_id": user.companyId })
    .whereNull("messages.resolved_at")
    .first<{ assigned_to: number | null } | undefined>("messages.assigned_to");
  if (!question) throw notFound("That open question");

  if (user.role === "technician") {
    if (userId !== null && userId !== user.id) {
      throw new HttpError(403, "forbidden", "Technicians can assign a question only to themselves.");
    }
    if (userId === null && question.assigned_to !== null && question.assigned_to !== user.id) {
      throw new HttpError(403, "forbidden", "Only a manager can unassign a colleague's question.");
    }
  }

  let assignee: { id: number; name: string } | undefined;
  if (userId !== null) {
    assignee = await db("users")
      .where({ id: userId, company_id: user.companyId, active: true })
      .whereIn("role", ["technician", "manager"])
      .first<{ id: number; name: string } | undefined>("id", "name");
    if (!assignee) {
      throw new HttpError(400, "invalid_input", "Some of the information is not valid.", { userId: "Choose an active staff member of your company" });
    }
  }
  await db("messages").where({ id: messageId }).update({ assigned_to: assignee?.id ?? null });
  return { messageId, assignedToId: assignee?.id ?? null, assignedToName: assignee?.name ?? null };
}
