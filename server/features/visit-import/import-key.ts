import { createHash } from "node:crypto";

/**
 * The stable key of an imported visit: the same customer, date, services and street in
 * the same company always give the same key, whatever file or row it comes from. Stored
 * in service_visits.import_key (unique), so importing a row twice creates it once.
 */
export function importKey(companyId: number, customerRef: string, visitDate: string, services: readonly string[], street: string): string {
  const parts = [companyId, customerRef.trim().toLowerCase(), visitDate, [...services].sort().join(";"), normaliseStreet(street)];
  return `csv:${createHash("sha256").update(JSON.stringify(parts)).digest("hex")}`;
}

/** "14  Larkspur lane" and "14 Larkspur Lane" are the same street. */
export function normaliseStreet(street: string): string {
  return street.trim().toLowerCase().replace(/[.,]/g, "").replace(/\s+/g, " ");
}

export const sha256Hex = (bytes: Buffer) => createHash("sha256").update(bytes).digest("hex");
