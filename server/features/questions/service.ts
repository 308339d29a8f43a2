import type { ThreadMessage, ThreadResponse } from "#shared/schemas/questions";
import type { Db } from "../../db.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import type { PhotoStorage } from "../../storage/index.ts";
import type { PlanAccess } from "../plans/access.ts";
import { processPhotos } from "../photos/image-pipeline.ts";
import { deletePhotoFiles, writePhotoFiles } from "../photos/photo-files.ts";
import { insertPhotoRows, photosByMessage } from "../photos/repo.ts";
import { dueCheckInRequests, type CheckInRequest } from "./check-ins.ts";
import * as repo from "./repo.ts";

export type QuestionDeps = { db: Db; storage: PhotoStorage; now?: () => Date };

export const sideOf = (user: SessionUser): repo.Side => (user.role === "customer" ? "customer" : "staff");

/** Unread means: from the other side, and newer than the reader's mark. Staff don't "read" system messages. */
function isFromOtherSide(side: repo.Side, authorRole: ThreadMessage["authorRole"]): boolean {
  return side === "customer" ? authorRole !== "customer" : authorRole === "customer";
}

function toMessage(row: repo.MessageRow, side: repo.Side, company: string, photos: ThreadMessage["photos"]): ThreadMessage {
  const authorRole = row.authorRole ?? "system";
  return {
    id: row.id,
    kind: row.kind,
    authorRole,
    authorName: row.authorName ?? company,
    text: row.text,
    photos,
    createdAt: row.createdAt.toISOString(),
    unread: row.afterLastRead && isFromOtherSide(side, authorRole),
  };
}

/** Virtual messages carry the negated step id, so they never collide with stored message ids. */
function checkInMessage(request: CheckInRequest, side: repo.Side, company: string, lastReadAt: Date | null): ThreadMessage {
  return {
    id: -request.stepId,
    kind: "check_in_request",
    authorRole: "system",
    authorName: company,
    text: request.detail ? `${request.title}\n${request.detail}` : request.title,
    photos: [],
    createdAt: request.createdAt.toISOString(),
    unread: side === "customer" && (lastReadAt === null || request.createdAt > lastReadAt),
  };
}

/** The plan's thread for this reader, with unread flags as they were before this read; then marks it read. */
export async function readThread(deps: QuestionDeps, user: SessionUser, plan: PlanAccess): Promise<ThreadResponse> {
  const side = sideOf(user);
  const now = deps.now?.() ?? new Date();
  const conversation = await repo.ensureConversation(deps.db, plan.planId, side);
  const [rows, checkIns, company] = await Promise.all([
    repo.listMessages(deps.db, conversation.id, side),
    dueCheckInRequests(deps.db, plan, now),
    repo.companyName(deps.db, plan.companyId),
  ]);
  const photos = await photosByMessage(deps.db, rows.map((r) => r.id));
  const messages = [
    ...rows.map((r) => toMessage(r, side, company, photos.get(r.id) ?? [])),
    ...checkIns.map((c) => checkInMessage(c, side, company, conversation.lastReadAt)),
  ].sort((a, b) => a.createdAt.localeCompare(b.createdAt) || a.id - b.id);

  const newestCheckIn = checkIns.reduce<Date | null>((max, c) => (!max || c.createdAt > max ? c.createdAt : max), null);
  await repo.markRead(deps.db, conversation.id, side, rows.map((r) => r.id), newestCheckIn);
  return { planId: plan.planId, messages };
}

/**
 * Adds a message with its photos, all or nothing: every photo is checked and re-encoded
 * before anything is written; files are written, then the rows in one transaction; if the
 * transaction fails, the files are removed again.
 */
async function postMessage(
  deps: QuestionDeps,
  user: SessionUser,
  plan: PlanAccess,
  message: { kind: repo.MessageKind; text: string; uploads: readonly Buffer[]; resolveOpenQuestions?: boolean },
): Promise<ThreadMessage> {
  const processed = await processPhotos(message.uploads);
  const files = await writePhotoFiles(deps.storage, processed);
  let messageId: number;
  try {
    messageId = await deps.db.transaction(async (trx) => {
      const conversation = await repo.ensureConversation(trx, plan.planId);
      if (message.resolveOpenQuestions) await repo.resolveOpenQuestions(trx, conversation.id, user.id);
      const id = await repo.insertMessage(trx, { conversationId: conversation.id, kind: message.kind, authorUserId: user.id, text: message.text });
      await insertPhotoRows(trx, id, files);
      return id;
    });
  } catch (err) {
    await deletePhotoFiles(deps.storage, files);
    throw err;
  }
  const side = sideOf(user);
  const [row, photos, company] = await Promise.all([
    repo.findMessage(deps.db, messageId, side),
    photosByMessage(deps.db, [messageId]),
    repo.companyName(deps.db, plan.companyId),
  ]);
  // The author has obviously seen their own message.
  return { ...toMessage(row!, side, company, photos.get(messageId) ?? []), unread: false };
}

export function askQuestion(deps: QuestionDeps, user: SessionUser, plan: PlanAccess, text: string, uploads: readonly Buffer[]) {
  return postMessage(deps, user, plan, { kind: "question", text, uploads });
}

export function answerQuestion(deps: QuestionDeps, user: SessionUser, plan: PlanAccess, text: string, resolve: boolean, uploads: readonly Buffer[]) {
  return postMessage(deps, user, plan, { kind: "answer", text, uploads, resolveOpenQuestions: resolve });
}
