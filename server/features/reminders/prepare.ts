import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import { defaultPreferences } from "../preferences/repo.ts";
import { fallbackChannel, type Channel, type ChannelChoice } from "./channels.ts";
import { saveTexts, type FinalState, type ReminderRow } from "./ledger.ts";
import { effectiveWindow, isInsideWindow, nextAllowedInstant } from "./quiet-hours.ts";
import { localMomentAt } from "./schedule.ts";
import { dailySummaryEmail, wateringNudgeEmail } from "./templates/email.ts";
import { dailySummarySms, wateringNudgeSms } from "./templates/sms.ts";
import type { Language, ReminderStep } from "./templates/wording.ts";
import { planUrl, unsubscribeUrl } from "./unsubscribe.ts";
import { wateringStarts } from "#shared/engine/waterings";
import { composeNotice, isNoticeKind } from "../notices/compose.ts";
import { replyTokensForPlans } from "../notices/reply-to.ts";

/*
 * Between claiming a batch and sending it: one query for everything about the recipients, one for
 * the steps of rows that have no text yet, one to reserve "first text" intros, one to freeze the
 * texts. Each row then gets a decision: send (with its exact text), hold for quiet hours, or finish
 * without sending (plan cancelled, channel opted out, nothing left to do that day).
 */

export type Recipient = {
  customerId: number;
  firstName: string;
  email: string | null;
  phone: string | null;
  active: boolean;
  companyName: string;
  senderName: string;
  window: { start: string; end: string };
  planActive: boolean;
  channels: ChannelChoice;
  language: Language;
  optedOut: Set<Channel>;
};

export type Decision =
  | { action: "send"; row: ReminderRow; recipient: Recipient; to: string; subject: string | null; body: string; html: string | null; replyToken?: string }
  | { action: "hold"; row: ReminderRow; recipient: Recipient; until: Date }
  | { action: "finish"; row: ReminderRow; recipient: Recipient | undefined; state: FinalState; error: string | null; fallback: Channel | null };

type RecipientRow = {
  id: number;
  customer_id: number;
  first_name: string;
  email: string | null;
  phone: string | null;
  active: boolean;
  company_name: string;
  sms_sender_name: string;
  window_start: string | null;
  window_end: string | null;
  plan_status: string;
  channels: ChannelChoice | null;
  language: Language | null;
  opt_outs: Channel[] | null;
};

async function loadRecipients(db: Db, ids: number[]): Promise<Map<number, Recipient>> {
  const { rows } = await db.raw<{ rows: RecipientRow[] }>(
    `SELECT r.id, c.id AS customer_id, c.first_name, u.email, u.phone, u.active, co.name AS company_name, co.sms_sender_name,
            co.reminder_window_start AS window_start, co.reminder_window_end AS window_end, cp.status AS plan_status,
            np.channels, np.language,
            (SELECT array_agg(o.channel) FROM channel_opt_outs o WHERE o.customer_id = c.id) AS opt_outs
       FROM reminders r
       JOIN customers c ON c.id = r.customer_id
       JOIN users u ON u.id = c.user_id
       JOIN companies co ON co.id = c.company_id
       JOIN care_plans cp ON cp.id = r.plan_id
       LEFT JOIN notification_preferences np ON np.customer_id = c.id
      WHERE r.id = ANY(?::bigint[])`,
    [ids],
  );
  return new Map(
    rows.map((r) => {
      const contacts = { email: r.email, phone: r.phone };
      return [
        Number(r.id),
        {
          customerId: r.customer_id,
          firstName: r.first_name,
          ...contacts,
          active: r.active,
          companyName: r.company_name,
          senderName: r.sms_sender_name,
          window: effectiveWindow({ start: r.window_start, end: r.window_end }),
          planActive: r.plan_status === "active",
          channels: r.channels ?? defaultPreferences(contacts).channels,
          language: r.language ?? "en",
          optedOut: new Set(r.opt_outs ?? []),
        },
      ];
    }),
  );
}

