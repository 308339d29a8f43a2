import { mkdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import { randomBytes } from "node:crypto";
import { dirname, join, resolve, sep } from "node:path";
import { assertValidKey, type PhotoStorage } from "./photo-storage.ts";

/**
 * Photos on local disk under `root` (outside any folder the web server serves statically;
 * photos are only ever sent through the access-checked photo route).
 */
export function createLocalDiskStorage(root: string): PhotoStorage {
  const base = resolve(root);

  function pathFor(key: string): string {
    assertValidKey(key);
    const full = resolve(base, key);
    // Belt and braces: the key pattern already excludes "..", but never leave the root.
    if (!full.startsWith(base + sep)) throw new Error(`storage key escapes the photo folder: ${key}`);
    return full;
  }

  return {
    async put(key, data) {
      const target = pathFor(key);
      await mkdir(dirname(target), { recursive: true });
      // Write then rename, so a reader (another server process) never sees half a file.
      const temp = join(dirname(target), `.tmp-${randomBytes(8).toString("hex")}`);
      await writeFile(temp, data, { flag: "wx" });
      await rename(temp, target);
    },
    async get(key) {
      try {
        return await readFile(pathFor(key));
      } catch (err) {
        if ((err as NodeJS.ErrnoException).code === "ENOENT") return undefined;
        throw err;
      }
    },
    async delete(key) {
      await rm(pathFor(key), { force: true });
    },
  };
}
