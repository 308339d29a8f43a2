import { afterAll, beforeAll, describe, expect, it } from "vitest";
import request from "supertest";
import sharp from "sharp";
import { mkdtemp, readdir, rm } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { photoLimits } from "#shared/schemas/questions";
import { createTestContext, signInCustomer, signInStaff, type TestContext } from "../../test/harness.ts";
import { createPlanFixture } from "../questions/testing/plan-fixture.ts";
import {
  bytesOver, gifScriptPolyglot, jpegScriptPolyglot, jpegWithGps, jpegWithXmp, pixelMotionPhoto, pngDeclaring, samsungMotionPhoto, smallJpeg,
  smallPng, smallWebp, svgWithScript, truncatedJpeg, withAppended, withJpegComment, withPngText,
} from "./testing/images.ts";

type Agent = ReturnType<typeof request.agent>;
type Upload = { data: Buffer; filename: string; contentType?: string };

let ctx: TestContext;
let photoDir: string;
let ruth: Agent;
let tomasz: Agent;
let marco: Agent;
let planId: number;

async function filesUnder(dir: string): Promise<string[]> {
  const entries = await readdir(dir, { recursive: true, withFileTypes: true }).catch(() => []);
  return entries.filter((e) => e.isFile()).map((e) => resolve(e.parentPath, e.name));
}

function ask(agent: Agent, uploads: Upload[], text = "Is this normal?") {
  let req = agent.post(`/api/plans/${planId}/questions`).field("text", text);
  for (const u of uploads) req = req.attach("photos", u.data, { filename: u.filename, contentType: u.contentType ?? "image/jpeg" });
  return req;
}

async function messageCount() {
  const row = await ctx.db("messages").join("conversations", "conversations.id", "messages.conversation_id").where("conversations.plan_id", planId).count<{ count: string }[]>("* as count");
  return Number(row[0]!.count);
}

async function photoRowCount() {
  const row = await ctx.db("photos").count<{ count: string }[]>("* as count");
  return Number(row[0]!.count);
}

/** After every refused upload: nothing stored, and the server still answers the next request. */
async function expectNothingSavedAndServing(before: { messages: number; files: number; photoRows: number }) {
  expect(await messageCount()).toBe(before.messages);
  expect((await filesUnder(photoDir)).length).toBe(before.files);
  expect(await photoRowCount()).toBe(before.photoRows);
  await ruth.get(`/api/plans/${planId}/thread`).expect(200);
}

async function snapshot() {
  return { messages: await messageCount(), files: (await filesUnder(photoDir)).length, photoRows: await photoRowCount() };
}

beforeAll(async () => {
  photoDir = await mkdtemp(join(tmpdir(), "sproutline-photos-"));
  ctx = await createTestContext({ PHOTO_DIR: photoDir });
  ({ planId } = await createPlanFixture(ctx.db, { customerRef: "C-1001" }));
  ruth = await signInCustomer(ctx, "ruth.okonkwo@mail.example");
  tomasz = await signInCustomer(ctx, "tomasz.brandt@mail.example");
  marco = await signInStaff(ctx, "marco@cobblefield.example");
});

afterAll(async () => {
  await ctx.close();
  await rm(photoDir, { recursive: true, force: true });
});

describe("asking with photos", () => {
  it("stores upright, metadata-free JPEG copies and links them from the message", async () => {
    const res = await ask(ruth, [
      { data: await jpegWithGps(3000, 2000), filename: "IMG_0001.JPG" },
      { data: await smallPng(), filename: "lawn.png", contentType: "image/png" },
      { data: await smallWebp(), filename: "lawn.webp", contentType: "image/webp" },
    ]).expect(201);
    const message = res.body.message;
    expect(message).toMatchObject({ kind: "question", authorRole: "customer", authorName: "Ruth Okonkwo", text: "Is this normal?", unread: false });
    expect(message.photos).toHaveLength(3);
    // Orientation 6 applied: a 3000×2000 landscape capture is a portrait photo, longest side 2048.
    expect(message.photos[0]).toMatchObject({ width: 1365, height: 2048, url: `/api/photos/${message.photos[0].id}/large` });

    const large = await ruth.get(message.photos[0].url).buffer(true).expect(200);
    expect(large.headers["content-type"]).toBe("image/jpeg");
    expect(large.headers["cache-control"]).toBe("private, no-cache");
    await ruth.get(message.photos[0].url).set("If-None-Match", large.headers.etag!).expect(304);
    expect(large.headers["x-content-type-options"]).toBe("nosniff");
    const meta = await sharp(large.body as Buffer).metadata();
    expect(meta).toMatchObject({ format: "jpeg", width: 1365, height: 2048 });
    expect(meta.exif).toBeUndefined();
    expect(meta.xmp).toBeUndefined();
    expect(meta.iptc).toBeUndefined();

    const thumb = await ruth.get(message.photos[0].thumbUrl).buffer(true).expect(200);
    const thumbMeta = await sharp(thumb.body as Buffer).metadata();
    expect(Math.max(thumbMeta.width!, thumbMeta.height!)).toBe(400);
    expect(thumbMeta.exif).toBeUndefined();
  });

  it("the test photo really did carry GPS before upload", async () => {
    const exif = (await sharp(await jpegWithGps(100, 80)).metadata()).exif!;
    // GPS IFD pointer tag 0x8825, little-endian as libvips writes it.
    expect(exif.includes(Buffer.from([0x25, 0x88]))).toBe(true);
  });

  it("stored files never carry the GPS position, whatever the size", async () => {
    for (const file of await filesUnder(photoDir)) {
      const meta = await sharp(file).metadata();
      expect(meta.exif, file).toBeUndefined();
    }
  });

  it("accepts a question without photos as JSON", async () => {
    const res = await ruth.post(`/api/plans/${planId}/questions`).send({ text: "Can I mow yet?" }).expect(201);
    expect(res.body.message.photos).toEqual([]);
  });

  it("uses random storage keys, never the uploaded file name", async () => {
    const before = await filesUnder(photoDir);
    const res = await ask(ruth, [{ data: await smallWebp(), filename: "../../../../../tmp/evil.jpg" }]).expect(201);
    const added = (await filesUnder(photoDir)).filter((f) => !before.includes(f));
    expect(added).toHaveLength(2);
    for (const file of added) {
      expect(file.startsWith(photoDir + "/")).toBe(true);
      expect(file.slice(photoDir.length)).toMatch(/^\/[0-9a-f]{2}\/[0-9a-f-]{36}\/(large|thumb)\.jpg$/);
      expect(file).not.toContain("evil");
    }
    const keys = await ctx.db("photos").where({ id: res.body.message.photos[0].id }).first("large_key", "thumb_key");
    expect(`${keys.large_key} ${keys.thumb_key}`).not.toContain("evil");
  });
});

