import multer, { MulterError } from "multer";
import type { NextFunction, Request, Response } from "express";
import { IMPORT_FILE_FIELD, importLimits } from "#shared/schemas/visit-import";
import type { Role } from "#shared/schemas/auth";
import { HttpError } from "../../http/errors.ts";
import { checkAccess } from "../../http/route.ts";
import type { SessionUser } from "../../auth/session-user.ts";

/** Refuses callers before the upload is read, so nobody else can make the server buffer their file. */
export function accessBeforeUpload(access: readonly Role[]) {
  return (req: Request, _res: Response, next: NextFunction) => {
    checkAccess(access, req.user as SessionUser | undefined);
    next();
  };
}

function uploadError(err: unknown): HttpError {
  if (err instanceof MulterError) {
    if (err.code === "LIMIT_FILE_SIZE") return new HttpError(413, "file_too_large", `The file must be smaller than ${importLimits.maxBytes / (1024 * 1024)} MB. Split it into several files.`);
    if (err.code === "LIMIT_UNEXPECTED_FILE" || err.code === "LIMIT_FILE_COUNT") {
      return new HttpError(400, "unexpected_field", `Send one CSV file in the "${IMPORT_FILE_FIELD}" field.`);
    }
    return new HttpError(400, "invalid_upload", "The upload has too many or too large form fields.");
  }
  return new HttpError(400, "invalid_upload", "The upload could not be read. Please try again.");
}

/** One CSV file in memory (at most importLimits.maxBytes), from a multipart form. */
export function csvUpload() {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: importLimits.maxBytes, files: 1, fields: 4, fieldSize: 1024, parts: 5 },
  }).single(IMPORT_FILE_FIELD);
  return (req: Request, res: Response, next: NextFunction) => {
    parse(req, res, (err?: unknown) => next(err ? uploadError(err) : undefined));
  };
}

export function uploadedCsv(req: Request): { bytes: Buffer } {
  const file = req.file;
  if (!file) throw new HttpError(400, "file_required", `Attach the CSV file in the "${IMPORT_FILE_FIELD}" field of a multipart form.`, { [IMPORT_FILE_FIELD]: "Attach a CSV file" });
  return { bytes: file.buffer };
}
