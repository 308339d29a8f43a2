import type { Db } from "../../db.ts";
import type { PropertyDetail, PropertySummary } from "#shared/schemas/properties";
import type { LawnOnSite } from "#shared/schemas/visits";

type Row = {
  id: number; customer_id: number; label: string; street: string; town: string; region: string;
  postal_code: string; time_zone: string; lawn_area_ft2: number | null;
};

const toSummary = (r: Row): PropertySummary => ({
  id: r.id, customerId: r.customer_id, label: r.label, street: r.street, town: r.town, region: r.region,
  postalCode: r.postal_code, timeZone: r.time_zone, lawnAreaFt2: r.lawn_area_ft2,
});

function baseQuery(db: Db, companyId: number) {
  return db("properties")
    .join("customers", "customers.id", "properties.customer_id")
    .where("customers.company_id", companyId)
    .select<Row[]>("properties.id", "properties.customer_id", "properties.label", "properties.street", "properties.town",
      "properties.region", "properties.postal_code", "properties.time_zone", "properties.lawn_area_ft2");
}

export async function listForCustomer(db: Db, companyId: number, customerId: number): Promise<PropertySummary[]> {
  return (await baseQuery(db, companyId).where("properties.customer_id", customerId).orderBy("properties.id")).map(toSummary);
}

export async function findInCompany(db: Db, companyId: number, propertyId: number): Promise<PropertyDetail | undefined> {
  const row = (await baseQuery(db, companyId).select("properties.lawn").where("properties.id", propertyId).first()) as (Row & { lawn: Record<string, unknown> }) | undefined;
  return row ? { ...toSummary(row), lawn: row.lawn } : undefined;
}

/** Sets the noted lawn facts on the lawn's record, leaving its other facts as they are (jsonb merge in one statement). */
export async function mergeLawnFacts(db: Db, propertyId: number, facts: LawnOnSite): Promise<void> {
  const noted = Object.fromEntries(Object.entries(facts).filter(([, v]) => v !== undefined));
  if (Object.keys(noted).length === 0) return;
  await db("properties").where({ id: propertyId }).update({ lawn: db.raw("lawn || ?::jsonb", [JSON.stringify(noted)]) });
}