describe("refused uploads leave nothing behind and the server keeps serving", () => {
  it("a text file named .jpg → 415", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: Buffer.from("just some text, not a photo\n".repeat(20)), filename: "photo.jpg" }]).expect(415);
    expect(res.body.error).toMatchObject({ code: "unsupported_type", message: "Only photos (JPEG, PNG, WebP, HEIC) can be attached." });
    await expectNothingSavedAndServing(before);
  });

  it("an SVG with a script → 415", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: svgWithScript, filename: "lawn.svg", contentType: "image/svg+xml" }]).expect(415);
    expect(res.body.error.code).toBe("unsupported_type");
    await expectNothingSavedAndServing(before);
  });

  it("one good and one bad photo → nothing from the batch is kept", async () => {
    const before = await snapshot();
    await ask(ruth, [
      { data: await smallWebp(), filename: "good.webp" },
      { data: Buffer.from("%PDF-1.7\n%fake"), filename: "bad.jpg" },
    ]).expect(415);
    await expectNothingSavedAndServing(before);
  });

  it("a file over the size limit → 413 file_too_large", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: bytesOver(photoLimits.maxBytes), filename: "huge.jpg" }]).expect(413);
    expect(res.body.error.code).toBe("file_too_large");
    await expectNothingSavedAndServing(before);
  });

  it("an image declaring more pixels than allowed → 413 before decoding", async () => {
    const before = await snapshot();
    const bomb = pngDeclaring(20_000, 20_000);
    expect(bomb.length).toBeLessThan(200);
    const res = await ask(ruth, [{ data: bomb, filename: "bomb.png", contentType: "image/png" }]).expect(413);
    expect(res.body.error.code).toBe("image_too_large");
    await expectNothingSavedAndServing(before);
  });

  it("seven photos → 400 too_many_files", async () => {
    const before = await snapshot();
    const webp = await smallWebp();
    const res = await ask(ruth, Array.from({ length: 7 }, (_, i) => ({ data: webp, filename: `p${i}.webp` }))).expect(400);
    expect(res.body.error.code).toBe("too_many_files");
    await expectNothingSavedAndServing(before);
  });

  it("a file in another field → 400", async () => {
    const before = await snapshot();
    const res = await ruth.post(`/api/plans/${planId}/questions`).field("text", "hi").attach("avatar", await smallWebp(), "a.webp").expect(400);
    expect(res.body.error.code).toBe("unexpected_field");
    await expectNothingSavedAndServing(before);
  });

  it("a truncated JPEG → 400 invalid_image", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: await truncatedJpeg(), filename: "cut.jpg" }]).expect(400);
    expect(res.body.error.code).toBe("invalid_image");
    await expectNothingSavedAndServing(before);
  });

  it("a missing question text → 400 with a field error", async () => {
    const before = await snapshot();
    const res = await ruth.post(`/api/plans/${planId}/questions`).attach("photos", await smallWebp(), "a.webp").expect(400);
    expect(res.body.error.fields).toHaveProperty("text");
    await expectNothingSavedAndServing(before);
  });

  it("another customer's plan → 404 before the upload is read", async () => {
    const before = await snapshot();
    await ask(tomasz, [{ data: await smallWebp(), filename: "a.webp" }]).expect(404);
    await expectNothingSavedAndServing(before);
  });

  it("no unexpected server errors were logged", () => {
    expect(ctx.errors).toEqual([]);
  });
});

