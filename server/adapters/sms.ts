import twilio from "twilio";
import type RequestClientType from "twilio/lib/base/RequestClient";
import type { SendErrorKind } from "./send-error.ts";

export interface SmsSenderConfig {
  accountSid: string;
  authToken: string;
  /** Our number in E.164, or a Messaging Service sid ("MG…"). */
  from: string;
  /** Base URL of the local fake gateway; when absent the SDK talks to the real Twilio API. */
  apiBaseUrl?: string;
  /** Give up on one REST call after this long (default 10 s); a time-out is transient. */
  timeoutMs?: number;
}

export interface OutgoingSmsMessage {
  to: string;
  body: string;
  /** Where Twilio reports queued / sent / delivered / undelivered, signed with the auth token. */
  statusCallback?: string;
}

export interface SmsSender {
  send(message: OutgoingSmsMessage): Promise<{ sid: string; status: string }>;
}

export class SmsSendError extends Error {
  override readonly name = "SmsSendError";
  constructor(
    readonly kind: SendErrorKind,
    /** HTTP status from the provider, or null when no answer came (network error, time-out). */
    readonly status: number | null,
    /** Twilio's error code (e.g. 21211 invalid number, 21610 opted out, 20429 too many requests), or a Node error code. */
    readonly code: number | string | null,
    message: string,
    options?: { cause?: unknown },
  ) {
    super(message, options);
  }
}

/**
 * Sends SMS through the real twilio SDK. With apiBaseUrl (development and tests) the SDK's own
 * HTTP client is kept and only the host is swapped, so everything else (auth, form encoding,
 * error parsing) is exercised exactly as in production.
 */
export function createSmsSender(config: SmsSenderConfig): SmsSender {
  const timeout = config.timeoutMs ?? 10_000;
  const client = twilio(config.accountSid, config.authToken, {
    timeout,
    ...(config.apiBaseUrl && { httpClient: new RedirectingRequestClient(config.apiBaseUrl, { timeout }) }),
  });
  const sender = config.from.startsWith("MG") ? { messagingServiceSid: config.from } : { from: config.from };

  return {
    async send(message) {
      try {
        const created = await client.messages.create({
          ...sender,
          to: message.to,
          body: message.body,
          ...(message.statusCallback && { statusCallback: message.statusCallback }),
        });
        return { sid: created.sid, status: created.status };
      } catch (error) {
        throw toSmsSendError(error);
      }
    },
  };
}

/** Checks X-Twilio-Signature on a webhook: url is the exact public URL Twilio called, params the form fields. */
export function verifyTwilioSignature(authToken: string, url: string, params: Record<string, unknown>, signature: string | undefined): boolean {
  if (!signature) return false;
  return twilio.validateRequest(authToken, signature, url, params);
}

/** The SDK's RequestClient with every *.twilio.com URL rewritten onto the fake's base URL. */
class RedirectingRequestClient extends twilio.RequestClient {
  private readonly base: URL;

  constructor(apiBaseUrl: string, options: RequestClientType.RequestClientOptions) {
    super(options);
    this.base = new URL(apiBaseUrl);
  }

  override request<TData>(opts: RequestClientType.RequestOptions<TData>) {
    return super.request({ ...opts, uri: this.rewrite(opts.uri) });
  }

  private rewrite(uri: string): string {
    const original = new URL(uri);
    // Regions and edges change the host (api.dublin.ie1.twilio.com); all of them go to the fake.
    if (original.hostname !== "twilio.com" && !original.hostname.endsWith(".twilio.com")) return uri;
    const target = new URL(this.base.href);
    target.pathname = this.base.pathname.replace(/\/$/, "") + original.pathname;
    target.search = original.search;
    return target.href;
  }
}

/** Node and axios codes meaning the request never got a usable answer; worth trying again. */
const NETWORK_ERROR_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ECONNABORTED",
  "ETIMEDOUT",
  "EPIPE",
  "EAI_AGAIN",
  "ENOTFOUND",
  "ENETUNREACH",
  "EHOSTUNREACH",
  "ERR_NETWORK",
  "ERR_SOCKET_CONNECTION_TIMEOUT",
  "ERR_BAD_RESPONSE",
]);

/** Classifies what the SDK threw: provider answers by status, transport failures as transient. */
export function toSmsSendError(error: unknown): SmsSendError {
  if (error instanceof SmsSendError) return error;
  const e = (error ?? {}) as { status?: unknown; code?: unknown; message?: unknown; isAxiosError?: unknown };
  const message = typeof e.message === "string" && e.message ? e.message : "SMS could not be sent";
  // RestException and TwilioServiceException both carry the HTTP status and Twilio's numeric code.
  if (typeof e.status === "number") {
    const code = typeof e.code === "number" ? e.code : null;
    const transient = e.status === 408 || e.status === 429 || e.status >= 500;
    return new SmsSendError(transient ? "transient" : "permanent", e.status, code, message, { cause: error });
  }
  const nodeCode = typeof e.code === "string" ? e.code : null;
  if (e.isAxiosError === true || (nodeCode && NETWORK_ERROR_CODES.has(nodeCode))) {
    return new SmsSendError("transient", null, nodeCode, message, { cause: error });
  }
  // Anything else (e.g. the SDK refusing a missing parameter) is our own mistake: retrying will not help.
  return new SmsSendError("permanent", null, nodeCode, message, { cause: error });
}
