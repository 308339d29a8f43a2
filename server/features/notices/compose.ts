import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import { localDateAt } from "../../lib/local-date.ts";
import { invitationDays, oneTapSignInLink } from "../auth/invitation.ts";
import type { ReminderRow } from "../reminders/ledger.ts";
import { conversationUpdate, visitUpdate, welcome, type ComposedNotice, type NoticeFrame, type StaffMessage } from "../reminders/templates/notices.ts";
import type { Language } from "../reminders/templates/wording.ts";
import { planUrl, unsubscribeUrl } from "../reminders/unsubscribe.ts";

/*
 * A notice's text is written when a worker first claims it, from what is true then: the answers
 * the homeowner has still not read, the visit as it stands now, the plan's next steps. A notice
 * whose news the homeowner already saw in the portal is finished without sending.
 */

export type NoticeRecipient = {
  customerId: number;
  firstName: string;
  companyName: string;
  senderName: string;
  language: Language;
};

export type NoticeOutcome = ComposedNotice | { cancel: string };

type Settings = Pick<Config, "PUBLIC_URL" | "SESSION_SECRET">;

/** Where an answer notice leads: the plan's conversation in the portal's Messages tab. */
export const conversationUrl = (config: Pick<Config, "PUBLIC_URL">, planId: number) => new URL(`/portal/messages?plan=${planId}`, config.PUBLIC_URL).href;

type CompanyRow = { company_id: number; phone: string | null; logo_key: string | null; user_id: number };

async function companyOfPlan(db: Db, planId: number): Promise<CompanyRow> {
  return db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("companies", "companies.id", "customers.company_id")
    .where("care_plans.id", planId)
    .first<CompanyRow>("companies.id as company_id", "companies.phone", "companies.logo_key", "customers.user_id");
}

/** Staff messages the homeowner can see and has not read yet: answers, and messages about a follow-up visit. */
async function unreadStaffMessages(db: Db, planId: number, companyName: string): Promise<StaffMessage[]> {
  const rows = await db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .leftJoin("users", "users.id", "messages.author_user_id")
    .where("conversations.plan_id", planId)
    .whereNot("messages.kind", "note")
    .where((q) => q.where("messages.kind", "answer").orWhereNotNull("messages.follow_up_id"))
    .where((q) => q.whereNull("users.role").orWhereNot("users.role", "customer"))
    .whereRaw("messages.created_at > coalesce(conversations.customer_last_read_at, '-infinity')")
    .orderBy([{ column: "messages.created_at" }, { column: "messages.id" }])
    .select<{ author_name: string | null; text: string }[]>("users.name as author_name", "messages.text");
  return rows.map((r) => ({ authorName: r.author_name ?? companyName, text: r.text }));
}

type VisitRow = {
  scheduled_for: string | null;
  arrival_start: string | null;
  arrival_end: string | null;
  technician_name: string | null;
  reason: string;
  customer_prep: string | null;
  work_done: string | null;
};

async function followUp(db: Db, planId: number, followUpId: number): Promise<VisitRow | undefined> {
  return db("follow_up_visits")
    .leftJoin("users", "users.id", "follow_up_visits.technician_id")
    .where({ "follow_up_visits.id": followUpId, "follow_up_visits.plan_id": planId })
    .first<VisitRow | undefined>(
      db.raw("to_char(follow_up_visits.scheduled_for, 'YYYY-MM-DD') as scheduled_for"),
      "follow_up_visits.arrival_start",
      "follow_up_visits.arrival_end",
      "users.name as technician_name",
      "follow_up_visits.reason",
      "follow_up_visits.customer_prep",
      "follow_up_visits.work_done",
    );
}

/** The plan's first pending steps from today on, for the welcome message. */
async function nextSteps(db: Db, planId: number, zone: string, limit: number) {
  return db("plan_steps")
    .where({ plan_id: planId, state: "pending" })
    .andWhere("date", ">=", localDateAt(zone))
    .orderBy([{ column: "date" }, { column: "id" }])
    .limit(limit)
    .select<{ date: string; title: string }[]>(db.raw("to_char(date, 'YYYY-MM-DD') as date"), "title");
}

export async function composeNotice(db: Db, config: Settings, row: ReminderRow, recipient: NoticeRecipient, intro: boolean): Promise<NoticeOutcome> {
  const company = await companyOfPlan(db, row.plan_id);
  const channel = row.channel;
  const frame = (link: string): NoticeFrame => ({
    senderName: recipient.senderName,
    companyName: recipient.companyName,
    companyPhone: company.phone,
    logoUrl: company.logo_key ? new URL(`/api/companies/${company.company_id}/logo`, config.PUBLIC_URL).href : null,
    firstName: recipient.firstName,
    language: recipient.language,
    link,
    unsubscribeUrl: unsubscribeUrl(config, recipient.customerId),
    intro: intro && channel === "sms",
  });

  if (row.kind === "conversation_update") {
    const messages = await unreadStaffMessages(db, row.plan_id, recipient.companyName);
    if (messages.length === 0) return { cancel: "already read in the portal" };
    return conversationUpdate(frame(conversationUrl(config, row.plan_id)), channel, messages);
  }
  if (row.kind === "visit_update") {
    const context = row.context ?? {};
    const visit = context.followUpId ? await followUp(db, row.plan_id, context.followUpId) : undefined;
    if (!visit || !context.change) return { cancel: "the follow-up visit is no longer on this plan" };
    return visitUpdate(frame(planUrl(config, row.plan_id)), channel, {
      change: context.change,
      date: visit.scheduled_for,
      arrivalStart: visit.arrival_start,
      arrivalEnd: visit.arrival_end,
      technicianName: visit.technician_name,
      reason: visit.reason,
      customerPrep: visit.customer_prep,
      workDone: visit.work_done,
    });
  }
  if (row.kind === "welcome") {
    const steps = await nextSteps(db, row.plan_id, row.time_zone, channel === "sms" ? 3 : 5);
    return welcome(frame(await oneTapSignInLink(db, config, company.user_id, channel)), channel, steps, invitationDays);
  }
  return { cancel: `not a notice: ${row.kind}` };
}

export const isNoticeKind = (kind: string): kind is "conversation_update" | "visit_update" | "welcome" =>
  kind === "conversation_update" || kind === "visit_update" || kind === "welcome";
