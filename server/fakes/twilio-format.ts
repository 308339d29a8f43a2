import { randomBytes } from "node:crypto";
import type { RecordedSms } from "./sms-log.ts";

/** Shapes and identifiers as Twilio's REST API returns them, so the real SDK parses our answers unchanged. */

export const TWILIO_API_VERSION = "2010-04-01";

/** Twilio sids are a two-letter prefix plus 32 lowercase hex characters. */
export function newSid(prefix: "SM" | "MM" | "ME"): string {
  return prefix + randomBytes(16).toString("hex");
}

/** Twilio writes dates in RFC 2822 form, e.g. "Tue, 01 Dec 2026 21:29:00 +0000". */
export function rfc2822(iso: string): string {
  return new Date(iso).toUTCString().replace("GMT", "+0000");
}

/** GSM-7 fits 160 characters per single segment (153 when split); anything else is sent as UCS-2 (70 / 67). */
export function countSegments(body: string): number {
  const gsm7 = /^[\n\r\x20-\x7E£¥èéùìòÇØøÅåΔ_ΦΓΛΩΠΨΣΘΞÆæßÉ¤¡ÄÖÑÜ§¿äöñüà€]*$/;
  const [single, multi] = gsm7.test(body) ? [160, 153] : [70, 67];
  const length = [...body].length;
  return length <= single ? 1 : Math.ceil(length / multi);
}

/** The Message resource as returned by POST/GET .../Messages(.json). */
export function messageResource(message: RecordedSms) {
  const uri = `/${TWILIO_API_VERSION}/Accounts/${message.accountSid}/Messages/${message.sid}.json`;
  return {
    account_sid: message.accountSid,
    api_version: TWILIO_API_VERSION,
    body: message.body,
    date_created: rfc2822(message.dateCreated),
    date_sent: message.status === "queued" ? null : rfc2822(message.dateUpdated),
    date_updated: rfc2822(message.dateUpdated),
    direction: message.direction,
    error_code: message.errorCode,
    error_message: null,
    from: message.from,
    messaging_service_sid: message.messagingServiceSid,
    num_media: "0",
    num_segments: String(countSegments(message.body)),
    price: null,
    price_unit: "USD",
    sid: message.sid,
    status: message.status,
    subresource_uris: { media: uri.replace(/\.json$/, "/Media.json") },
    to: message.to,
    uri,
  };
}

/** Twilio's REST error body: {code, message, more_info, status}. */
export interface TwilioErrorBody {
  code: number;
  message: string;
  more_info: string;
  status: number;
}

export function twilioError(status: number, code: number, message: string): TwilioErrorBody {
  return { code, message, more_info: `https://www.twilio.com/docs/errors/${code}`, status };
}
