import { randomUUID } from "node:crypto";
import sharp from "sharp";
import { fileTypeFromBuffer } from "file-type";
import { logoLimits } from "#shared/schemas/company";
import { photoLimits } from "#shared/schemas/questions";
import { HttpError } from "../../http/errors.ts";
import { findEmbeddedCode } from "../photos/embedded-code.ts";

const accepted = new Set(["image/png", "image/jpeg", "image/webp"]);

const unsupportedLogo = () => new HttpError(415, "unsupported_type", "The logo must be a PNG, JPEG or WebP image.");
const unreadableLogo = () => new HttpError(400, "invalid_image", "The logo could not be read. It may be damaged; please try another file.");
const logoCarriesCode = () =>
  new HttpError(415, "image_contains_code", "This file carries more than an image (script or web-page code), so it can't be used as the logo.");
const logoTooManyPixels = () => new HttpError(413, "image_too_large", "This image is too large. Please upload a smaller logo.");

/**
 * Checks an uploaded logo the way photos are checked (type from the bytes, no embedded code,
 * pixel count from the header before decoding) and re-encodes it to a PNG no larger than
 * logoLimits.maxSide, keeping transparency and dropping all metadata. The upload itself is never stored.
 */
export async function processLogo(upload: Buffer): Promise<Buffer> {
  const type = await fileTypeFromBuffer(upload);
  if (!type || !accepted.has(type.mime)) throw unsupportedLogo();
  if (findEmbeddedCode(upload)) throw logoCarriesCode();
  let width: number | undefined;
  let height: number | undefined;
  try {
    ({ width, height } = await sharp(upload, { failOn: "error", limitInputPixels: false }).metadata());
  } catch {
    throw unreadableLogo();
  }
  if (!width || !height) throw unreadableLogo();
  if (width * height > photoLimits.maxPixels) throw logoTooManyPixels();
  try {
    return await sharp(upload, { failOn: "error", limitInputPixels: photoLimits.maxPixels, autoOrient: true })
      .resize({ width: logoLimits.maxSide, height: logoLimits.maxSide, fit: "inside", withoutEnlargement: true })
      .png({ compressionLevel: 9 })
      .toBuffer();
  } catch {
    throw unreadableLogo();
  }
}

/** A fresh random key per upload: the public URL changes with the logo, and nothing the client sent is in it. */
export function newLogoKey(companyId: number): string {
  return `logos/${companyId}/${randomUUID()}.png`;
}
