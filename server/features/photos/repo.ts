import type { Knex } from "knex";
import type { PhotoRef } from "#shared/schemas/questions";
import type { Db } from "../../db.ts";
import type { SessionUser } from "../../auth/session-user.ts";
import type { StoredPhotoFiles } from "./photo-files.ts";

export type PhotoSize = "large" | "thumb";

export const photoUrl = (id: number, size: PhotoSize) => `/api/photos/${id}/${size}`;

type PhotoRow = { id: string | number; message_id: string | number; width: number; height: number };

const toRef = (r: PhotoRow): PhotoRef => ({
  id: Number(r.id),
  url: photoUrl(Number(r.id), "large"),
  thumbUrl: photoUrl(Number(r.id), "thumb"),
  width: r.width,
  height: r.height,
});

export async function insertPhotoRows(trx: Knex.Transaction, messageId: number, files: readonly StoredPhotoFiles[]): Promise<void> {
  if (files.length === 0) return;
  await trx("photos").insert(
    files.map((f, position) => ({
      message_id: messageId,
      position,
      large_key: f.largeKey,
      thumb_key: f.thumbKey,
      content_type: "image/jpeg",
      width: f.photo.large.width,
      height: f.photo.large.height,
      bytes: f.photo.large.data.length,
      thumb_bytes: f.photo.thumb.data.length,
      sha256: f.photo.sha256,
    })),
  );
}

/** Photo references of several messages at once (one query for a whole thread). */
export async function photosByMessage(db: Db, messageIds: readonly number[]): Promise<Map<number, PhotoRef[]>> {
  const byMessage = new Map<number, PhotoRef[]>();
  if (messageIds.length === 0) return byMessage;
  const rows = await db("photos")
    .whereIn("message_id", messageIds)
    .orderBy([{ column: "message_id" }, { column: "position" }])
    .select<PhotoRow[]>("id", "message_id", "width", "height");
  for (const row of rows) {
    const list = byMessage.get(Number(row.message_id)) ?? [];
    list.push(toRef(row));
    byMessage.set(Number(row.message_id), list);
  }
  return byMessage;
}

/**
 * The storage keys of a photo the signed-in person may see: staff of the company that owns
 * the lawn, or the customer who owns it (and never the photos of staff-only notes).
 */
export async function findPhotoKeysForUser(db: Db, user: SessionUser, photoId: number): Promise<{ largeKey: string; thumbKey: string } | undefined> {
  const row = await db("photos")
    .join("messages", "messages.id", "photos.message_id")
    .join("conversations", "conversations.id", "messages.conversation_id")
    .join("care_plans", "care_plans.id", "conversations.plan_id")
    .join("properties", "properties.id", "care_plans.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("photos.id", photoId)
    .andWhere("customers.company_id", user.companyId)
    .first<{ large_key: string; thumb_key: string; customer_id: number; kind: string } | undefined>(
      "photos.large_key", "photos.thumb_key", "customers.id as customer_id", "messages.kind",
    );
  if (!row) return undefined;
  if (user.role === "customer" && (row.customer_id !== user.customerId || row.kind === "note")) return undefined;
  return { largeKey: row.large_key, thumbKey: row.thumb_key };
}
