import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { createLocalDiskStorage } from "./local-disk-storage.ts";
import type { PhotoStorage } from "./photo-storage.ts";

let root: string;
let storage: PhotoStorage;
beforeAll(async () => {
  root = await mkdtemp(join(tmpdir(), "sproutline-storage-"));
  storage = createLocalDiskStorage(join(root, "photos"));
});
afterAll(async () => rm(root, { recursive: true, force: true }));

describe("local disk photo storage", () => {
  it("puts, gets and deletes by key", async () => {
    await storage.put("ab/abcdef/large.jpg", Buffer.from("jpeg bytes"), "image/jpeg");
    expect((await storage.get("ab/abcdef/large.jpg"))?.toString()).toBe("jpeg bytes");
    await storage.delete("ab/abcdef/large.jpg");
    expect(await storage.get("ab/abcdef/large.jpg")).toBeUndefined();
    await storage.delete("ab/abcdef/large.jpg"); // twice is fine
  });

  it("leaves no temporary files behind", async () => {
    await storage.put("cd/x/thumb.jpg", Buffer.from("t"), "image/jpeg");
    const files = await readdir(join(root, "photos"), { recursive: true });
    expect(files.filter((f) => f.includes(".tmp-"))).toEqual([]);
  });

  it.each(["../outside.jpg", "a/../../outside.jpg", "/etc/passwd", "a//b.jpg", "A/B.jpg", "", "a/b\\..\\c", "a/.hidden"])(
    "refuses the key %j",
    async (key) => {
      await expect(storage.put(key, Buffer.from("x"), "image/jpeg")).rejects.toThrow(/invalid storage key/);
      await expect(storage.get(key)).rejects.toThrow(/invalid storage key/);
      await expect(storage.delete(key)).rejects.toThrow(/invalid storage key/);
    },
  );

  it("wrote nothing outside its folder", async () => {
    expect((await readdir(root)).sort()).toEqual(["photos"]);
  });
});
