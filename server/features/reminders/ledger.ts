import type { Db } from "../../db.ts";
import type { Channel } from "./channels.ts";
import type { ReminderKind } from "./plan-reminders.ts";
import type { NoticeKind } from "../notices/queue.ts";

/*
 * The reminders table as the worker uses it. Every state change is one conditional UPDATE, so two
 * workers (or a worker and a status callback) can never both move the same row: whoever's WHERE
 * still matches wins, the other changes nothing.
 *
 *   scheduled ──claim──▶ sending ──accepted──▶ sent ──callback──▶ delivered | failed
 *       ▲                  │  │
 *       └──transient/quiet─┘  └──permanent / attempts used up──▶ failed (+ fallback row on the other channel)
 *   scheduled ──plan change──▶ cancelled        sending ──opted out──▶ skipped_opted_out
 */

export type ReminderRow = {
  id: number;
  customer_id: number;
  plan_id: number;
  kind: ReminderKind | NoticeKind;
  local_date: string;
  local_time: string;
  time_zone: string;
  channel: Channel;
  state: string;
  attempts: number;
  attempt_started_at: Date | null;
  in_doubt_since: Date | null;
  provider_id: string | null;
  subject: string | null;
  body: string | null;
  html: string | null;
  fallback_for: number | null;
  /** Notices only: what the notice is about (see notices/queue.ts). */
  context: { followUpId?: number; change?: "booked" | "moved" | "cancelled" | "done"; viaSms?: boolean } | null;
};

const returning = `r.id, r.customer_id, r.plan_id, r.kind, r.local_date, r.local_time, r.time_zone, r.channel, r.state, r.attempts,
  r.attempt_started_at, r.in_doubt_since, r.provider_id, r.subject, r.body, r.html, r.fallback_for, r.context`;

/**
 * Takes up to `limit` due rows for this worker: SKIP LOCKED lets concurrent workers take disjoint
 * rows without waiting, and the state change to "sending" with a lease is what makes the row theirs.
 */
export async function claimDue(db: Db, limit: number, leaseSeconds: number): Promise<ReminderRow[]> {
  const { rows } = await db.raw<{ rows: ReminderRow[] }>(
    `WITH picked AS (
       SELECT id FROM reminders WHERE state = 'scheduled' AND next_attempt_at <= now()
       ORDER BY next_attempt_at LIMIT ? FOR UPDATE SKIP LOCKED)
     UPDATE reminders r SET state = 'sending', attempts = r.attempts + 1, attempt_started_at = now(),
       lease_until = now() + make_interval(secs => ?), updated_at = now()
     FROM picked WHERE r.id = picked.id
     RETURNING ${returning}`,
    [limit, leaseSeconds],
  );
  return rows;
}

/**
 * Takes over rows whose worker died mid-send (lease run out). That worker may have handed the
 * message to the provider before dying, so the row becomes "in doubt" since its last attempt began:
 * the sender looks the message up before sending again.
 */
export async function reclaimAbandoned(db: Db, limit: number, leaseSeconds: number): Promise<ReminderRow[]> {
  const { rows } = await db.raw<{ rows: ReminderRow[] }>(
    `WITH picked AS (
       SELECT id, attempt_started_at FROM reminders WHERE state = 'sending' AND lease_until < now()
       ORDER BY lease_until LIMIT ? FOR UPDATE SKIP LOCKED)
     UPDATE reminders r SET attempts = r.attempts + 1, attempt_started_at = now(),
       in_doubt_since = COALESCE(r.in_doubt_since, picked.attempt_started_at),
       lease_until = now() + make_interval(secs => ?), updated_at = now()
     FROM picked WHERE r.id = picked.id
     RETURNING ${returning}`,
    [limit, leaseSeconds],
  );
  return rows;
}

/** Freezes the text of rows claimed for the first time, in one statement for the batch. */
export async function saveTexts(db: Db, texts: { id: number; subject: string | null; body: string; html: string | null }[]): Promise<void> {
  if (texts.length === 0) return;
  await db.raw(
    `UPDATE reminders r SET subject = v.subject, body = v.body, html = v.html
     FROM json_to_recordset(?::json) AS v(id bigint, subject text, body text, html text)
     WHERE r.id = v.id AND r.state = 'sending'`,
    [JSON.stringify(texts)],
  );
}

/** The provider accepted the message. A status callback may have got there first; never move a row backwards. */
export async function markSent(db: Db, id: number, providerId: string): Promise<void> {
  await db("reminders")
    .where({ id })
    .update({
      state: db.raw("CASE WHEN state = 'sending' THEN 'sent' ELSE state END"),
      provider_id: db.raw("COALESCE(provider_id, ?)", [providerId]),
      sent_at: db.raw("COALESCE(sent_at, now())"),
      lease_until: null,
      in_doubt_since: null,
      last_error: null,
      updated_at: db.fn.now(),
    });
}

