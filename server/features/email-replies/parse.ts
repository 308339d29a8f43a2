import { createHash } from "node:crypto";
import type { Readable } from "node:stream";
import { simpleParser, type AddressObject, type Attachment } from "mailparser";

/** One received e-mail, reduced to what filing a reply needs. */
export type InboundEmail = {
  /** Message-ID, or a digest of sender, date, subject and text when the sender's software set none. */
  externalId: string;
  messageId: string | null;
  /** The From address, lower-case. */
  from: string | null;
  /** Envelope recipients first, then To, Cc and Delivered-To: where a reply token may be. */
  recipients: string[];
  subject: string | null;
  text: string;
  attachments: InboundAttachment[];
  /** An autoresponder, bounce or list mail (RFC 3834): never answered automatically. */
  automated: boolean;
  references: string[];
};

export type InboundAttachment = { filename: string | null; contentType: string; data: Buffer; inlineRelated: boolean };

const addressPattern = /[^\s<>"',;:]+@[^\s<>"',;:]+/g;

function addresses(value: AddressObject | AddressObject[] | undefined): string[] {
  const list = Array.isArray(value) ? value : value ? [value] : [];
  return list.flatMap((a) => a.value).map((a) => a.address ?? "").filter(Boolean);
}

function headerLineValues(lines: readonly { key: string; line: string }[], key: string): string[] {
  return lines.filter((l) => l.key === key).map((l) => l.line.slice(l.line.indexOf(":") + 1).trim());
}

function isAutomated(lines: readonly { key: string; line: string }[]): boolean {
  const auto = headerLineValues(lines, "auto-submitted");
  if (auto.some((v) => !/^no\b/i.test(v))) return true;
  if (headerLineValues(lines, "precedence").some((v) => /^(bulk|junk|list|auto_reply)\b/i.test(v))) return true;
  return ["x-autoreply", "x-autorespond", "list-id"].some((k) => headerLineValues(lines, k).length > 0);
}

const toAttachment = (a: Attachment): InboundAttachment => ({
  filename: a.filename ?? null,
  contentType: a.contentType,
  data: a.content,
  inlineRelated: a.related === true,
});

/** Mail is not a form its sender can correct, so NUL (which PostgreSQL text cannot hold) is dropped rather than refused. */
const withoutNul = (value: string) => (value.includes("\0") ? value.replaceAll("\0", "") : value);

export async function parseInbound(source: Readable | Buffer, envelopeRecipients: readonly string[] = []): Promise<InboundEmail> {
  const parsed = await simpleParser(source, { skipHtmlToText: false, skipTextToHtml: true, skipImageLinks: true });
  const lines = parsed.headerLines;
  const deliveredTo = headerLineValues(lines, "delivered-to").flatMap((v) => v.match(addressPattern) ?? []);
  const recipients = [...envelopeRecipients, ...addresses(parsed.to), ...addresses(parsed.cc), ...deliveredTo];
  const sender = addresses(parsed.from)[0];
  const from = sender === undefined ? null : withoutNul(sender).toLowerCase();
  const text = withoutNul(parsed.text ?? "");
  const messageId = withoutNul(parsed.messageId ?? "").trim() || null;
  const externalId =
    messageId ??
    `sha256:${createHash("sha256").update([from, parsed.date?.toISOString(), parsed.subject, text].join("\n")).digest("hex")}`;
  const references = typeof parsed.references === "string" ? [parsed.references] : (parsed.references ?? []);
  return {
    externalId,
    messageId,
    from,
    recipients: [...new Set(recipients.map((r) => r.trim()).filter(Boolean))],
    subject: parsed.subject === undefined ? null : withoutNul(parsed.subject),
    text,
    attachments: parsed.attachments.map(toAttachment),
    automated: isAutomated(lines),
    references,
  };
}
