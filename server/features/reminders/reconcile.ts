import type { Db } from "../../db.ts";
import type { PlanChangeHook } from "../plans/service.ts";
import { loadPreferences } from "../preferences/repo.ts";
import { deliveryChannels, type Channel } from "./channels.ts";
import { desiredReminders, PLAN_REMINDER_KINDS, type DesiredReminder, type StepForReminders } from "./plan-reminders.ts";
import { effectiveWindow } from "./quiet-hours.ts";
import { localMomentAt } from "./schedule.ts";

/*
 * Makes a plan's stored reminders match desiredReminders(): called inside the transaction of every
 * plan or step change (the PlanChangeHook), after preference, contact and opt-out changes, and by
 * the worker's periodic refresh. Only rows still waiting ("scheduled", or "cancelled"/"skipped" ones
 * that apply again) are touched: a reminder being sent or already sent is history and stays as it is.
 * Rows are keyed by (plan, kind, local date, local time, channel), so running this twice, or from two
 * server processes at once, never creates a second row for the same reminder.
 */

type PlanContextRow = {
  plan_id: number;
  status: "active" | "cancelled";
  time_zone: string;
  customer_id: number;
  email: string | null;
  phone: string | null;
  user_active: boolean;
  window_start: string | null;
  window_end: string | null;
};

async function planContext(db: Db, planId: number): Promise<PlanContextRow | undefined> {
  return db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .join("users", "users.id", "customers.user_id")
    .join("companies", "companies.id", "customers.company_id")
    .where("care_plans.id", planId)
    .first<PlanContextRow | undefined>(
      "care_plans.id as plan_id",
      "care_plans.status",
      "properties.time_zone",
      "customers.id as customer_id",
      "users.email",
      "users.phone",
      "users.active as user_active",
      "companies.reminder_window_start as window_start",
      "companies.reminder_window_end as window_end",
    );
}

/** Advisory-lock namespace: one reconcile per plan at a time (hook, refresh and keyword handlers may overlap). */
const RECONCILE_LOCK = 7301;

export async function reconcilePlanReminders(db: Db, planId: number, now: Date = new Date()): Promise<void> {
  // Held to the end of the caller's transaction; outside one it only orders the two statements' start.
  await db.raw("SELECT pg_advisory_xact_lock(?, ?)", [RECONCILE_LOCK, planId]);
  const plan = await planContext(db, planId);
  if (!plan) return;
  const contacts = { email: plan.email, phone: plan.phone };
  const [preferences, optOuts] = await Promise.all([
    loadPreferences(db, plan.customer_id, contacts),
    db("channel_opt_outs").where({ customer_id: plan.customer_id }).select<{ channel: Channel }[]>("channel"),
  ]);
  const today = localMomentAt(now, plan.time_zone).date;
  const steps = await db("plan_steps")
    .where({ plan_id: planId })
    .andWhere("date", ">=", today)
    .select<{ date: string; kind: string; state: StepForReminders["state"]; content: { times?: string[]; cycleAndSoak?: StepForReminders["cycleAndSoak"] } }[]>(
      "date",
      "kind",
      "state",
      "content",
    );

  const desired = desiredReminders(
    {
      active: plan.status === "active" && plan.user_active,
      timeZone: plan.time_zone,
      window: effectiveWindow({ start: plan.window_start, end: plan.window_end }),
      channels: deliveryChannels(preferences.channels, contacts, new Set(optOuts.map((o) => o.channel))),
      dailyTime: preferences.dailyTime,
      wateringNudges: preferences.wateringNudges,
      steps: steps.map((s) => ({ date: s.date, kind: s.kind, state: s.state, times: s.content?.times, cycleAndSoak: s.content?.cycleAndSoak })),
    },
    now,
  );
  await storeDesired(db, plan.customer_id, planId, plan.time_zone, desired);
}

