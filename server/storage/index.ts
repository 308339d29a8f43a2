import { resolve } from "node:path";
import type { Config } from "../config.ts";
import { createLocalDiskStorage } from "./local-disk-storage.ts";
import type { PhotoStorage } from "./photo-storage.ts";

export type { PhotoStorage } from "./photo-storage.ts";

const repoRoot = resolve(import.meta.dirname, "../..");

/** The photo folder (PHOTO_DIR, relative to the repository; never under a served folder). */
export function photoDir(config: Config): string {
  return resolve(repoRoot, config.PHOTO_DIR);
}

/** Stateless: every process builds its own adapter over the same folder (or bucket). */
export function photoStorageFromConfig(config: Config): PhotoStorage {
  return createLocalDiskStorage(photoDir(config));
}
