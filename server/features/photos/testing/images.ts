import sharp from "sharp";

/** Test images, made in memory. */

/** A JPEG carrying camera make, GPS position and a "rotate 90°" orientation flag. */
export async function jpegWithGps(width = 3000, height = 2000): Promise<Buffer> {
  const withExif = await sharp({ create: { width, height, channels: 3, background: "#4a7a3a" } })
    .jpeg()
    .withExif({
      IFD0: { Make: "TestCam", Model: "Lawn 1" },
      // IFD3 is the GPS directory in libvips' naming.
      IFD3: { GPSLatitudeRef: "N", GPSLatitude: "41/1 8/1 30/1", GPSLongitudeRef: "W", GPSLongitude: "81/1 30/1 0/1" },
    })
    .toBuffer();
  // Orientation 6: the camera was turned; viewers rotate 90° clockwise.
  return sharp(withExif).withMetadata({ orientation: 6 }).jpeg().toBuffer();
}

export async function smallPng(): Promise<Buffer> {
  return sharp({ create: { width: 640, height: 480, channels: 4, background: { r: 20, g: 120, b: 40, alpha: 0.5 } } }).png().toBuffer();
}

export async function smallWebp(): Promise<Buffer> {
  return sharp({ create: { width: 500, height: 500, channels: 3, background: "#3a5" } }).webp().toBuffer();
}

/** The first half of a noisy JPEG: decodable header, missing image data. */
export async function truncatedJpeg(): Promise<Buffer> {
  const full = await sharp({ create: { width: 800, height: 600, channels: 3, background: "#000", noise: { type: "gaussian", mean: 128, sigma: 30 } } }).jpeg().toBuffer();
  return full.subarray(0, Math.floor(full.length / 2));
}

/** Exactly one byte over a limit, starting like a JPEG. */
export function bytesOver(limit: number): Buffer {
  const data = Buffer.alloc(limit + 1, 0x41);
  data.set([0xff, 0xd8, 0xff, 0xe0]);
  return data;
}

function crc32(data: Buffer): number {
  let crc = 0xffffffff;
  for (const byte of data) {
    crc ^= byte;
    for (let k = 0; k < 8; k += 1) crc = crc & 1 ? (crc >>> 1) ^ 0xedb88320 : crc >>> 1;
  }
  return (crc ^ 0xffffffff) >>> 0;
}

function pngChunk(type: string, body: Buffer): Buffer {
  const head = Buffer.alloc(4);
  head.writeUInt32BE(body.length);
  const typed = Buffer.concat([Buffer.from(type, "latin1"), body]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(typed));
  return Buffer.concat([head, typed, crc]);
}

/** A few hundred bytes declaring a huge image (a decompression bomb's header). */
export function pngDeclaring(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 2, 0, 0, 0], 8); // 8-bit RGB, deflate, no filter method tricks, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    pngChunk("IHDR", ihdr),
    pngChunk("IDAT", Buffer.from([0x78, 0x9c, 0x03, 0x00, 0x00, 0x00, 0x00, 0x01])),
    pngChunk("IEND", Buffer.alloc(0)),
  ]);
}

export const svgWithScript = Buffer.from(
  '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(document.cookie)</script><rect width="10" height="10"/></svg>',
);

/* Polyglots: real images that also carry markup or script, and real photos that must still pass. */

/** A small real JPEG made by sharp (noisy, so it has real compressed data). */
export async function smallJpeg(width = 320, height = 240): Promise<Buffer> {
  return sharp({ create: { width, height, channels: 3, background: "#4a7a3a", noise: { type: "gaussian", mean: 100, sigma: 20 } } }).jpeg().toBuffer();
}

/** `body` as a JPEG segment (marker 0xFFxx, two-byte length that counts itself) placed right after the start-of-image marker. */
export function withJpegSegment(jpeg: Buffer, marker: number, body: Buffer): Buffer {
  const head = Buffer.from([0xff, marker, 0, 0]);
  head.writeUInt16BE(body.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), head, body, jpeg.subarray(2)]);
}

/** A JPEG with `text` in a comment (COM) segment. */
export function withJpegComment(jpeg: Buffer, text: string): Buffer {
  return withJpegSegment(jpeg, 0xfe, Buffer.from(text, "latin1"));
}

/** `text` appended after the image's last byte (after a JPEG's end-of-image marker). */
export function withAppended(image: Buffer, text: string): Buffer {
  return Buffer.concat([image, Buffer.from(text, "latin1")]);
}

/** A PNG with a tEXt chunk (keyword, NUL, text) just before IEND. */
export function withPngText(png: Buffer, keyword: string, text: string): Buffer {
  const iend = png.length - 12;
  return Buffer.concat([png.subarray(0, iend), pngChunk("tEXt", Buffer.from(`${keyword}\0${text}`, "latin1")), png.subarray(iend)]);
}

