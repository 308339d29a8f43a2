import { parsePhoneNumberFromString } from "libphonenumber-js";
import type { PublicCompany } from "#shared/schemas/company";
import type { Db } from "../../db.ts";
import { HttpError } from "../../http/errors.ts";
import type { PhotoStorage } from "../../storage/index.ts";
import { newLogoKey, processLogo } from "./logo.ts";
import * as repo from "./repo.ts";

/**
 * Where a company's logo is served from (relative to the app's PUBLIC_URL; e-mails prefix it).
 * The upload time rides along, so a cached old logo is never shown after a new upload.
 */
export function companyLogoPath(company: { id: number; logo_key: string | null; logo_updated_at: Date | null }): string | null {
  if (!company.logo_key) return null;
  const version = company.logo_updated_at ? company.logo_updated_at.getTime() : 0;
  return `/api/companies/${company.id}/logo?v=${version}`;
}

export function toPublicCompany(row: repo.CompanyRow): PublicCompany {
  return { id: row.id, name: row.name, phone: row.phone, logoUrl: companyLogoPath(row) };
}

/** The office number as typed, in E.164; numbers without a country code are read as North American, like customers' numbers. */
export function parseOfficePhone(input: string | null): string | null {
  const value = input?.trim() ?? "";
  if (value === "") return null;
  const phone = parsePhoneNumberFromString(value, "US");
  if (!phone?.isValid()) {
    throw new HttpError(400, "invalid_input", "Some of the information is not valid.", { phone: "Enter a phone number with its area code, e.g. (330) 555-0100." });
  }
  return phone.number;
}

export async function setOfficePhone(db: Db, companyId: number, input: string | null): Promise<void> {
  await repo.updatePhone(db, companyId, parseOfficePhone(input));
}

/** Stores the re-encoded logo first, then points the company at it; the previous file goes last. */
export async function uploadLogo(db: Db, storage: PhotoStorage, companyId: number, upload: Buffer | undefined): Promise<void> {
  if (!upload) throw new HttpError(400, "invalid_input", "Choose an image file for the logo.", { logo: "Choose an image file." });
  const png = await processLogo(upload);
  const key = newLogoKey(companyId);
  await storage.put(key, png, "image/png");
  let previous: string | null;
  try {
    previous = await repo.replaceLogoKey(db, companyId, key);
  } catch (err) {
    await storage.delete(key);
    throw err;
  }
  if (previous && previous !== key) await storage.delete(previous).catch(() => undefined);
}
