import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import type { Messenger } from "../../messaging/messenger.ts";
import { SmsSendError } from "../../adapters/sms.ts";
import { EmailSendError } from "../../adapters/email.ts";
import { optOut } from "../preferences/repo.ts";
import { fallbackChannel } from "./channels.ts";
import { claimDue, finish, insertFallback, markSent, ownedProviderIds, reclaimAbandoned, scheduleRetry, SentRecorder, type ReminderRow } from "./ledger.ts";
import { prepareBatch, type Decision } from "./prepare.ts";
import { retryDelayMs, type ReminderSettings } from "./settings.ts";
import type { SmsLookup } from "./sms-lookup.ts";
import { unsubscribeHeaders } from "./unsubscribe.ts";
import { replyAddress } from "../questions/reply-address.ts";

/*
 * Drains due reminders: claim a batch (SKIP LOCKED + state change, so any number of workers can run),
 * prepare it (texts frozen before anything is sent), send with bounded concurrency, and record each
 * outcome with one conditional UPDATE.
 *
 * Exactly once as the customer sees it:
 *  - one row per reminder (dedupe key), claimed by one worker at a time, with a lease;
 *  - the text is frozen at first claim, so every later attempt sends, and looks up, the same text;
 *  - a definite provider error (HTTP 4xx/5xx answer) means nothing was accepted: retry freely;
 *  - an attempt without an answer (time-out, connection reset) or a worker that died mid-send (lease
 *    ran out) leaves the row "in doubt": before sending again we wait out REMINDER_IN_DOUBT_SETTLE_MS
 *    and ask the provider whether a message with that exact text reached that number since the
 *    doubtful attempt began; if so, we adopt its sid instead of sending. The status callback URL
 *    also carries the reminder id, so a callback can record the sid even when the worker could not.
 *  - e-mail has no look-up over SMTP; an in-doubt e-mail is sent again with the same Message-ID so
 *    mail clients fold the two together. That window (SMTP accepted, worker died before one UPDATE)
 *    is the one place a duplicate remains possible; see README.md.
 */

export type DispatcherDeps = {
  db: Db;
  config: Pick<Config, "PUBLIC_URL" | "SESSION_SECRET" | "EMAIL_FROM" | "INBOUND_EMAIL_DOMAIN">;
  messenger: Messenger;
  lookup: SmsLookup;
  settings: ReminderSettings;
  log: (message: string, err?: unknown) => void;
};

type Outcome = "sent" | "retry" | "failed" | "skipped";

export class ReminderDispatcher {
  private readonly inFlight = new Set<Promise<void>>();
  private running = false;
  private loop: Promise<void> | undefined;
  private wake: (() => void) | undefined;
  readonly counts: Record<Outcome, number> = { sent: 0, retry: 0, failed: 0, skipped: 0 };
  private readonly sent: SentRecorder;

  constructor(private readonly deps: DispatcherDeps) {
    this.sent = new SentRecorder(deps.db);
  }

  start(): void {
    if (this.running) return;
    this.running = true;
    this.loop = this.run();
  }

  /** Looks for due reminders now rather than at the next poll (e.g. right after a refresh scheduled some). */
  wakeUp(): void {
    this.wake?.();
  }

  /** Stops claiming, lets sends already in flight finish and be recorded, then resolves. */
  async stop(): Promise<void> {
    this.running = false;
    this.wake?.();
    await this.loop;
    await Promise.allSettled([...this.inFlight]);
  }

  /** One pass for tests and scripts: claims and sends until nothing is due, then waits for the sends. */
  async drain(): Promise<number> {
    let total = 0;
    for (;;) {
      const claimed = await this.fill(this.deps.settings.REMINDER_CONCURRENCY - this.inFlight.size);
      total += claimed;
      if (claimed === 0 && this.inFlight.size === 0) return total;
      if (this.inFlight.size > 0) await Promise.race(this.inFlight);
    }
  }

