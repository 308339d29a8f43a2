import type { Db } from "../../db.ts";
import { fallBackAfterDeliveryFailure } from "../reminders/fallback.ts";

/*
 * Delivery status callbacks. Twilio may deliver them late or out of order, and the worker may not
 * yet have recorded the sid when "queued" arrives, so each update is conditional and only moves a
 * reminder forward: sending/scheduled → sent → delivered, or → failed. The reminder id in the
 * callback URL (ours, signed with the rest) finds the row even before the worker records the sid;
 * recording it here is also what closes the crash window between the provider accepting a text and
 * the worker noting it.
 */
type Progress = "sent" | "delivered" | "failed";

function progressOf(status: string): Progress | null {
  if (["accepted", "scheduled", "queued", "sending", "sent"].includes(status)) return "sent";
  if (["delivered", "read"].includes(status)) return "delivered";
  if (["failed", "undelivered"].includes(status)) return "failed";
  return null;
}

export async function applyStatusCallback(db: Db, callback: { sid: string; status: string; errorCode?: string; reminderId?: number }): Promise<void> {
  const progress = progressOf(callback.status);
  if (!progress) return;
  const row = db("reminders").where((q) => {
    q.where("provider_id", callback.sid);
    if (callback.reminderId) q.orWhere((o) => o.where("id", callback.reminderId!).whereNull("provider_id"));
  });
  const open = ["sending", "scheduled"];
  if (progress === "sent") {
    await row.clone().whereIn("state", open).update({ state: "sent", provider_id: callback.sid, sent_at: db.raw("COALESCE(sent_at, now())"), lease_until: null, in_doubt_since: null, last_error: null, updated_at: db.fn.now() });
    return;
  }
  if (progress === "delivered") {
    await row.clone().whereIn("state", [...open, "sent"]).update({ state: "delivered", provider_id: callback.sid, sent_at: db.raw("COALESCE(sent_at, now())"), delivered_at: db.fn.now(), lease_until: null, in_doubt_since: null, updated_at: db.fn.now() });
    return;
  }
  // The failure and the other channel's row land together: a crash between them can't lose the fallback.
  await db.transaction(async (trx) => {
    const failed = await row
      .clone()
      .transacting(trx)
      .whereIn("state", [...open, "sent"])
      .update({ state: "failed", provider_id: callback.sid, last_error: `undelivered${callback.errorCode ? ` (error ${callback.errorCode})` : ""}`, lease_until: null, in_doubt_since: null, updated_at: trx.fn.now() })
      .returning<{ id: number }[]>("id");
    for (const { id } of failed) await fallBackAfterDeliveryFailure(trx, Number(id));
  });
}
