/** What the fake SMS gateway remembers about every message it handled. */

export type SmsDirection = "outbound-api" | "outbound-reply" | "inbound";
export type SmsStatus = "queued" | "sent" | "delivered" | "undelivered" | "failed" | "received";

/** One status callback the gateway tried to deliver, kept so tests and humans can see what the app was told. */
export interface CallbackAttempt {
  status: SmsStatus;
  url: string;
  at: string;
  httpStatus: number | null;
  error: string | null;
}

export interface RecordedSms {
  sid: string;
  accountSid: string;
  direction: SmsDirection;
  to: string;
  from: string | null;
  messagingServiceSid: string | null;
  body: string;
  status: SmsStatus;
  errorCode: number | null;
  statusCallback: string | null;
  dateCreated: string;
  dateUpdated: string;
  callbacks: CallbackAttempt[];
}

/** In-memory list, oldest first; the fake is one process, so nothing more is needed. */
export class SmsLog {
  private readonly messages: RecordedSms[] = [];
  /** Every status step looks its message up; a linear search made a 20,000-message burst quadratic. */
  private readonly bySid = new Map<string, RecordedSms>();

  add(message: RecordedSms): RecordedSms {
    this.messages.push(message);
    this.bySid.set(message.sid, message);
    return message;
  }

  get(sid: string): RecordedSms | undefined {
    return this.bySid.get(sid);
  }

  /** Copies, so callers cannot change what the gateway remembers. */
  list(): RecordedSms[] {
    return this.messages.map((m) => ({ ...m, callbacks: [...m.callbacks] }));
  }

  setStatus(sid: string, status: SmsStatus, errorCode: number | null = null): RecordedSms | undefined {
    const message = this.get(sid);
    if (!message) return undefined;
    message.status = status;
    message.errorCode = errorCode;
    message.dateUpdated = new Date().toISOString();
    return message;
  }

  clear(): void {
    this.messages.length = 0;
    this.bySid.clear();
  }
}
