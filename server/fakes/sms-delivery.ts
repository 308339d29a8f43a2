import { postSignedWebhook } from "./signed-webhook.ts";
import type { RecordedSms, SmsLog, SmsStatus } from "./sms-log.ts";
import { TWILIO_API_VERSION } from "./twilio-format.ts";

/** Numbers ending in 1111 are accepted but never reach the handset, to exercise "undelivered" handling. */
export function isUnreachableNumber(to: string): boolean {
  return to.endsWith("1111");
}

/** Twilio's "Unreachable destination handset" error, carried in the undelivered callback. */
const UNREACHABLE_ERROR_CODE = 30003;

/**
 * Walks an accepted message through queued → sent → delivered (or undelivered), one step every
 * stepMs, and reports each step to its StatusCallback with a signed POST, in order.
 */
export class DeliverySimulator {
  private readonly timers = new Set<NodeJS.Timeout>();
  private readonly inFlight = new Set<Promise<void>>();
  private readonly abort = new AbortController();
  private stopped = false;

  constructor(
    private readonly log: SmsLog,
    private readonly authToken: () => string,
    private readonly stepMs: number,
  ) {}

  start(message: RecordedSms): void {
    const finalStep: [SmsStatus, number | null] = isUnreachableNumber(message.to)
      ? ["undelivered", UNREACHABLE_ERROR_CODE]
      : ["delivered", null];
    const steps: Array<[SmsStatus, number | null]> = [["queued", null], ["sent", null], finalStep];
    // One chain per message keeps its callbacks in order even when the receiving app is slow.
    let chain = Promise.resolve();
    steps.forEach(([status, errorCode], index) => {
      this.after(index * this.stepMs, () => {
        if (index > 0) this.log.setStatus(message.sid, status, errorCode);
        chain = chain.then(() => this.notify(message.sid, status, errorCode));
        this.track(chain);
      });
    });
  }

  /** Cancels future steps and waits for callbacks already on their way, so tests end cleanly. */
  async stop(): Promise<void> {
    this.stopped = true;
    for (const timer of this.timers) clearTimeout(timer);
    this.timers.clear();
    this.abort.abort();
    await Promise.allSettled([...this.inFlight]);
  }

  private after(ms: number, run: () => void): void {
    if (this.stopped) return;
    const timer = setTimeout(() => {
      this.timers.delete(timer);
      run();
    }, ms);
    this.timers.add(timer);
  }

  private track(promise: Promise<void>): void {
    this.inFlight.add(promise);
    void promise.finally(() => this.inFlight.delete(promise));
  }

  private async notify(sid: string, status: SmsStatus, errorCode: number | null): Promise<void> {
    const message = this.log.get(sid);
    if (!message?.statusCallback || this.stopped) return;
    const params: Record<string, string> = {
      AccountSid: message.accountSid,
      ApiVersion: TWILIO_API_VERSION,
      From: message.from ?? "",
      MessageSid: message.sid,
      MessageStatus: status,
      SmsSid: message.sid,
      SmsStatus: status,
      To: message.to,
    };
    if (message.messagingServiceSid) params.MessagingServiceSid = message.messagingServiceSid;
    if (errorCode !== null) params.ErrorCode = String(errorCode);
    const attempt = { status, url: message.statusCallback, at: new Date().toISOString(), httpStatus: null as number | null, error: null as string | null };
    try {
      const answer = await postSignedWebhook(message.statusCallback, params, this.authToken(), this.abort.signal);
      attempt.httpStatus = answer.status;
    } catch (error) {
      // Like Twilio, a failed callback is not retried; it is only noted for whoever is looking.
      attempt.error = error instanceof Error ? error.message : String(error);
    }
    message.callbacks.push(attempt);
  }
}
