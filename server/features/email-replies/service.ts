import { photoLimits } from "#shared/schemas/questions";
import type { Db } from "../../db.ts";
import { HttpError } from "../../http/errors.ts";
import { escapeHtml } from "../../messaging/escape-html.ts";
import type { Messenger } from "../../messaging/messenger.ts";
import type { PhotoStorage } from "../../storage/index.ts";
import { processPhoto, type ProcessedPhoto } from "../photos/image-pipeline.ts";
import { deletePhotoFiles, writePhotoFiles } from "../photos/photo-files.ts";
import { insertPhotoRows } from "../photos/repo.ts";
import { replyAddress, tokenFromAddress } from "../questions/reply-address.ts";
import { companyName, insertMessage, isUniqueViolation } from "../questions/repo.ts";
import type { InboundAttachment, InboundEmail } from "./parse.ts";
import { refusal, refusalLines, refusalNotice, refusalOfPipelineError, type Refusal } from "./refusal-notice.ts";
import * as repo from "./repo.ts";
import { stripReply } from "./strip-reply.ts";

export type EmailReplyDeps = {
  db: Db;
  storage: PhotoStorage;
  messenger: Messenger;
  inboundDomain: string;
  log: (message: string, err?: unknown) => void;
};

export type { Refusal } from "./refusal-notice.ts";

export type FilingOutcome =
  | { kind: "filed"; messageId: number; photos: number; refused: Refusal[] }
  | { kind: "duplicate" }
  | { kind: "unmatched"; reason: "no_token" | "unknown_token" | "sender_mismatch" };

/** As long as a question typed in the portal may be. */
const MAX_TEXT = 2000;
/** Signature logos and social icons travel as small inline images of an HTML body; they are not photos of a lawn. */
const DECORATION_BYTES = 16 * 1024;
const NO_TEXT = "(Sent by e-mail with no text.)";

const isDecoration = (a: InboundAttachment) => a.inlineRelated && a.contentType.startsWith("image/") && a.data.length < DECORATION_BYTES;

function bodyOf(email: InboundEmail): string {
  const text = stripReply(email.text) || NO_TEXT;
  return text.length > MAX_TEXT ? `${text.slice(0, MAX_TEXT - 1)}…` : text;
}

/** Each attachment through the portal's photo pipeline on its own: one bad file refuses only itself. */
async function processAttachments(attachments: readonly InboundAttachment[], log: EmailReplyDeps["log"]) {
  const accepted: ProcessedPhoto[] = [];
  const refused: Refusal[] = [];
  for (const [index, attachment] of attachments.entries()) {
    const filename = attachment.filename ?? `attachment ${index + 1}`;
    if (accepted.length >= photoLimits.maxCount) {
      refused.push(refusal(filename, "too_many"));
    } else if (attachment.data.length > photoLimits.maxBytes) {
      refused.push(refusal(filename, "file_too_large"));
    } else {
      try {
        accepted.push(await processPhoto(attachment.data));
      } catch (err) {
        if (!(err instanceof HttpError)) log("an e-mail attachment failed the photo pipeline unexpectedly", err);
        refused.push(refusalOfPipelineError(filename, err));
      }
    }
  }
  return { accepted, refused };
}

/**
 * Tells the homeowner which attachments were not added, by e-mail to their address on file (the
 * sender, who matched it). Sent once: only when the reply was newly filed. Never to autoresponders
 * (RFC 3834), so two robots can't answer each other forever. The staff note in the thread records
 * the same refusal, so a failed send loses nothing the technician needs.
 */
async function sendRefusalNotice(deps: EmailReplyDeps, email: InboundEmail, target: repo.ReplyTarget, token: string, refused: Refusal[]) {
  if (email.automated || !target.customerEmail) return;
  const company = await companyName(deps.db, target.companyId);
  const { subject, text } = refusalNotice(company, refused, target.language);
  const html = text.split("\n\n").map((p) => `<p>${escapeHtml(p).replace(/\n/g, "<br>")}</p>`).join("\n");
  const headers: Record<string, string> = { "Auto-Submitted": "auto-replied", "Reply-To": replyAddress(token, deps.inboundDomain) };
  if (email.messageId) {
    headers["In-Reply-To"] = email.messageId;
    headers["References"] = [...email.references, email.messageId].join(" ");
  }
  try {
    await deps.messenger.sendEmail({ to: target.customerEmail, subject, text, html, headers });
  } catch (err) {
    deps.log(`could not tell the homeowner of conversation ${target.conversationId} about a refused attachment`, err);
  }
}

/**
 * Files one received e-mail. Rule for who may write into a conversation: the reply token must
 * name an existing conversation AND the From address must be the homeowner's address on file.
 * The token is unguessable, but a forwarded e-mail (or a shared inbox) carries it to other
 * people; anything else is kept in unmatched_inbound for managers, never dropped, never filed.
 */
export async function fileInboundEmail(deps: EmailReplyDeps, email: InboundEmail): Promise<FilingOutcome> {
  const token = email.recipients.map((r) => tokenFromAddress(r, deps.inboundDomain)).find((t) => t !== null) ?? null;
  const target = token ? await repo.replyTarget(deps.db, token) : undefined;
  const senderMatches = Boolean(target?.customerEmail && email.from && target.customerEmail.toLowerCase() === email.from);

  if (!token || !target || !senderMatches) {
    const attachments = email.attachments.filter((a) => !isDecoration(a));
    await repo.keepUnmatched(deps.db, {
      companyId: target?.companyId ?? (email.from ? await repo.companyOfSender(deps.db, email.from) : null),
      sender: email.from ?? "(no sender)",
      body: bodyOf(email),
      mediaCount: attachments.length,
      externalId: email.externalId,
    });
    return { kind: "unmatched", reason: !token ? "no_token" : !target ? "unknown_token" : "sender_mismatch" };
  }

  // Cheap check first, so a redelivery doesn't run the photo pipeline again; the insert decides races.
  if (await repo.emailAlreadyFiled(deps.db, email.externalId)) return { kind: "duplicate" };

  const { accepted, refused } = await processAttachments(email.attachments.filter((a) => !isDecoration(a)), deps.log);
  const files = await writePhotoFiles(deps.storage, accepted);
  let messageId: number;
  try {
    messageId = await deps.db.transaction(async (trx) => {
      const id = await insertMessage(trx, {
        conversationId: target.conversationId,
        kind: "question",
        authorUserId: target.customerUserId,
        text: bodyOf(email),
        source: "email",
        externalId: email.externalId,
      });
      await insertPhotoRows(trx, id, files);
      if (refused.length > 0) {
        const told = email.automated ? "" : " (they were told by e-mail)";
        await repo.insertSystemNote(trx, target.conversationId, `Not added from the homeowner's e-mail${told}:\n${refusalLines(refused)}`);
      }
      return id;
    });
  } catch (err) {
    await deletePhotoFiles(deps.storage, files);
    // Another delivery of the same e-mail (same Message-ID) was filed meanwhile.
    if (isUniqueViolation(err)) return { kind: "duplicate" };
    throw err;
  }
  if (refused.length > 0) await sendRefusalNotice(deps, email, target, token, refused);
  return { kind: "filed", messageId, photos: files.length, refused };
}