describe("polyglots: a photo that also carries script or markup is refused, nothing is kept, the server keeps serving", () => {
  const carriesCode = {
    code: "image_contains_code",
    message: "This file carries more than a photo (it contains script or web-page code), so it can't be uploaded. Please send the photo straight from your camera or gallery.",
  };

  async function expectRefusedAsPolyglot(upload: Upload) {
    const before = await snapshot();
    const res = await ask(ruth, [upload]).expect(415);
    expect(res.headers["content-type"]).toMatch(/^application\/json/);
    // Every error answer also names its request, for the logs.
    expect(res.body).toEqual({ error: { ...carriesCode, requestId: res.headers["x-request-id"] } });
    await expectNothingSavedAndServing(before);
  }

  it("a JPEG with <script> in a comment segment → 415 image_contains_code", async () => {
    await expectRefusedAsPolyglot({ data: withJpegComment(await smallJpeg(), "<script>alert(document.cookie)</script>"), filename: "lawn.jpg" });
  });

  it("a JPEG with <script> after the end-of-image marker → 415", async () => {
    await expectRefusedAsPolyglot({ data: withAppended(await smallJpeg(), "<script>alert(1)</script>"), filename: "lawn.jpg" });
  });

  it("a JPEG with <?php … ?> appended → 415", async () => {
    await expectRefusedAsPolyglot({ data: withAppended(await smallJpeg(), '<?php system($_GET["c"]); ?>'), filename: "lawn.jpg" });
  });

  it("a PNG with an <iframe> in a text chunk → 415", async () => {
    await expectRefusedAsPolyglot({ data: withPngText(await smallPng(), "Comment", '<iframe src="https://evil.example/">'), filename: "lawn.png", contentType: "image/png" });
  });

  it("a JPEG whose bytes are also JavaScript (ÿØÿþ/*…*/=alert(1)) → 415", async () => {
    await expectRefusedAsPolyglot({ data: await jpegScriptPolyglot(), filename: "lawn.jpg" });
  });

  it("a GIF whose bytes are also JavaScript (GIF89a/*…*/=alert(1)//) → 415, refused already as a GIF", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: await gifScriptPolyglot(), filename: "lawn.jpg" }]).expect(415);
    expect(res.body.error.code).toBe("unsupported_type");
    await expectNothingSavedAndServing(before);
  });

  it("a good photo and a polyglot together → nothing from the batch is kept, nor the question", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [
      { data: await smallJpeg(), filename: "good.jpg" },
      { data: await smallWebp(), filename: "good.webp", contentType: "image/webp" },
      { data: withAppended(await smallJpeg(), "<?php echo 1;"), filename: "bad.jpg" },
    ]).expect(415);
    expect(res.body.error.code).toBe("image_contains_code");
    await expectNothingSavedAndServing(before);
  });

  it("after the refusals, an ordinary photo is stored as usual", async () => {
    const before = await snapshot();
    const res = await ask(ruth, [{ data: await smallJpeg(), filename: "lawn.jpg" }], "And this one?").expect(201);
    expect(res.body.message.photos).toHaveLength(1);
    expect(await photoRowCount()).toBe(before.photoRows + 1);
    expect((await filesUnder(photoDir)).length).toBe(before.files + 2);
  });

  it("a JPEG with an XMP packet, and motion photos with video after the end marker, are accepted", async () => {
    const res = await ask(ruth, [
      { data: await jpegWithXmp(), filename: "PXL_0001.jpg" },
      { data: await pixelMotionPhoto(), filename: "PXL_0002.MP.jpg" },
      { data: await samsungMotionPhoto(), filename: "20260412_101500.jpg" },
    ]).expect(201);
    expect(res.body.message.photos).toHaveLength(3);
    for (const photo of res.body.message.photos) {
      const large = await ruth.get(photo.url).buffer(true).expect(200);
      const body = large.body as Buffer;
      expect((await sharp(body).metadata()).xmp).toBeUndefined();
      expect(body.includes("ftypmp42")).toBe(false);
    }
  });

  it("no unexpected server errors were logged", () => {
    expect(ctx.errors).toEqual([]);
  });
});

describe("who may see a photo", () => {
  let photoUrl: string;
  beforeAll(async () => {
    const res = await ask(ruth, [{ data: await smallPng(), filename: "x.png", contentType: "image/png" }]).expect(201);
    photoUrl = res.body.message.photos[0].url;
  });

  it("the owner and the company's staff", async () => {
    await ruth.get(photoUrl).expect(200);
    await marco.get(photoUrl).expect(200);
    await marco.get(photoUrl.replace("/large", "/thumb")).expect(200);
  });

  it("another customer gets 404; signed out gets 401", async () => {
    const res = await tomasz.get(photoUrl).expect(404);
    expect(res.body.error.code).toBe("not_found");
    await request(ctx.app).get(photoUrl).expect(401);
  });

  it("unknown photo ids and sizes are refused", async () => {
    await ruth.get("/api/photos/999999999/large").expect(404);
    await ruth.get(photoUrl.replace("/large", "/original")).expect(400);
  });
});
