import { randomUUID } from "node:crypto";
import type { PhotoStorage } from "../../storage/index.ts";
import type { ProcessedPhoto } from "./image-pipeline.ts";

export type StoredPhotoFiles = { largeKey: string; thumbKey: string; photo: ProcessedPhoto };

/** Random keys only: nothing the client sent (file name, type) reaches the storage path. */
function newKeys(): { largeKey: string; thumbKey: string } {
  const id = randomUUID();
  const folder = `${id.slice(0, 2)}/${id}`;
  return { largeKey: `${folder}/large.jpg`, thumbKey: `${folder}/thumb.jpg` };
}

export async function deletePhotoFiles(storage: PhotoStorage, files: readonly StoredPhotoFiles[]): Promise<void> {
  await Promise.allSettled(files.flatMap((f) => [storage.delete(f.largeKey), storage.delete(f.thumbKey)]));
}

/**
 * Writes both copies of every photo. If any write fails, the ones already written are
 * removed before the error goes on, so a failed upload leaves nothing behind.
 */
export async function writePhotoFiles(storage: PhotoStorage, photos: readonly ProcessedPhoto[]): Promise<StoredPhotoFiles[]> {
  const written: StoredPhotoFiles[] = [];
  try {
    for (const photo of photos) {
      const keys = newKeys();
      const entry = { ...keys, photo };
      written.push(entry);
      await storage.put(keys.largeKey, photo.large.data, "image/jpeg");
      await storage.put(keys.thumbKey, photo.thumb.data, "image/jpeg");
    }
    return written;
  } catch (err) {
    await deletePhotoFiles(storage, written);
    throw err;
  }
}
