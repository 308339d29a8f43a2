import nodemailer from "nodemailer";
import type { SendErrorKind } from "./send-error.ts";

export interface EmailSenderConfig {
  host: string;
  port: number;
  /** TLS from the first byte (port 465); otherwise STARTTLS is used when the server offers it. */
  secure?: boolean;
  auth?: { user: string; pass: string };
  /** Default From, e.g. "Sproutline <plans@sproutline.example>". */
  from: string;
  /** Give up on connecting or on a silent server after this long (default 15 s). */
  timeoutMs?: number;
}

export interface OutgoingEmailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** Extra headers, e.g. List-Unsubscribe and List-Unsubscribe-Post. */
  headers?: Record<string, string>;
}

export interface EmailSender {
  send(message: OutgoingEmailMessage): Promise<{ messageId: string }>;
}

export class EmailSendError extends Error {
  override readonly name = "EmailSendError";
  constructor(
    readonly kind: SendErrorKind,
    /** SMTP reply code (e.g. 421, 550), or null when the server never answered. */
    readonly status: number | null,
    /** Nodemailer's error code (ECONNECTION, EENVELOPE, …), when there is one. */
    readonly code: string | null,
    message: string,
    options?: { cause?: unknown },
  ) {
    super(message, options);
  }
}

/** Sends e-mail over SMTP with nodemailer; in development and tests host/port point at the fake. */
export function createEmailSender(config: EmailSenderConfig): EmailSender {
  const timeout = config.timeoutMs ?? 15_000;
  const transport = nodemailer.createTransport({
    host: config.host,
    port: config.port,
    secure: config.secure ?? false,
    ...(config.auth && { auth: config.auth }),
    connectionTimeout: timeout,
    greetingTimeout: timeout,
    socketTimeout: timeout,
  });

  return {
    async send(message) {
      try {
        const info = await transport.sendMail({
          from: config.from,
          to: message.to,
          subject: message.subject,
          text: message.text,
          ...(message.html !== undefined && { html: message.html }),
          ...(message.headers && { headers: message.headers }),
        });
        return { messageId: info.messageId };
      } catch (error) {
        throw toEmailSendError(error);
      }
    },
  };
}

/** Codes for failures before or outside an SMTP answer: the server may well be back soon. */
const TRANSIENT_CODES = new Set(["ECONNECTION", "ETIMEDOUT", "ESOCKET", "EDNS", "ECONNREFUSED", "ECONNRESET", "EPROXY"]);

/**
 * SMTP says it directly: 4xx replies are temporary, 5xx permanent (RFC 5321 §4.2.1). Without a
 * reply, connection trouble is transient and anything else (bad message, bad config) permanent.
 */
export function toEmailSendError(error: unknown): EmailSendError {
  if (error instanceof EmailSendError) return error;
  const e = (error ?? {}) as { responseCode?: unknown; code?: unknown; message?: unknown };
  const message = typeof e.message === "string" && e.message ? e.message : "E-mail could not be sent";
  const code = typeof e.code === "string" ? e.code : null;
  const status = typeof e.responseCode === "number" ? e.responseCode : null;
  if (status !== null) {
    return new EmailSendError(status >= 400 && status < 500 ? "transient" : "permanent", status, code, message, { cause: error });
  }
  const kind = code && TRANSIENT_CODES.has(code) ? "transient" : "permanent";
  return new EmailSendError(kind, null, code, message, { cause: error });
}