type StepRow = {
  plan_id: number;
  date: string;
  kind: string;
  title: string;
  content: { detail?: string; times?: string[]; minutesPerCycle?: number; cycleAndSoak?: ReminderStep["cycleAndSoak"] };
};

async function pendingSteps(db: Db, rows: ReminderRow[]): Promise<Map<string, ReminderStep[]>> {
  const pairs = [...new Map(rows.map((r) => [`${r.plan_id}|${r.local_date}`, [r.plan_id, r.local_date]])).values()];
  const byDay = new Map<string, ReminderStep[]>();
  if (pairs.length === 0) return byDay;
  const steps = await db("plan_steps")
    .whereIn(["plan_id", "date"], pairs)
    .andWhere({ state: "pending" })
    .orderBy("id")
    .select<StepRow[]>("plan_id", "date", "kind", "title", "content");
  for (const s of steps) {
    const key = `${s.plan_id}|${s.date}`;
    byDay.set(key, [...(byDay.get(key) ?? []), {
        kind: s.kind,
        title: s.title,
        detail: s.content?.detail,
        times: s.content?.times,
        minutesPerCycle: s.content?.minutesPerCycle,
        cycleAndSoak: s.content?.cycleAndSoak,
      }]);
  }
  return byDay;
}

/** The first text to each customer carries how to stop; the row that carries it is recorded once, atomically. */
async function reserveIntros(db: Db, candidates: { reminderId: number; customerId: number }[]): Promise<Set<number>> {
  const firstPerCustomer = [...new Map(candidates.map((c) => [c.customerId, c])).values()];
  if (firstPerCustomer.length === 0) return new Set();
  const { rows } = await db.raw<{ rows: { reminder_id: string }[] }>(
    `INSERT INTO sms_intros (customer_id, reminder_id)
     SELECT * FROM unnest(?::int[], ?::bigint[]) ON CONFLICT (customer_id) DO NOTHING RETURNING reminder_id`,
    [firstPerCustomer.map((c) => c.customerId), firstPerCustomer.map((c) => c.reminderId)],
  );
  return new Set(rows.map((r) => Number(r.reminder_id)));
}

function compose(row: ReminderRow & { kind: "daily_summary" | "watering_nudge" }, recipient: Recipient, steps: ReminderStep[], intro: boolean, config: Pick<Config, "PUBLIC_URL" | "SESSION_SECRET">) {
  const link = planUrl(config, row.plan_id);
  if (row.kind === "daily_summary") {
    if (steps.length === 0) return undefined;
    if (row.channel === "sms") return { subject: null, body: dailySummarySms({ senderName: recipient.senderName, language: recipient.language, planUrl: link, intro }, row.local_date, steps), html: null };
    const email = dailySummaryEmail({ companyName: recipient.companyName, firstName: recipient.firstName, language: recipient.language, planUrl: link, unsubscribeUrl: unsubscribeUrl(config, recipient.customerId) }, row.local_date, steps);
    return { subject: email.subject, body: email.text, html: email.html };
  }
  // On a slope only a watering's first run has a nudge; a run's own time is not one any more.
  const watering = steps.find((s) => s.kind === "water" && wateringStarts(s).includes(row.local_time));
  if (!watering) return undefined;
  if (row.channel === "sms") return { subject: null, body: wateringNudgeSms({ senderName: recipient.senderName, language: recipient.language, planUrl: link, intro }, row.local_time, watering), html: null };
  const email = wateringNudgeEmail({ companyName: recipient.companyName, firstName: recipient.firstName, language: recipient.language, planUrl: link, unsubscribeUrl: unsubscribeUrl(config, recipient.customerId) }, row.local_time, watering);
  return { subject: email.subject, body: email.text, html: email.html };
}

