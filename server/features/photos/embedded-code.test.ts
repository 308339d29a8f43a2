import { describe, expect, it } from "vitest";
import sharp from "sharp";
import { codeMarkers, findEmbeddedCode, readsAsScript, scanWindow } from "./embedded-code.ts";
import {
  gifScriptPolyglot, jpegScriptPolyglot, jpegWithGps, jpegWithXmp, pixelMotionPhoto, pseudoRandomBytes, samsungMotionPhoto,
  smallJpeg, smallPng, smallWebp, withAppended, withJpegComment, withPngText,
} from "./testing/images.ts";

const markerOf = (bytes: Buffer) => findEmbeddedCode(bytes)?.marker;
const scriptFile = "the whole file reads as JavaScript";

describe("finding markup or script in an uploaded photo", () => {
  it("finds it in real images that carry it (each still decodes as an image)", async () => {
    const jpeg = await smallJpeg();
    const cases: [string, Buffer, string][] = [
      ["<script> in a JPEG comment", withJpegComment(jpeg, "<script>alert(document.cookie)</script>"), "<script"],
      ["mixed-case <ScRiPt src> in a JPEG comment", withJpegComment(jpeg, '<ScRiPt src="//evil.example/x.js">'), "<script"],
      ["<script> after the end-of-image marker", withAppended(jpeg, "<script>alert(1)</script>"), "<script"],
      ["<?php after the end-of-image marker", withAppended(jpeg, '<?php system($_GET["c"]); ?>'), "<?php"],
      ["<?PHP on its own line", withAppended(jpeg, "\n<?PHP\necho 1;"), "<?php"],
      ["<iframe> in a PNG text chunk", withPngText(await smallPng(), "Comment", '<iframe src="https://evil.example/">'), "<iframe"],
      ["<svg> after a WebP", withAppended(await smallWebp(), '<svg xmlns="http://www.w3.org/2000/svg"><rect/></svg>'), "<svg"],
      ["a web page after a JPEG", withAppended(jpeg, "<html>\n<head><title>x</title></head></html>"), "<html"],
      ["<body> with text", withAppended(jpeg, "<body>\n  <p>hello there</p>"), "<body"],
      ["<object>", withJpegComment(jpeg, '<object data="x.swf"></object>'), "<object"],
      ["<embed>", withJpegComment(jpeg, '<embed src="x.swf">'), "<embed"],
      ["an onerror handler", withJpegComment(jpeg, "<img src=x onerror=alert(1)>"), "on…= event handler"],
      ["an onload handler after a quote", withJpegComment(jpeg, '<img/src="y"onLoad ="alert(1)">'), "on…= event handler"],
      ["a javascript: link", withJpegComment(jpeg, '<a href="JavaScript:alert(1)">lawn</a>'), "javascript:"],
      ["a JPEG that is also JavaScript", await jpegScriptPolyglot(), scriptFile],
      ["a GIF that is also JavaScript", await gifScriptPolyglot(), scriptFile],
    ];
    for (const [name, bytes, marker] of cases) {
      expect(markerOf(bytes), name).toBe(marker);
      // A real image, which sharp would happily re-encode: that is what makes it a polyglot.
      expect((await sharp(bytes).metadata()).format, name).toMatch(/^(jpeg|png|webp|gif)$/);
    }
  });

  it("says where the marker starts", async () => {
    const jpeg = await smallJpeg();
    expect(findEmbeddedCode(withAppended(jpeg, "<?php echo 1;"))).toEqual({ marker: "<?php", offset: jpeg.length });
  });

  it("reads a large file in windows without missing a marker across a window's edge, or misreading one", () => {
    const edge = scanWindow.bytes;
    const size = 4 * scanWindow.bytes;
    // Wherever the script lands around the first window's end, it is found at its true offset.
    for (const at of [edge - 2100, edge - scanWindow.overlapBytes, edge - 4, edge - 1, edge, edge + 3]) {
      const bytes = pseudoRandomBytes(size, 7).fill(0x20, at - 8, at);
      bytes.write("<script>", at, "latin1");
      expect(findEmbeddedCode(bytes), `at ${at}`).toEqual({ marker: "<script", offset: at });
    }
    // A handler whose "=" comes after 1,000 spaces, across the edge.
    const spaced = pseudoRandomBytes(size, 8);
    spaced.write(`<img onerror${" ".repeat(1000)}=alert(1)>`, edge - 1500, "latin1");
    expect(findEmbeddedCode(spaced)?.marker).toBe("on…= event handler");
    // Part of a longer name just before the next window starts is still no handler.
    const step = scanWindow.bytes - scanWindow.overlapBytes;
    const named = pseudoRandomBytes(size, 9);
    named.write("xmp:onload=1", step - 4, "latin1");
    expect(findEmbeddedCode(named)).toBeUndefined();
  });

  it("accepts what real photos carry: XMP packets, EXIF, motion-photo video after the end marker", async () => {
    const photos: [string, Buffer][] = [
      ["plain JPEG", await smallJpeg()],
      ["PNG", await smallPng()],
      ["WebP", await smallWebp()],
      ["JPEG with EXIF and GPS", await jpegWithGps(600, 400)],
      ["JPEG with an XMP packet", await jpegWithXmp()],
      ["Pixel motion photo (XMP + MP4 after the end marker)", await pixelMotionPhoto()],
      ["Samsung motion photo (MotionPhoto_Data + MP4)", await samsungMotionPhoto()],
      ["plain words in a JPEG comment", withJpegComment(await smallJpeg(), "Lawn, 3 weeks after overseeding. html body script svg onload")],
      ["harmless tags in a comment", withJpegComment(await smallJpeg(), "a <b>bold</b> <i>caption</i> with <br> and <p>")],
      ["an XMP attribute named onload", withJpegComment(await smallJpeg(), '<rdf:Description xmp:onload="1" data-onerror="2"/>')],
    ];
    for (const [name, bytes] of photos) {
      expect(findEmbeddedCode(bytes), name).toBeUndefined();
    }
    const xmp = await jpegWithXmp();
    for (const piece of ["<?xpacket", "<x:xmpmeta", "<rdf:RDF"]) expect(xmp.includes(piece), piece).toBe(true);
  });

  it("is not fooled by compressed data: 16 MB of random bytes and a large noisy photo hold no marker", async () => {
    expect(findEmbeddedCode(pseudoRandomBytes(16 * 1024 * 1024))).toBeUndefined();
    const noisy = await sharp({ create: { width: 3000, height: 2000, channels: 3, background: "#777", noise: { type: "gaussian", mean: 128, sigma: 60 } } })
      .jpeg({ quality: 95 })
      .toBuffer();
    expect(noisy.length).toBeGreaterThan(3 * 1024 * 1024);
    expect(findEmbeddedCode(noisy)).toBeUndefined();
  });

  it("short tags count only when text follows, as markup does", async () => {
    const jpeg = await smallJpeg();
    expect(markerOf(Buffer.concat([jpeg, Buffer.from("<svg>"), pseudoRandomBytes(16, 7)]))).toBeUndefined();
    expect(markerOf(withAppended(jpeg, '<svg width="10">'))).toBe("<svg");
    expect(markerOf(withAppended(jpeg, "<svgfoo bar baz qux"))).toBeUndefined();
  });

  it("every marker is written without capturing groups (the group number names the marker)", () => {
    for (const { pattern } of codeMarkers) expect(new RegExp(`${pattern}|`).exec("")!.length, pattern).toBe(1);
  });
});

describe("reading the file as JavaScript", () => {
  const js = (text: string) => readsAsScript(Buffer.from(text, "latin1"));

  it("sees the polyglot shapes: a name, comments hiding binary, then code", () => {
    expect(js("GIF89a/*\x00\x01\x02*/=alert(1)//")).toBe(true);
    expect(js("\xff\xd8\xff\xe0/*\x00\x10JFIF*/=alert(1);/*\x00\x01*/")).toBe(true);
    expect(js("\xff\xd8\xff\xe0//\x00\x01\n=alert(1)")).toBe(true);
    expect(js("RIFF<!--\x00\x00\n;x='\x01\x02';y=`\x00\n`")).toBe(true);
  });

  it("does not see it in ordinary images or broken scripts", async () => {
    for (const image of [await smallJpeg(), await smallPng(), await smallWebp(), await jpegWithXmp()]) expect(readsAsScript(image)).toBe(false);
    expect(js("GIF89a/*\x00 never closed")).toBe(false);
    expect(js("GIF89a\x00")).toBe(false);
    expect(js("x='\x01\n'")).toBe(false);
    expect(js("")).toBe(false);
  });
});