  private async run(): Promise<void> {
    const { REMINDER_CONCURRENCY: concurrency, REMINDER_POLL_MS: pollMs } = this.deps.settings;
    // Claim again once a quarter of the slots are free: fewer, larger claims than one per finished send.
    const refillAt = Math.max(1, Math.floor(concurrency / 4));
    while (this.running) {
      let claimed = 0;
      const free = concurrency - this.inFlight.size;
      if (free >= refillAt || this.inFlight.size === 0) {
        try {
          claimed = await this.fill(free);
        } catch (error) {
          this.deps.log("reminder worker: claiming failed (database unavailable?)", error);
        }
      }
      if (!this.running) break;
      // Busy: wake as soon as a send finishes. Idle: look again after the poll interval.
      if (claimed > 0 && this.inFlight.size < concurrency) continue;
      await this.sleep(pollMs, claimed > 0 || this.inFlight.size > 0 ? [...this.inFlight] : []);
    }
  }

  private sleep(ms: number, orAnyOf: Promise<void>[]): Promise<void> {
    return new Promise<void>((resolve) => {
      const timer = setTimeout(done, ms);
      function done() {
        clearTimeout(timer);
        resolve();
      }
      this.wake = done;
      for (const p of orAnyOf) void p.finally(done);
    });
  }

  /** Claims up to `free` rows (abandoned ones first), prepares them and starts their sends. Returns how many were claimed. */
  private async fill(free: number): Promise<number> {
    if (free <= 0) return 0;
    const { db, settings } = this.deps;
    const lease = settings.REMINDER_LEASE_SECONDS;
    const abandoned = await reclaimAbandoned(db, free, lease);
    const due = abandoned.length < free ? await claimDue(db, free - abandoned.length, lease) : [];
    const rows = [...abandoned, ...due];
    if (rows.length === 0) return 0;
    let decisions: Decision[];
    try {
      decisions = await prepareBatch(db, this.deps.config, rows);
    } catch (error) {
      // The rows stay "sending" until their lease runs out, then any worker takes them over.
      this.deps.log("reminder worker: preparing a batch failed", error);
      return rows.length;
    }
    for (const decision of decisions) {
      const task = this.carryOut(decision).catch((error) => this.deps.log(`reminder ${decision.row.id}: recording the outcome failed`, error));
      this.inFlight.add(task);
      void task.finally(() => this.inFlight.delete(task));
    }
    return rows.length;
  }

  private async carryOut(decision: Decision): Promise<void> {
    const { db } = this.deps;
    const { row } = decision;
    if (decision.action === "hold") {
      await scheduleRetry(db, row.id, decision.until, "held for quiet hours", { refundAttempt: true });
      return;
    }
    if (decision.action === "finish") {
      await this.finishWith(row, decision.state, decision.error, decision.fallback);
      this.counts[decision.state === "failed" ? "failed" : "skipped"] += 1;
      return;
    }
    if (row.in_doubt_since && row.channel === "sms") {
      let adopted: boolean;
      try {
        adopted = await this.adoptEarlierSend(row, decision.to, decision.body);
      } catch (error) {
        // Can't tell whether it went: sending blind could duplicate it, so ask again later.
        await scheduleRetry(db, row.id, new Date(Date.now() + retryDelayMs(row.attempts, this.deps.settings)), `provider look-up failed: ${describe(error)}`, { inDoubt: true });
        this.counts.retry += 1;
        return;
      }
      if (adopted) {
        this.counts.sent += 1;
        return;
      }
    }
    let providerId: string;
    try {
      ({ providerId } =
        row.channel === "sms"
          ? await this.deps.messenger.sendSms({ to: decision.to, body: decision.body, ...this.callbackFor(row) })
          : await this.deps.messenger.sendEmail({
              to: decision.to,
              subject: decision.subject ?? "",
              text: decision.body,
              html: decision.html ?? "",
              headers: {
                ...unsubscribeHeaders(this.deps.config, decision.recipient.customerId),
                "Message-ID": messageIdFor(row, this.deps.config.PUBLIC_URL),
                // A reply lands in the plan's conversation (the inbound listener files it by this address).
                ...(decision.replyToken && { "Reply-To": replyAddress(decision.replyToken, this.deps.config.INBOUND_EMAIL_DOMAIN) }),
              },
            }));
    } catch (error) {
      await this.failedAttempt(decision, error);
      return;
    }
    await this.sent.record(row.id, providerId);
    this.counts.sent += 1;
  }