export async function prepareBatch(db: Db, config: Pick<Config, "PUBLIC_URL" | "SESSION_SECRET">, rows: ReminderRow[], now = new Date()): Promise<Decision[]> {
  if (rows.length === 0) return [];
  const recipients = await loadRecipients(db, rows.map((r) => r.id));
  const decisions: Decision[] = [];
  const needText: { row: ReminderRow; recipient: Recipient }[] = [];

  for (const row of rows) {
    const recipient = recipients.get(Number(row.id));
    const finish = (state: FinalState, error: string | null, fallback: Channel | null = null) => decisions.push({ action: "finish", row, recipient, state, error, fallback });
    if (!recipient || !recipient.planActive || !recipient.active) {
      finish("cancelled", "plan cancelled or customer inactive");
      continue;
    }
    const fallback = () => (row.fallback_for ? null : fallbackChannel(row.channel, recipient.channels, recipient, recipient.optedOut));
    if (recipient.optedOut.has(row.channel)) {
      finish("skipped_opted_out", `customer opted out of ${row.channel}`, fallback());
      continue;
    }
    const to = row.channel === "sms" ? recipient.phone : recipient.email;
    if (!to) {
      finish("failed", `no ${row.channel === "sms" ? "mobile number" : "e-mail address"} on file`, fallback());
      continue;
    }
    if (!isInsideWindow(now, row.time_zone, recipient.window)) {
      const until = nextAllowedInstant(now, row.time_zone, recipient.window);
      // Yesterday's plan summary is no use tomorrow morning: a reminder that can't go on its own day has failed.
      // A notice (an answer, a visit, the welcome) is still news the next morning: it waits.
      if (!isNoticeKind(row.kind) && localMomentAt(until, row.time_zone).date !== row.local_date) finish("failed", "could not be sent on its day (quiet hours after delays)");
      else decisions.push({ action: "hold", row, recipient, until });
      continue;
    }
    if (row.body === null) needText.push({ row, recipient });
    else decisions.push({ action: "send", row, recipient, to, subject: row.subject, body: row.body, html: row.html });
  }

  if (needText.length > 0) {
    const notices = needText.filter((n) => isNoticeKind(n.row.kind));
    const planRows = needText.filter((n) => !isNoticeKind(n.row.kind)) as { row: ReminderRow & { kind: "daily_summary" | "watering_nudge" }; recipient: Recipient }[];
    const steps = await pendingSteps(db, planRows.map((n) => n.row));
    const stepsOf = (row: ReminderRow) => steps.get(`${row.plan_id}|${row.local_date}`) ?? [];
    const sendable = planRows.filter(({ row, recipient }) => {
      if (compose(row, recipient, stepsOf(row), false, config)) return true;
      decisions.push({ action: "finish", row, recipient, state: "cancelled", error: "nothing left to do that day", fallback: null });
      return false;
    });
    // A notice's text can only be known by composing it once (the welcome mints its sign-in link then), so its
    // intro is reserved first; a notice that then turns out to have nothing to say gives the intro back when finished.
    const intros = await reserveIntros(
      db,
      [...sendable, ...notices].filter((n) => n.row.channel === "sms").map((n) => ({ reminderId: Number(n.row.id), customerId: n.recipient.customerId })),
    );
    const texts: { id: number; subject: string | null; body: string; html: string | null }[] = [];
    const send = (row: ReminderRow, recipient: Recipient, text: { subject: string | null; body: string; html: string | null }) => {
      texts.push({ id: row.id, ...text });
      decisions.push({ action: "send", row, recipient, to: (row.channel === "sms" ? recipient.phone : recipient.email)!, ...text });
    };
    for (const { row, recipient } of sendable) send(row, recipient, compose(row, recipient, stepsOf(row), intros.has(Number(row.id)), config)!);
    for (const { row, recipient } of notices) {
      const outcome = await composeNotice(db, config, row, recipient, intros.has(Number(row.id)));
      if ("cancel" in outcome) decisions.push({ action: "finish", row, recipient, state: "cancelled", error: outcome.cancel, fallback: null });
      else send(row, recipient, outcome);
    }
    await saveTexts(db, texts);
  }
  // Every customer e-mail carries its conversation's reply address: one statement for the batch.
  const emails = decisions.filter((d): d is Extract<Decision, { action: "send" }> => d.action === "send" && d.row.channel === "email");
  const tokens = await replyTokensForPlans(db, emails.map((d) => d.row.plan_id));
  for (const d of emails) d.replyToken = tokens.get(d.row.plan_id);
  return decisions;
}