/** Back to the queue for a later attempt. `inDoubt`: the attempt may have reached the provider. */
export async function scheduleRetry(db: Db, id: number, at: Date, error: string, options: { inDoubt?: boolean; refundAttempt?: boolean } = {}): Promise<void> {
  await db("reminders")
    .where({ id, state: "sending" })
    .update({
      state: "scheduled",
      next_attempt_at: at,
      last_error: error,
      lease_until: null,
      ...(options.inDoubt && { in_doubt_since: db.raw("COALESCE(in_doubt_since, attempt_started_at)") }),
      // Held for quiet hours, not tried: the attempt does not count against the limit.
      ...(options.refundAttempt && { attempts: db.raw("attempts - 1") }),
      updated_at: db.fn.now(),
    });
}

export type FinalState = "failed" | "cancelled" | "skipped_opted_out";

export async function finish(db: Db, id: number, state: FinalState, error: string | null): Promise<boolean> {
  const changed = await db("reminders")
    .where({ id, state: "sending" })
    .update({ state, last_error: error, lease_until: null, updated_at: db.fn.now() });
  return changed > 0;
}

/** Provider ids among `sids` that some reminder already owns (so a look-up never adopts another row's message). */
export async function ownedProviderIds(db: Db, sids: string[]): Promise<Set<string>> {
  if (sids.length === 0) return new Set();
  const rows = await db("reminders").whereIn("provider_id", sids).select<{ provider_id: string }[]>("provider_id");
  return new Set(rows.map((r) => r.provider_id));
}

/**
 * The same reminder on the other channel, due now (the worker still applies quiet hours). The
 * dedupe key makes this a no-op when that row already exists (e.g. the customer chose "both").
 */
export async function insertFallback(db: Db, failed: ReminderRow, channel: Channel): Promise<boolean> {
  const inserted = await db("reminders")
    .insert({
      customer_id: failed.customer_id,
      plan_id: failed.plan_id,
      kind: failed.kind,
      local_date: failed.local_date,
      local_time: failed.local_time,
      time_zone: failed.time_zone,
      channel,
      due_at: db.fn.now(),
      next_attempt_at: db.fn.now(),
      fallback_for: failed.id,
      context: failed.context ? JSON.stringify(failed.context) : null,
    })
    .onConflict(["plan_id", "kind", "local_date", "local_time", "channel"])
    .ignore()
    .returning("id");
  return inserted.length > 0;
}

/**
 * markSent for many rows in one statement. At a morning burst one UPDATE per message is most of the
 * worker's database work; sends finishing within a few milliseconds of each other are recorded
 * together. The caller's promise resolves once its row is recorded, so nothing counts as done early.
 */
export class SentRecorder {
  private pending: { id: number; providerId: string; done: () => void; fail: (e: unknown) => void }[] = [];
  private timer: NodeJS.Timeout | undefined;

  constructor(
    private readonly db: Db,
    private readonly maxBatch = 100,
    private readonly maxWaitMs = 5,
  ) {}

  record(id: number, providerId: string): Promise<void> {
    return new Promise<void>((done, fail) => {
      this.pending.push({ id, providerId, done, fail });
      if (this.pending.length >= this.maxBatch) void this.flush();
      else this.timer ??= setTimeout(() => void this.flush(), this.maxWaitMs);
    });
  }

  private async flush(): Promise<void> {
    clearTimeout(this.timer);
    this.timer = undefined;
    const batch = this.pending;
    this.pending = [];
    if (batch.length === 0) return;
    try {
      await this.db.raw(
        `UPDATE reminders r SET state = CASE WHEN r.state = 'sending' THEN 'sent' ELSE r.state END,
           provider_id = COALESCE(r.provider_id, v.provider_id), sent_at = COALESCE(r.sent_at, now()),
           lease_until = NULL, in_doubt_since = NULL, last_error = NULL, updated_at = now()
         FROM json_to_recordset(?::json) AS v(id bigint, provider_id text)
         WHERE r.id = v.id`,
        [JSON.stringify(batch.map((b) => ({ id: b.id, provider_id: b.providerId })))],
      );
      for (const b of batch) b.done();
    } catch (error) {
      // One bad row (e.g. a provider id another row already owns) must not leave the rest unrecorded.
      for (const b of batch) await markSent(this.db, b.id, b.providerId).then(b.done, b.fail);
      void error;
    }
  }
}
