import type { OutboxMessage } from "#shared/schemas/outbox";
import type { RecordedSms } from "./sms-log.ts";
import type { ReceivedEmail } from "./smtp.ts";

/** http(s) URLs up to whitespace, quotes or angle brackets (those end a URL in text and in HTML). */
const URL_PATTERN = /https?:\/\/[^\s"'<>`]+/gi;

/** Characters that usually end a sentence rather than a URL ("Open https://x.example/a." ). */
const TRAILING_PUNCTUATION = /[.,;:!?)\]}]+$/;

/**
 * Every distinct http(s) link in the text and the HTML, in order of first appearance, so a test or
 * a demo can follow the link a message carries. HTML entities in href values are decoded.
 */
export function extractLinks(text: string, html: string | null = null): string[] {
  const links = new Set<string>();
  for (const source of [text, html ? decodeHtmlEntities(html) : ""]) {
    for (const match of source.matchAll(URL_PATTERN)) {
      const link = trimUnbalanced(match[0].replace(TRAILING_PUNCTUATION, ""), match[0]);
      if (link.length > "https://".length) links.add(link);
    }
  }
  return [...links];
}

/** Keeps a closing bracket that belongs to the URL itself, e.g. https://en.example/wiki/Lawn_(grass). */
function trimUnbalanced(trimmed: string, original: string): string {
  const opens = (trimmed.match(/\(/g) ?? []).length;
  const closes = (trimmed.match(/\)/g) ?? []).length;
  if (opens > closes && original.slice(trimmed.length).startsWith(")")) return `${trimmed})`;
  return trimmed;
}

function decodeHtmlEntities(html: string): string {
  return html
    .replaceAll("&amp;", "&")
    .replaceAll("&#38;", "&")
    .replaceAll("&#x2F;", "/")
    .replaceAll("&#47;", "/")
    .replaceAll("&#x3D;", "=")
    .replaceAll("&#61;", "=");
}

/** Messages our app sent; texts customers sent to us are not part of the outbox. */
export function smsToOutbox(message: RecordedSms): OutboxMessage {
  return {
    id: message.sid,
    channel: "sms",
    to: message.to,
    from: message.from ?? message.messagingServiceSid ?? "",
    subject: null,
    text: message.body,
    html: null,
    status: message.status,
    receivedAt: message.dateCreated,
    links: extractLinks(message.body),
  };
}

export function emailToOutbox(message: ReceivedEmail): OutboxMessage {
  return {
    id: message.id,
    channel: "email",
    // The envelope holds the bare addresses the message really went to; the To header may differ (Bcc).
    to: message.envelopeTo.join(", ") || message.to,
    from: message.from || message.envelopeFrom || "",
    subject: message.subject,
    text: message.text,
    html: message.html,
    status: "received",
    receivedAt: message.receivedAt,
    links: extractLinks(message.text, message.html),
  };
}

/** SMS and e-mail in one list, newest first; equal timestamps keep the later-recorded message first within a channel. */
export function buildOutbox(sms: RecordedSms[], emails: ReceivedEmail[]): OutboxMessage[] {
  const outgoing = sms.filter((m) => m.direction !== "inbound").map(smsToOutbox);
  const merged = [...outgoing, ...emails.map(emailToOutbox)];
  return merged
    .map((message, index) => ({ message, index }))
    .sort((a, b) => b.message.receivedAt.localeCompare(a.message.receivedAt) || b.index - a.index)
    .map(({ message }) => message);
}