async function storeDesired(db: Db, customerId: number, planId: number, timeZone: string, desired: DesiredReminder[]) {
  for (let i = 0; i < desired.length; i += 500) {
    const rows = desired.slice(i, i + 500).map((d) => ({
      customer_id: customerId,
      plan_id: planId,
      kind: d.kind,
      local_date: d.localDate,
      local_time: d.localTime,
      time_zone: timeZone,
      channel: d.channel,
      due_at: d.dueAt,
      next_attempt_at: d.dueAt,
    }));
    // New rows are inserted; waiting rows follow a moved time; cancelled or skipped rows that apply again come back.
    // A row that may already have reached the provider keeps its frozen text, so the look-up before any resend still matches.
    const insert = db("reminders").insert(rows).toSQL();
    await db.raw(
      `${insert.sql} ON CONFLICT (plan_id, kind, local_date, local_time, channel) DO UPDATE SET
         state = 'scheduled', due_at = EXCLUDED.due_at, next_attempt_at = EXCLUDED.due_at, time_zone = EXCLUDED.time_zone,
         last_error = NULL, updated_at = now(),
         body = CASE WHEN reminders.in_doubt_since IS NULL THEN NULL ELSE reminders.body END,
         subject = CASE WHEN reminders.in_doubt_since IS NULL THEN NULL ELSE reminders.subject END,
         html = CASE WHEN reminders.in_doubt_since IS NULL THEN NULL ELSE reminders.html END
       WHERE reminders.state IN ('cancelled', 'skipped_opted_out')
          OR (reminders.state = 'scheduled' AND reminders.attempts = 0 AND reminders.due_at <> EXCLUDED.due_at)`,
      insert.bindings,
    );
  }
  // Everything still waiting that is no longer wanted is cancelled; fallbacks after a failure are not the plan's to cancel,
  // and notices (answers, visit changes) come from people's actions, not from the plan's calendar.
  const cancel = db("reminders").where({ plan_id: planId, state: "scheduled" }).whereIn("kind", PLAN_REMINDER_KINDS).whereNull("fallback_for");
  if (desired.length > 0) {
    cancel.whereNotIn(
      ["kind", "local_date", "local_time", "channel"],
      desired.map((d) => [d.kind, d.localDate, d.localTime, d.channel]),
    );
  }
  await cancel.update({ state: "cancelled", updated_at: db.fn.now() });
}

/** After a preference, contact or opt-out change: every plan of the customer. */
export async function reconcileCustomerReminders(db: Db, customerId: number, now: Date = new Date()): Promise<void> {
  const plans = await db("care_plans")
    .join("properties", "properties.id", "care_plans.property_id")
    .where("properties.customer_id", customerId)
    .select<{ id: number }[]>("care_plans.id");
  for (const plan of plans) await reconcilePlanReminders(db, plan.id, now);
}

/** The hook planRoutes and visitRoutes call inside their transaction after every plan or step change. */
export const reminderPlanHook: PlanChangeHook = (trx, planId) => reconcilePlanReminders(trx, planId);

/**
 * Every active plan with steps from yesterday on (dates are local, so "yesterday" by UTC covers every
 * zone). Catches plans made without the hook (seeds, imports) and quiet-hour or window changes; the
 * worker runs it at start and hourly through pg-boss. Idempotent, so overlapping runs are harmless.
 */
export async function refreshActivePlans(db: Db, now: Date = new Date()): Promise<number> {
  const plans = await db("care_plans")
    .where("care_plans.status", "active")
    .whereExists(db("plan_steps").whereRaw("plan_steps.plan_id = care_plans.id").andWhere("plan_steps.date", ">=", db.raw("(now() at time zone 'utc')::date - 1")))
    .orderBy("care_plans.id")
    .select<{ id: number }[]>("care_plans.id");
  for (const plan of plans) await db.transaction((trx) => reconcilePlanReminders(trx, plan.id, now));
  return plans.length;
}
