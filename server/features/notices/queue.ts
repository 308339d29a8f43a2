import type { Db } from "../../db.ts";
import { loadPreferences } from "../preferences/repo.ts";
import { deliveryChannels, type Channel } from "../reminders/channels.ts";
import { effectiveWindow, nextAllowedInstant, type SendWindow } from "../reminders/quiet-hours.ts";
import { localMomentAt } from "../reminders/schedule.ts";

/*
 * Notices are messages caused by someone's action (an answer, a visit booked or moved, a new plan)
 * rather than by the plan's calendar. They ride on the reminders ledger, so they get its
 * exactly-once sending, retries, fallbacks and outbox for free; their text is composed when a
 * worker first claims them, from what is true then.
 *
 * Gathering: a notice waits NOTICE_GATHER_MINUTES (NOTICE_GATHER_SECONDS in tests) before it is due, and a later event of the same
 * kind (and, for visits, the same visit) joins a notice that is still waiting instead of queuing a
 * second one, so three quick answers make one text, not a burst.
 */
export const NOTICE_KINDS = ["conversation_update", "visit_update", "welcome"] as const;
export type NoticeKind = (typeof NOTICE_KINDS)[number];

export const NOTICE_GATHER_MINUTES = 3;

/**
 * The gathering delay in seconds. Read from NOTICE_GATHER_SECONDS (validated in config.ts) rather
 * than threaded through every caller: answers, visits and imports all queue notices, and only the
 * test stacks shorten it so a browser test need not wait three minutes.
 */
export function noticeGatherSeconds(env: NodeJS.ProcessEnv = process.env): number {
  const configured = Number(env.NOTICE_GATHER_SECONDS);
  return env.NOTICE_GATHER_SECONDS !== undefined && Number.isInteger(configured) && configured >= 0 ? configured : NOTICE_GATHER_MINUTES * 60;
}

/** When a notice queued at `now` is due: after the gathering delay, moved to the next allowed time (even on another day). */
export function noticeDueAt(now: Date, zone: string, window: SendWindow, gatherSeconds = noticeGatherSeconds()): Date {
  return nextAllowedInstant(new Date(now.getTime() + gatherSeconds * 1000), zone, window);
}

export type VisitChange = "booked" | "moved" | "cancelled" | "done";
export type NoticeContext = { followUpId?: number; change?: VisitChange; viaSms?: boolean };

type Recipient = { customer_id: number; time_zone: string; email: string | null; phone: string | null; window_start: string | null; window_end: string | null };

async function recipientOfPlan(db: Db, planId: number): Promise<Recipient | undefined> {
  return db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("users", "users.id", "customers.user_id")
    .join("companies", "companies.id", "customers.company_id")
    .where({ "care_plans.id": planId, "care_plans.status": "active", "users.active": true })
    .first<Recipient | undefined>(
      "customers.id as customer_id",
      "properties.time_zone",
      "users.email",
      "users.phone",
      "companies.reminder_window_start as window_start",
      "companies.reminder_window_end as window_end",
    );
}

/** The customer's channels for notices; an answer to a texted question also goes back by text when texts are allowed. */
export async function noticeChannels(db: Db, recipient: Recipient, context: NoticeContext): Promise<Channel[]> {
  const contacts = { email: recipient.email, phone: recipient.phone };
  const [preferences, optOuts] = await Promise.all([
    loadPreferences(db, recipient.customer_id, contacts),
    db("channel_opt_outs").where({ customer_id: recipient.customer_id }).pluck<Channel[]>("channel"),
  ]);
  const optedOut = new Set(optOuts);
  const channels = deliveryChannels(preferences.channels, contacts, optedOut);
  if (context.viaSms && contacts.phone && !optedOut.has("sms") && !channels.includes("sms")) channels.push("sms");
  return channels;
}

/**
 * Queues a notice for the plan's homeowner on each of their channels, due after the gathering
 * delay and inside the hours they allow. Returns the channels a new row was queued on (none when
 * the event joined a waiting notice, the plan is not active, or the customer takes no messages).
 */
export async function queueNotice(db: Db, notice: { planId: number; kind: NoticeKind; context?: NoticeContext; now?: Date; gatherSeconds?: number }): Promise<Channel[]> {
  const now = notice.now ?? new Date();
  const context = notice.context ?? {};
  const recipient = await recipientOfPlan(db, notice.planId);
  if (!recipient) return [];
  const channels = await noticeChannels(db, recipient, context);
  const window = effectiveWindow({ start: recipient.window_start, end: recipient.window_end });
  const dueAt = noticeDueAt(now, recipient.time_zone, window, notice.gatherSeconds);
  const queued: Channel[] = [];
  for (const channel of channels) {
    const waiting = db("reminders").where({ plan_id: notice.planId, kind: notice.kind, channel });
    if (notice.kind === "welcome") {
      // One welcome per plan, ever.
      if (await waiting.first("id")) continue;
    } else {
      waiting.where({ state: "scheduled", attempts: 0 }).whereNull("body");
      if (notice.kind === "visit_update") waiting.whereRaw("(context->>'followUpId')::int = ?", [context.followUpId ?? 0]);
      const joined = await waiting.update({ context: JSON.stringify(context), updated_at: db.fn.now() });
      if (joined > 0) continue;
    }
    // The ledger's dedupe key is per minute: a notice of an event right after the previous one was already sent
    // (so nothing was waiting to join) would collide with it and be lost. It takes the next free minute instead.
    let inserted: unknown[] = [];
    for (let shift = 0; shift < 5 && inserted.length === 0; shift++) {
      const due = shift === 0 ? dueAt : nextAllowedInstant(new Date(dueAt.getTime() + shift * 60_000), recipient.time_zone, window);
      const local = localMomentAt(due, recipient.time_zone);
      inserted = await db("reminders")
        .insert({
          customer_id: recipient.customer_id,
          plan_id: notice.planId,
          kind: notice.kind,
          local_date: local.date,
          local_time: local.time,
          time_zone: recipient.time_zone,
          channel,
          due_at: due,
          next_attempt_at: due,
          context: JSON.stringify(context),
        })
        .onConflict(["plan_id", "kind", "local_date", "local_time", "channel"])
        .ignore()
        .returning("id");
    }
    if (inserted.length > 0) queued.push(channel);
  }
  return queued;
}
