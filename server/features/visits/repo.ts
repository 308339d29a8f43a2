import type { ApplicationRecord, VisitConditions } from "#shared/schemas/visits";
import type { Db } from "../../db.ts";

export type VisitDetails = {
  seedMix?: unknown[];
  seedRateLbPer1000?: number;
  areaFt2: number;
  products?: unknown[];
};

export type VisitWithProperty = {
  visitId: number;
  visitDate: string;
  services: string[];
  details: VisitDetails;
  propertyId: number;
  timeZone: string;
  /** State and postal code: they pick the company's place rules for the lawn. */
  region: string;
  postalCode: string;
  lawn: Record<string, unknown>;
  companyId: number;
};

export async function insertVisit(
  trx: Db,
  row: {
    propertyId: number; technicianId: number | null; date: string; services: readonly string[]; details: VisitDetails;
    notes?: string | null; importKey?: string | null;
    /** Optional: imports and seeds have none. */
    conditions?: VisitConditions | null; applicationRecord?: ApplicationRecord | null;
  },
): Promise<number> {
  const [created] = await trx("service_visits")
    .insert({
      property_id: row.propertyId,
      technician_id: row.technicianId,
      visit_date: row.date,
      services: row.services,
      details: JSON.stringify(row.details),
      notes: row.notes ?? null,
      import_key: row.importKey ?? null,
      conditions: row.conditions && Object.keys(row.conditions).length > 0 ? JSON.stringify(row.conditions) : null,
      application_record: row.applicationRecord ? JSON.stringify(row.applicationRecord) : null,
    })
    .returning<{ id: number }[]>("id");
  return created!.id;
}

export async function loadVisitWithProperty(db: Db, visitId: number): Promise<VisitWithProperty | undefined> {
  const row = await db("service_visits")
    .join("properties", "properties.id", "service_visits.property_id")
    .join("customers", "customers.id", "properties.customer_id")
    .where("service_visits.id", visitId)
    .first<{
      id: number; visit_date: string; services: string[]; details: VisitDetails;
      property_id: number; time_zone: string; region: string; postal_code: string; lawn: Record<string, unknown>; company_id: number;
    } | undefined>(
      "service_visits.id", "service_visits.visit_date", "service_visits.services", "service_visits.details",
      "properties.id as property_id", "properties.time_zone", "properties.region", "properties.postal_code", "properties.lawn", "customers.company_id",
    );
  if (!row) return undefined;
  return {
    visitId: row.id,
    visitDate: row.visit_date,
    services: row.services,
    details: row.details,
    propertyId: row.property_id,
    timeZone: row.time_zone,
    region: row.region,
    postalCode: row.postal_code,
    lawn: row.lawn,
    companyId: row.company_id,
  };
}

export async function moveVisit(trx: Db, visitId: number, date: string): Promise<void> {
  await trx("service_visits").where({ id: visitId }).update({ visit_date: date });
}

