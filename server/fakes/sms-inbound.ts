import { postSignedWebhook } from "./signed-webhook.ts";
import type { RecordedSms, SmsLog } from "./sms-log.ts";
import type { FakeMedia, MediaStore } from "./sms-media.ts";
import { newSid, TWILIO_API_VERSION } from "./twilio-format.ts";

/** Keywords Twilio's default opt-out handling acts on (case-insensitive, whole message). */
const OPT_OUT_WORDS = new Set(["STOP", "STOPALL", "UNSUBSCRIBE", "CANCEL", "END", "QUIT", "REVOKE", "OPTOUT"]);
const OPT_IN_WORDS = new Set(["START", "YES", "UNSTOP"]);

export function optOutChange(body: string): "opt-out" | "opt-in" | null {
  const word = body.trim().toUpperCase();
  if (OPT_OUT_WORDS.has(word)) return "opt-out";
  if (OPT_IN_WORDS.has(word)) return "opt-in";
  return null;
}

export interface InboundResult {
  messageSid: string;
  webhookUrl: string;
  webhookStatus: number;
  webhookContentType: string | null;
  /** The app's answer as it sent it, normally TwiML. */
  twiml: string;
  /** MediaUrlN as posted: where the app had to fetch the photos (behind HTTP Basic). */
  mediaUrls: string[];
  /** Replies the app asked for with <Message> in its TwiML; the fake records them as sent. */
  replies: string[];
}

/** Reads the text of each <Message> verb, which Twilio would send back to the customer. */
export function twimlReplies(twiml: string): string[] {
  const replies: string[] = [];
  for (const match of twiml.matchAll(/<Message\b[^>]*>([\s\S]*?)<\/Message>/g)) {
    const inner = match[1] ?? "";
    // <Message><Body>…</Body></Message> is the long form of the same thing.
    const body = /<Body\b[^>]*>([\s\S]*?)<\/Body>/.exec(inner)?.[1] ?? inner;
    replies.push(decodeXml(body.trim()));
  }
  return replies;
}

function decodeXml(text: string): string {
  return text
    .replaceAll("&lt;", "<")
    .replaceAll("&gt;", ">")
    .replaceAll("&quot;", '"')
    .replaceAll("&apos;", "'")
    .replaceAll("&amp;", "&");
}

/**
 * Simulates a customer texting our number: records the message, POSTs the signed webhook Twilio
 * would send, and records any <Message> replies in the app's TwiML as outbound messages.
 */
export async function deliverInbound(options: {
  log: SmsLog;
  webhookUrl: string;
  accountSid: string;
  authToken: string;
  from: string;
  to: string;
  body: string;
  /** Attachments (MMS): hosted by the fake at Twilio-shaped URLs and announced as MediaUrlN. */
  media?: readonly FakeMedia[];
  mediaStore?: MediaStore;
  /** The fake's own URL, where the media is hosted. */
  baseUrl?: string;
}): Promise<InboundResult> {
  const { log, webhookUrl, accountSid, authToken, from, to, body } = options;
  const media = options.media ?? [];
  const now = new Date().toISOString();
  const inbound: RecordedSms = {
    sid: newSid("SM"),
    accountSid,
    direction: "inbound",
    to,
    from,
    messagingServiceSid: null,
    body,
    status: "received",
    errorCode: null,
    statusCallback: null,
    dateCreated: now,
    dateUpdated: now,
    callbacks: [],
  };
  log.add(inbound);
  const params: Record<string, string> = {
    AccountSid: accountSid,
    ApiVersion: TWILIO_API_VERSION,
    Body: body,
    From: from,
    MessageSid: inbound.sid,
    NumMedia: String(media.length),
    NumSegments: "1",
    SmsMessageSid: inbound.sid,
    SmsSid: inbound.sid,
    SmsStatus: "received",
    To: to,
  };
  if (media.length > 0) {
    if (!options.mediaStore || !options.baseUrl) throw new Error("Media needs a media store and the fake's base URL.");
    for (const [i, item] of media.entries()) {
      params[`MediaUrl${i}`] = options.mediaStore.host(options.baseUrl, accountSid, inbound.sid, item);
      params[`MediaContentType${i}`] = item.contentType;
    }
  }
  const answer = await postSignedWebhook(webhookUrl, params, authToken);
  const replies = answer.status >= 200 && answer.status < 300 ? twimlReplies(answer.body) : [];
  for (const reply of replies) {
    const at = new Date().toISOString();
    log.add({ ...inbound, sid: newSid("SM"), direction: "outbound-reply", to: from, from: to, body: reply, status: "delivered", dateCreated: at, dateUpdated: at, callbacks: [] });
  }
  return {
    messageSid: inbound.sid,
    webhookUrl,
    webhookStatus: answer.status,
    webhookContentType: answer.contentType,
    twiml: answer.body,
    mediaUrls: media.map((_m, i) => params[`MediaUrl${i}`]!),
    replies,
  };
}
