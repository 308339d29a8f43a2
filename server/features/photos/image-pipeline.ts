import { createHash } from "node:crypto";
import sharp, { type SharpOptions } from "sharp";
import { fileTypeFromBuffer } from "file-type";
import { photoLimits } from "#shared/schemas/questions";
import { HttpError } from "../../http/errors.ts";
import { findEmbeddedCode } from "./embedded-code.ts";

/** Longest side of the two copies we keep. The upload itself is never stored. */
export const photoSizes = { large: 2048, thumb: 400 } as const;

export type ImageCopy = { data: Buffer; width: number; height: number };
export type ProcessedPhoto = { large: ImageCopy; thumb: ImageCopy; sha256: string };

const accepted: readonly string[] = photoLimits.acceptedTypes;

export const unsupportedType = () =>
  new HttpError(415, "unsupported_type", "Only photos (JPEG, PNG, WebP, HEIC) can be attached.");
// A polyglot: our own words, and no hint of which marker was found.
const carriesCode = () =>
  new HttpError(
    415,
    "image_contains_code",
    "This file carries more than a photo (it contains script or web-page code), so it can't be uploaded. Please send the photo straight from your camera or gallery.",
  );
const invalidImage = () =>
  new HttpError(400, "invalid_image", "One of the photos could not be read. It may be damaged or only partly uploaded; please try again.");
// Phones save HEIC with the HEVC codec, which our image library cannot decode (patent-encumbered).
const heicUnreadable = () =>
  new HttpError(415, "unsupported_type", "This HEIC photo could not be read. Please send it as a JPEG (on iPhone: Settings › Camera › Formats › Most Compatible).");
const tooManyPixels = () =>
  new HttpError(413, "image_too_large", `This photo has more than ${photoLimits.maxPixels / 1_000_000} megapixels. Please send a smaller photo.`);

/**
 * Decoder settings for untrusted input: stop on corrupt or truncated data rather than
 * storing a half-grey photo, and let libvips itself refuse oversized images as a second guard.
 */
const decodeOptions: SharpOptions = { failOn: "error", limitInputPixels: photoLimits.maxPixels, autoOrient: true };

async function resizeToJpeg(input: Buffer, longestSide: number, options: SharpOptions = {}): Promise<ImageCopy> {
  // No withMetadata()/keepExif(): sharp writes no EXIF, XMP or IPTC, so GPS and camera details go.
  const { data, info } = await sharp(input, options)
    .resize({ width: longestSide, height: longestSide, fit: "inside", withoutEnlargement: true })
    .flatten({ background: "#ffffff" })
    .jpeg({ quality: 82 })
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}

/**
 * Checks one uploaded file and makes the two copies we store. The type comes from the
 * bytes (never the name or the client's Content-Type); a photo that also carries markup or
 * script (a polyglot) is refused before it is decoded; the pixel count is checked from the
 * header before anything is decoded (decompression bombs); orientation is applied and all
 * metadata dropped by re-encoding.
 */
export async function processPhoto(upload: Buffer): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(upload);
  if (!type || !accepted.includes(type.mime)) throw unsupportedType();
  if (findEmbeddedCode(upload)) throw carriesCode();
  const isHeif = type.mime === "image/heic" || type.mime === "image/heif";

  let width: number | undefined;
  let height: number | undefined;
  try {
    ({ width, height } = await sharp(upload, { failOn: "error", limitInputPixels: false }).metadata());
  } catch {
    throw isHeif ? heicUnreadable() : invalidImage();
  }
  if (!width || !height) throw invalidImage();
  if (width * height > photoLimits.maxPixels) throw tooManyPixels();

  let large: ImageCopy;
  try {
    large = await resizeToJpeg(upload, photoSizes.large, decodeOptions);
  } catch {
    throw isHeif ? heicUnreadable() : invalidImage();
  }
  // The thumbnail is made from the large copy: already upright, small and trusted.
  const thumb = await resizeToJpeg(large.data, photoSizes.thumb);
  return { large, thumb, sha256: createHash("sha256").update(upload).digest("hex") };
}

/** All photos of one message, one at a time (bounded memory); any bad photo refuses the lot. */
export async function processPhotos(uploads: readonly Buffer[]): Promise<ProcessedPhoto[]> {
  const processed: ProcessedPhoto[] = [];
  for (const upload of uploads) processed.push(await processPhoto(upload));
  return processed;
}
