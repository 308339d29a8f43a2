import { allowedReminderWindow } from "#shared/schemas/preferences";
import type { Db } from "../../db.ts";
import type { PlanAccess } from "../plans/access.ts";
import { instantOfLocalTime, localDateAt } from "./local-time.ts";

export type CheckInRequest = { stepId: number; title: string; detail: string; createdAt: Date };

/**
 * Check-in photo requests are not stored as messages: they are read from the plan's
 * `check_in_photo` steps whenever the thread is read, and appear at the start of the
 * reminder window (08:00 local) on the step's day. So nothing has to run when a request
 * falls due, two server processes cannot insert the same request twice, and when the plan
 * is recomputed and a check-in moves, the thread follows.
 */
export async function dueCheckInRequests(db: Db, plan: PlanAccess, now: Date): Promise<CheckInRequest[]> {
  const today = localDateAt(plan.timeZone, now);
  const steps = await db("plan_steps")
    .where({ plan_id: plan.planId, kind: "check_in_photo" })
    .andWhere("date", "<=", today)
    .orderBy([{ column: "date" }, { column: "id" }])
    .select<{ id: string; date: string; title: string; content: { detail?: string } }[]>(
      "id", db.raw("to_char(date, 'YYYY-MM-DD') as date"), "title", "content",
    );
  return steps
    .map((s) => ({
      stepId: Number(s.id),
      title: s.title,
      detail: s.content?.detail ?? "",
      createdAt: instantOfLocalTime(s.date, allowedReminderWindow.earliest, plan.timeZone),
    }))
    .filter((r) => r.createdAt <= now);
}
