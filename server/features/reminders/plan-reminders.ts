import { wateringStarts } from "#shared/engine/waterings";
import type { Channel } from "./channels.ts";
import { nextAllowedInstant, type SendWindow } from "./quiet-hours.ts";
import { localMomentAt, zonedTimeToUtc } from "./schedule.ts";

/*
 * The reminders a plan should have from now on, as a pure function of its steps, the customer's
 * choices and the clock. The reconciler stores exactly this set (inserting, moving, cancelling),
 * so a changed plan, a changed preference or an opt-out all go through the same code.
 */

export const PLAN_REMINDER_KINDS = ["daily_summary", "watering_nudge"] as const;
export type ReminderKind = (typeof PLAN_REMINDER_KINDS)[number];

export type StepForReminders = {
  date: string;
  kind: string;
  state: "pending" | "done" | "skipped";
  times?: readonly string[];
  /** On a slope `times` lists every short run; one nudge goes at the first run of each watering. */
  cycleAndSoak?: { runsPerCycle: number; cycleStarts?: readonly string[] };
};

export type PlanReminderInput = {
  active: boolean;
  timeZone: string;
  window: SendWindow;
  channels: readonly Channel[];
  dailyTime: string;
  wateringNudges: boolean;
  steps: readonly StepForReminders[];
};

export type DesiredReminder = { kind: ReminderKind; localDate: string; localTime: string; channel: Channel; dueAt: Date };

/** A watering nudge this late is no use any more ("water at 7:00" at noon); a daily summary is still worth sending the same day. */
export const NUDGE_STALE_AFTER_MS = 60 * 60_000;

export const dedupeKey = (r: { kind: string; localDate: string; localTime: string; channel: string }) => `${r.kind}|${r.localDate}|${r.localTime}|${r.channel}`;

export function desiredReminders(plan: PlanReminderInput, now: Date): DesiredReminder[] {
  if (!plan.active || plan.channels.length === 0) return [];
  const zone = plan.timeZone;
  const today = localMomentAt(now, zone).date;
  // Held past quiet hours, a reminder must still land on its own plan day, or it is not sent at all.
  const sameDay = (date: string, instant: Date) => localMomentAt(instant, zone).date === date;
  const deliverableTodayFromNow = sameDay(today, nextAllowedInstant(now, zone, plan.window));

  const pendingByDate = new Map<string, StepForReminders[]>();
  for (const step of plan.steps) {
    if (step.state !== "pending" || step.date < today) continue;
    pendingByDate.set(step.date, [...(pendingByDate.get(step.date) ?? []), step]);
  }

  const out: DesiredReminder[] = [];
  for (const [date, steps] of [...pendingByDate].sort(([a], [b]) => (a < b ? -1 : 1))) {
    const summaryDue = nextAllowedInstant(zonedTimeToUtc(date, plan.dailyTime, zone), zone, plan.window);
    const summaryWanted = sameDay(date, summaryDue) && (summaryDue >= now || deliverableTodayFromNow);
    if (summaryWanted) {
      for (const channel of plan.channels) out.push({ kind: "daily_summary", localDate: date, localTime: plan.dailyTime, channel, dueAt: summaryDue });
    }
    if (!plan.wateringNudges) continue;
    const times = new Set(steps.filter((s) => s.kind === "water").flatMap((s) => wateringStarts(s)));
    for (const time of [...times].sort()) {
      const asked = zonedTimeToUtc(date, time, zone);
      const due = nextAllowedInstant(asked, zone, plan.window);
      if (!sameDay(date, due) || due.getTime() < now.getTime() - NUDGE_STALE_AFTER_MS) continue;
      // A nudge held back to the very minute of the daily summary would only repeat it.
      if (summaryWanted && due.getTime() !== asked.getTime() && due.getTime() === summaryDue.getTime()) continue;
      for (const channel of plan.channels) out.push({ kind: "watering_nudge", localDate: date, localTime: time, channel, dueAt: due });
    }
  }
  return out;
}
