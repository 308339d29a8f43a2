import type { Knex } from "knex";
import type { Db } from "../../db.ts";

/** Which side of the thread a reader is on; each side has its own "last read" mark. */
export type Side = "customer" | "staff";
const lastReadColumn = (side: Side) => (side === "customer" ? "customer_last_read_at" : "staff_last_read_at");

export type MessageKind = "question" | "answer" | "check_in_request" | "note";

export type Conversation = { id: number; lastReadAt: Date | null };

export type MessageRow = {
  id: number;
  kind: MessageKind;
  text: string;
  createdAt: Date;
  authorRole: "customer" | "technician" | "manager" | null;
  authorName: string | null;
  /** Compared in SQL, at the database's full timestamp precision. */
  afterLastRead: boolean;
};

/** The plan's conversation, created on first use. Safe when two processes race to create it. */
export async function ensureConversation(db: Db | Knex.Transaction, planId: number, side: Side = "customer"): Promise<Conversation> {
  await db("conversations").insert({ plan_id: planId }).onConflict("plan_id").ignore();
  const row = await db("conversations")
    .where({ plan_id: planId })
    .first<{ id: number; last_read_at: Date | null }>("id", `${lastReadColumn(side)} as last_read_at`);
  return { id: row.id, lastReadAt: row.last_read_at };
}

function messageQuery(db: Db, side: Side) {
  return db("messages")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .leftJoin("users", "users.id", "messages.author_user_id")
    .select(
      "messages.id", "messages.kind", "messages.text", "messages.created_at",
      "users.role as author_role", "users.name as author_name",
      db.raw(`messages.created_at > coalesce(conversations.${lastReadColumn(side)}, '-infinity') as after_last_read`),
    );
}

type RawRow = { id: string; kind: MessageKind; text: string; created_at: Date; author_role: MessageRow["authorRole"]; author_name: string | null; after_last_read: boolean };

const toRow = (r: RawRow): MessageRow => ({
  id: Number(r.id),
  kind: r.kind,
  text: r.text,
  createdAt: r.created_at,
  authorRole: r.author_role,
  authorName: r.author_name,
  afterLastRead: r.after_last_read,
});

/** A thread's messages, oldest first; customers never get staff-only notes. */
export async function listMessages(db: Db, conversationId: number, side: Side): Promise<MessageRow[]> {
  const query = messageQuery(db, side).where("messages.conversation_id", conversationId);
  if (side === "customer") query.whereNot("messages.kind", "note");
  const rows: RawRow[] = await query.orderBy([{ column: "messages.created_at" }, { column: "messages.id" }]);
  return rows.map(toRow);
}

export async function findMessage(db: Db, messageId: number, side: Side): Promise<MessageRow | undefined> {
  const row: RawRow | undefined = await messageQuery(db, side).where("messages.id", messageId).first();
  return row ? toRow(row) : undefined;
}

export type NewMessage = {
  conversationId: number;
  kind: MessageKind;
  authorUserId: number | null;
  text: string;
  /** How it reached us (default portal), and the provider's id of an inbound text or e-mail. */
  source?: "portal" | "sms" | "email";
  externalId?: string | null;
  followUpId?: number;
};

/** Adds a message. The same provider id from the same source twice breaks a unique index (PostgreSQL 23505). */
export async function insertMessage(trx: Knex.Transaction, message: NewMessage): Promise<number> {
  const [row] = await trx("messages")
    .insert({
      conversation_id: message.conversationId,
      kind: message.kind,
      author_user_id: message.authorUserId,
      text: message.text,
      source: message.source ?? "portal",
      external_id: message.externalId ?? null,
      follow_up_id: message.followUpId ?? null,
    })
    .returning<{ id: string }[]>("id");
  return Number(row!.id);
}

export const isUniqueViolation = (err: unknown) => (err as { code?: unknown } | null)?.code === "23505";

/** Marks the thread's open questions answered; only those asked before this moment. */
export async function resolveOpenQuestions(trx: Knex.Transaction, conversationId: number, userId: number): Promise<number> {
  return trx("messages")
    .where({ conversation_id: conversationId, kind: "question" })
    .whereNull("resolved_at")
    .update({ resolved_at: trx.fn.now(), resolved_by: userId });
}

/**
 * Moves the reader's "last read" mark up to the newest message they were shown, never
 * back: another process may have moved it further meanwhile, and a message that arrived
 * after the thread was read stays unread. The newest stored time is taken in SQL, at full
 * precision, from the ids that were shown.
 */
export async function markRead(db: Db, conversationId: number, side: Side, shownIds: readonly number[], shownUpTo: Date | null): Promise<void> {
  if (shownIds.length === 0 && !shownUpTo) return;
  const column = lastReadColumn(side);
  await db("conversations")
    .where({ id: conversationId })
    .update({
      [column]: db.raw(
        `greatest(coalesce(??, '-infinity'), coalesce((select max(created_at) from messages where id = any(?::bigint[])), '-infinity'), coalesce(?::timestamptz, '-infinity'))`,
        [column, shownIds as number[], shownUpTo ? shownUpTo.toISOString() : null],
      ),
    });
}

export async function companyName(db: Db, companyId: number): Promise<string> {
  const row = await db("companies").where({ id: companyId }).first<{ name: string }>("name");
  return row?.name ?? "Your lawn-care company";
}
