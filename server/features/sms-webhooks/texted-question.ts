import { photoLimits } from "#shared/schemas/questions";
import type { Config } from "../../config.ts";
import type { Db } from "../../db.ts";
import { HttpError } from "../../http/errors.ts";
import type { PhotoStorage } from "../../storage/index.ts";
import { processPhoto, type ProcessedPhoto } from "../photos/image-pipeline.ts";
import { deletePhotoFiles, writePhotoFiles } from "../photos/photo-files.ts";
import { insertPhotoRows } from "../photos/repo.ts";
import { ensureConversation, insertMessage, isUniqueViolation } from "../questions/repo.ts";
import { ALL_MEDIA_TIMEOUT_MS, fetchMedia, type InboundMedia } from "./media.ts";
import { photoRefusalReasons } from "./replies.ts";
import type { Texter } from "./repo.ts";

export type InboundDeps = { db: Db; config: Config; storage: PhotoStorage };

type RefusalCode = keyof typeof photoRefusalReasons;

/** Each attachment on its own: one bad photo is refused, the others and the words are kept. */
async function photosOf(config: Config, media: readonly InboundMedia[]): Promise<{ photos: ProcessedPhoto[]; refused: RefusalCode[] }> {
  const photos: ProcessedPhoto[] = [];
  const refused: RefusalCode[] = [];
  const deadline = AbortSignal.timeout(ALL_MEDIA_TIMEOUT_MS);
  for (const [index, item] of media.entries()) {
    if (index >= photoLimits.maxCount) {
      refused.push("too_many");
      continue;
    }
    const fetched = await fetchMedia(config, item, deadline);
    if (!fetched.ok) {
      refused.push(fetched.reason);
      continue;
    }
    try {
      photos.push(await processPhoto(fetched.data));
    } catch (err) {
      // The pipeline's own checks decide, never the provider's declared content type.
      const code = err instanceof HttpError && err.code in photoRefusalReasons ? (err.code as RefusalCode) : "invalid_image";
      refused.push(code);
    }
  }
  return { photos, refused };
}

export type FiledText = { stored: boolean; photos: number; refused: string[] };

/**
 * Files a customer's text as a question on their plan's conversation, with the photos that pass
 * the same pipeline as portal uploads. A MessageSid already stored (the same webhook twice) is not
 * stored again; the unique index decides when two deliveries race.
 */
export async function fileTextedQuestion(
  deps: InboundDeps,
  texter: Texter,
  planId: number,
  text: { body: string; messageSid: string | null; media: readonly InboundMedia[] },
): Promise<FiledText> {
  const { photos, refused } = await photosOf(deps.config, text.media);
  const reasons = refused.map((code) => photoRefusalReasons[code]);
  const words = text.body.trim();
  if (!words && photos.length === 0) return { stored: false, photos: 0, refused: reasons };
  const files = await writePhotoFiles(deps.storage, photos);
  try {
    await deps.db.transaction(async (trx) => {
      const conversation = await ensureConversation(trx, planId);
      const id = await insertMessage(trx, { conversationId: conversation.id, kind: "question", authorUserId: texter.userId, text: words, source: "sms", externalId: text.messageSid });
      await insertPhotoRows(trx, id, files);
    });
  } catch (err) {
    await deletePhotoFiles(deps.storage, files);
    if (isUniqueViolation(err)) return { stored: false, photos: 0, refused: [] };
    throw err;
  }
  return { stored: true, photos: photos.length, refused: reasons };
}
