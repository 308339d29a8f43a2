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
