import type { FollowUpStatus } from "#shared/schemas/follow-ups";
import type { Db } from "../../db.ts";
import { queueNotice, type VisitChange } from "../notices/queue.ts";
import { newestActivePlan } from "./repo.ts";

/** What the homeowner is told about; only what changes their day counts. */
export type VisitState = { status: FollowUpStatus; scheduledFor: string | null; arrivalStart: string | null; arrivalEnd: string | null };

/**
 * The news in a change of a follow-up, if any. A visit the homeowner was never told about
 * (still requested) is not "cancelled" when it closes: nothing they planned around goes away.
 */
export function visitChange(before: VisitState | null, after: VisitState): VisitChange | null {
  const wasBooked = before?.status === "scheduled";
  if (after.status === "scheduled") {
    if (!wasBooked) return "booked";
    const moved = before.scheduledFor !== after.scheduledFor || before.arrivalStart !== after.arrivalStart || before.arrivalEnd !== after.arrivalEnd;
    return moved ? "moved" : null;
  }
  if (after.status === "done" && before?.status !== "done") return "done";
  if (after.status === "closed" && wasBooked) return "cancelled";
  return null;
}

/**
 * Queues the homeowner's notice of a visit change, in the caller's transaction so the notice
 * exists exactly when the change does. A follow-up without a plan tells the lawn's newest active plan.
 */
export async function announceVisit(
  db: Db,
  followUp: { id: number; planId: number | null; propertyId: number },
  change: VisitChange | null,
): Promise<void> {
  if (!change) return;
  const planId = followUp.planId ?? (await newestActivePlan(db, followUp.propertyId));
  if (planId === null) return;
  await queueNotice(db, { planId, kind: "visit_update", context: { followUpId: followUp.id, change } });
}
