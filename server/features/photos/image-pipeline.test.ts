import { describe, expect, it } from "vitest";
import sharp from "sharp";
import { processPhoto } from "./image-pipeline.ts";
import { HttpError } from "../../http/errors.ts";
import { jpegScriptPolyglot, pixelMotionPhoto, samsungMotionPhoto, smallJpeg, withAppended, withJpegComment } from "./testing/images.ts";

/** An ISO-BMFF header with the "heic" brand and no decodable image: what an HEVC HEIC looks like to us. */
function heicHeader(): Buffer {
  const ftyp = Buffer.alloc(24);
  ftyp.writeUInt32BE(24, 0);
  ftyp.write("ftypheic", 4, "latin1");
  ftyp.writeUInt32BE(0, 12);
  ftyp.write("mif1heic", 16, "latin1");
  return Buffer.concat([ftyp, Buffer.alloc(64)]);
}

async function refusal(input: Buffer) {
  const err = await processPhoto(input).then(() => undefined, (e: unknown) => e);
  expect(err).toBeInstanceOf(HttpError);
  return err as HttpError;
}

describe("image pipeline", () => {
  it("keeps small photos small (no enlargement) and flattens transparency onto white", async () => {
    const png = await sharp({ create: { width: 300, height: 200, channels: 4, background: { r: 0, g: 0, b: 0, alpha: 0 } } }).png().toBuffer();
    const out = await processPhoto(png);
    expect(out.large).toMatchObject({ width: 300, height: 200 });
    expect(out.thumb).toMatchObject({ width: 300, height: 200 });
    const { data } = await sharp(out.large.data).raw().toBuffer({ resolveWithObject: true });
    expect(data[0]).toBeGreaterThan(240);
    expect(out.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it("refuses an HEIC it cannot decode with a helpful 415", async () => {
    const err = await refusal(heicHeader());
    expect(err.status).toBe(415);
    expect(err.message).toMatch(/HEIC/);
  });

  it("refuses a photo that also carries script or markup before decoding it (415 image_contains_code)", async () => {
    const jpeg = await smallJpeg();
    for (const polyglot of [withJpegComment(jpeg, "<script>alert(1)</script>"), withAppended(jpeg, "<?php echo 1; ?>"), await jpegScriptPolyglot()]) {
      const err = await refusal(polyglot);
      expect(err).toMatchObject({ status: 415, code: "image_contains_code" });
      expect(err.message).toMatch(/^This file carries more than a photo/);
    }
  });

  it("keeps a motion photo's still image and drops the video after the end marker", async () => {
    for (const photo of [await pixelMotionPhoto(), await samsungMotionPhoto()]) {
      const out = await processPhoto(photo);
      expect(out.large).toMatchObject({ width: 320, height: 240 });
      expect(out.large.data.includes("ftypmp42")).toBe(false);
      expect((await sharp(out.large.data).metadata()).xmp).toBeUndefined();
    }
  });

  it("refuses GIF, AVIF and TIFF by their bytes", async () => {
    const base = sharp({ create: { width: 20, height: 20, channels: 3, background: "#123" } });
    for (const data of [await base.clone().gif().toBuffer(), await base.clone().avif().toBuffer(), await base.clone().tiff().toBuffer()]) {
      expect((await refusal(data)).code).toBe("unsupported_type");
    }
  });
});