  private callbackFor(row: ReminderRow) {
    if (!this.deps.settings.REMINDER_STATUS_CALLBACKS) return {};
    const url = new URL("/api/webhooks/sms/status", this.deps.config.PUBLIC_URL);
    url.searchParams.set("reminder", String(row.id));
    return { statusCallback: url.href };
  }

  /** In doubt: if the provider has our exact text to this number since the doubtful attempt, that was it. */
  private async adoptEarlierSend(row: ReminderRow, to: string, body: string): Promise<boolean> {
    const { db } = this.deps;
    if (row.provider_id) {
      // A status callback already told us the sid.
      await markSent(db, row.id, row.provider_id);
      return true;
    }
    const sids = await this.deps.lookup({ to, body, since: row.in_doubt_since! });
    const owned = await ownedProviderIds(db, sids);
    const sid = sids.find((s) => !owned.has(s));
    if (!sid) return false;
    await markSent(db, row.id, sid);
    this.deps.log(`reminder ${row.id}: found at the provider after an interrupted attempt (${sid}); not sent again`);
    return true;
  }

  private async failedAttempt(decision: Extract<Decision, { action: "send" }>, error: unknown): Promise<void> {
    const { db, settings } = this.deps;
    const { row } = decision;
    const classified = error instanceof SmsSendError || error instanceof EmailSendError ? error : undefined;
    const message = describe(error);
    if (classified?.kind === "transient" && row.attempts < settings.REMINDER_MAX_ATTEMPTS) {
      // No answer at all: the provider may have accepted it. Give it time to show up before looking.
      const noAnswer = classified.status === null;
      const delay = Math.max(retryDelayMs(row.attempts, settings), noAnswer && row.channel === "sms" ? settings.REMINDER_IN_DOUBT_SETTLE_MS : 0);
      await scheduleRetry(db, row.id, new Date(Date.now() + delay), message, { inDoubt: noAnswer });
      this.counts.retry += 1;
      return;
    }
    if (error instanceof SmsSendError && error.code === 21610) {
      // The carrier says the number texted STOP (maybe to a message we never saw): honour it everywhere.
      await optOut(db, row.customer_id, "sms", "provider");
    }
    const recipient = decision.recipient;
    const optedOut = new Set(recipient.optedOut);
    if (error instanceof SmsSendError && error.code === 21610) optedOut.add("sms");
    const fallback = row.fallback_for ? null : fallbackChannel(row.channel, recipient.channels, recipient, optedOut);
    await this.finishWith(row, "failed", classified?.kind === "transient" ? `gave up after ${row.attempts} attempts: ${message}` : message, fallback);
    this.counts.failed += 1;
  }

  private async finishWith(row: ReminderRow, state: "failed" | "cancelled" | "skipped_opted_out", error: string | null, fallback: "sms" | "email" | null) {
    // One transaction, so a crash can't leave a failed reminder without its fallback.
    await this.deps.db.transaction(async (trx) => {
      const changed = await finish(trx, row.id, state, error);
      if (!changed) return;
      // The "how to stop" intro did not reach anyone; the next text carries it.
      if (row.channel === "sms") await trx("sms_intros").where({ customer_id: row.customer_id, reminder_id: row.id }).delete();
      if (fallback && state !== "cancelled") await insertFallback(trx, row, fallback);
    });
  }
}

function describe(error: unknown): string {
  if (error instanceof SmsSendError) return `SMS ${error.status ?? "no answer"}${error.code ? ` (${error.code})` : ""}: ${error.message}`;
  if (error instanceof EmailSendError) return `e-mail ${error.status ?? "no answer"}${error.code ? ` (${error.code})` : ""}: ${error.message}`;
  return error instanceof Error ? error.message : String(error);
}

/** Stable per reminder, so a resent e-mail is recognisably the same message. */
function messageIdFor(row: ReminderRow, publicUrl: string): string {
  return `<reminder-${row.id}@${new URL(publicUrl).hostname}>`;
}