function refuseCommentEnd(binary: Buffer): void {
  if (binary.includes("*/")) throw new Error("test image happens to contain */; pick other colours");
}

/**
 * A JPEG that a browser also runs as a script loaded as Latin-1: `ÿØÿþ` (the start-of-image and
 * comment markers) reads as a name, the comment's length bytes are `/*`, the comment ends the
 * JavaScript comment and assigns `alert(1)`, and the rest of the image sits in a second comment
 * closed after the end-of-image marker.
 */
export async function jpegScriptPolyglot(): Promise<Buffer> {
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#4a7a3a" } }).jpeg().toBuffer();
  refuseCommentEnd(jpeg);
  const payload = Buffer.from("*/=alert(1);/*", "latin1");
  const body = Buffer.concat([Buffer.alloc(0x2f2a - 2 - payload.length, 0x20), payload]); // length bytes 0x2f 0x2a = "/*"
  return withAppended(withJpegSegment(jpeg, 0xfe, body), "*/");
}

/** The classic GIF/JavaScript polyglot: `GIF89a/*<image>*\/=alert(1)//` (the screen width bytes are "/*"). */
export async function gifScriptPolyglot(): Promise<Buffer> {
  const gif = Buffer.from(await sharp({ create: { width: 16, height: 16, channels: 3, background: "#4a7a3a" } }).gif().toBuffer());
  gif.set([0x2f, 0x2a], 6);
  refuseCommentEnd(gif);
  return withAppended(gif, "*/=alert(1)//");
}

/** Bytes that look like compressed video: the same every run (xorshift), so no test flickers. */
export function pseudoRandomBytes(length: number, seed = 0x5eed1234): Buffer {
  const out = Buffer.alloc(length);
  let x = seed >>> 0;
  for (let i = 0; i < length; i += 1) {
    x ^= x << 13;
    x >>>= 0;
    x ^= x >>> 17;
    x ^= x << 5;
    x >>>= 0;
    out[i] = x & 0xff;
  }
  return out;
}

/** An XMP packet like a Pixel's motion photo carries (markup, but the photo's own). */
export const motionPhotoXmp = `<?xpacket begin="\ufeff" id="W5M0MpCehiHzreSzNTczkc9d"?>
<x:xmpmeta xmlns:x="adobe:ns:meta/" x:xmptk="Adobe XMP Core 5.1.0-jc003">
  <rdf:RDF xmlns:rdf="http://www.w3.org/1999/02/22-rdf-syntax-ns#">
    <rdf:Description rdf:about="" xmlns:GCamera="http://ns.google.com/photos/1.0/camera/" xmlns:Container="http://ns.google.com/photos/1.0/container/" xmlns:Item="http://ns.google.com/photos/1.0/container/item/" GCamera:MotionPhoto="1" GCamera:MotionPhotoVersion="1" GCamera:MotionPhotoPresentationTimestampUs="0">
      <Container:Directory>
        <rdf:Seq>
          <rdf:li rdf:parseType="Resource"><Container:Item Item:Mime="image/jpeg" Item:Semantic="Primary" Item:Length="0" Item:Padding="0"/></rdf:li>
          <rdf:li rdf:parseType="Resource"><Container:Item Item:Mime="video/mp4" Item:Semantic="MotionPhoto" Item:Length="262144" Item:Padding="0"/></rdf:li>
        </rdf:Seq>
      </Container:Directory>
    </rdf:Description>
  </rdf:RDF>
</x:xmpmeta>
<?xpacket end="w"?>`;

/** A JPEG with an XMP packet (APP1) written by sharp, as phones and editors save them. */
export async function jpegWithXmp(xmp = motionPhotoXmp): Promise<Buffer> {
  return sharp(await smallJpeg()).withXmp(xmp).jpeg().toBuffer();
}

/** Something that looks like an MP4 file: an ftyp box, then video-like bytes. */
function mp4Like(length: number): Buffer {
  const ftyp = Buffer.from("\0\0\0\x18ftypmp42\0\0\0\0isommp42", "latin1");
  return Buffer.concat([ftyp, pseudoRandomBytes(length - ftyp.length)]);
}

/** A Pixel-style motion photo: XMP directory, then the video appended after the end-of-image marker. */
export async function pixelMotionPhoto(): Promise<Buffer> {
  return Buffer.concat([await jpegWithXmp(), mp4Like(262_144)]);
}

/** A Samsung-style motion photo: the video after the end-of-image marker behind a "MotionPhoto_Data" tag. */
export async function samsungMotionPhoto(): Promise<Buffer> {
  return Buffer.concat([await smallJpeg(), Buffer.from("MotionPhoto_Data", "latin1"), mp4Like(262_144)]);
}
