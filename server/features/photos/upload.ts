import multer, { MulterError } from "multer";
import type { NextFunction, Request, Response } from "express";
import { photoLimits } from "#shared/schemas/questions";
import { HttpError } from "../../http/errors.ts";

/** The multipart field that carries photos. */
export const PHOTO_FIELD = "photos";

function tooManyFiles(maxCount: number) {
  return new HttpError(400, "too_many_files", `Attach at most ${maxCount} photo${maxCount === 1 ? "" : "s"}.`);
}

/** Multer's own errors become the API's JSON errors; anything else from parsing is a bad request. */
export function uploadError(err: unknown, maxCount: number): HttpError {
  if (err instanceof HttpError) return err;
  if (err instanceof MulterError) {
    switch (err.code) {
      case "LIMIT_FILE_SIZE":
        return new HttpError(413, "file_too_large", `Each photo must be smaller than ${photoLimits.maxBytes / (1024 * 1024)} MB.`);
      case "LIMIT_FILE_COUNT":
        return tooManyFiles(maxCount);
      case "LIMIT_UNEXPECTED_FILE":
        // array(field, max) reports one file too many on the right field this way too.
        return err.field === PHOTO_FIELD
          ? tooManyFiles(maxCount)
          : new HttpError(400, "unexpected_field", `Attach photos in the "${PHOTO_FIELD}" field.`);
      default:
        return new HttpError(400, "invalid_upload", "The upload has too many or too large form fields.");
    }
  }
  // busboy: malformed multipart body, or the client went away mid-upload.
  return new HttpError(400, "invalid_upload", "The upload could not be read. Please try again.");
}

/**
 * Parses multipart uploads into memory with hard limits, so no request can make the server
 * hold more than maxCount × maxBytes. Non-multipart requests pass through untouched.
 */
export function photoUpload(maxCount: number = photoLimits.maxCount) {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: photoLimits.maxBytes,
      files: maxCount,
      fields: 4,
      fieldSize: 16 * 1024,
      parts: maxCount + 4,
    },
  }).array(PHOTO_FIELD, maxCount);
  return (req: Request, res: Response, next: NextFunction) => {
    parse(req, res, (err?: unknown) => next(err ? uploadError(err, maxCount) : undefined));
  };
}

/** The uploaded files' bytes, in the order they were sent. */
export function uploadedBuffers(req: Request): Buffer[] {
  const files = req.files;
  return Array.isArray(files) ? files.map((f) => f.buffer) : [];
}
