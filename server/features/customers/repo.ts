import type { CustomerSummary } from "#shared/schemas/customers";
import type { Db } from "../../db.ts";

type CustomerRow = {
  id: number; first_name: string; last_name: string; email: string | null; phone: string | null;
  external_ref: string | null; created_at: Date;
};

/** Makes typed text match literally inside LIKE: %, _ and \ lose their wildcard meaning. */
export const likeLiteral = (text: string) => text.replace(/[\\%_]/g, "\\$&");

function customersOf(db: Db, companyId: number) {
  return db("customers as c")
    .join("users as u", "u.id", "c.user_id")
    .where("c.company_id", companyId)
    .select<CustomerRow[]>("c.id", "c.first_name", "c.last_name", "u.email", "u.phone", "c.external_ref", "c.created_at");
}

export async function searchCustomers(db: Db, companyId: number, q: string, limit: number): Promise<CustomerSummary[]> {
  const query = customersOf(db, companyId).orderBy(["c.last_name", "c.first_name", "c.id"]).limit(limit);
  if (q) {
    const pattern = `%${likeLiteral(q)}%`;
    // Phone numbers are stored in E.164; "(330) 555-0111" finds +13305550111 by its digits.
    const digits = q.replace(/\D/g, "");
    query.andWhere((w) => {
      w.whereRaw("(c.first_name || ' ' || c.last_name) ilike ?", [pattern])
        .orWhereRaw("u.email::text ilike ?", [pattern])
        .orWhereRaw("c.external_ref ilike ?", [pattern])
        .orWhereExists(db("properties as p").whereRaw("p.customer_id = c.id").andWhereRaw("p.street ilike ?", [pattern]));
      if (digits.length >= 3) w.orWhereRaw("regexp_replace(coalesce(u.phone, ''), '\\D', '', 'g') like ?", [`%${digits}%`]);
    });
  }
  const rows = await query;
  const ids = rows.map((r) => r.id);
  const [properties, plans] = await Promise.all([
    db("properties").whereIn("customer_id", ids).orderBy("id").select<{ id: number; customer_id: number; label: string; street: string; town: string }[]>("id", "customer_id", "label", "street", "town"),
    db("care_plans as cp")
      .join("properties as p", "p.id", "cp.property_id")
      .whereIn("p.customer_id", ids)
      .andWhere("cp.status", "active")
      .groupBy("p.customer_id")
      .select<{ customer_id: number; n: string }[]>("p.customer_id", db.raw("count(*) as n")),
  ]);
  return rows.map((r) => ({
    ...toCustomer(r),
    properties: properties.filter((p) => p.customer_id === r.id).map(({ customer_id: _c, ...p }) => p),
    activePlans: Number(plans.find((p) => p.customer_id === r.id)?.n ?? 0),
  }));
}

const toCustomer = (r: CustomerRow) => ({
  id: r.id, firstName: r.first_name, lastName: r.last_name, email: r.email, phone: r.phone, externalRef: r.external_ref,
});

export async function findCustomer(db: Db, companyId: number, id: number) {
  const row = await customersOf(db, companyId).where("c.id", id).first();
  return row ? { ...toCustomer(row), createdAt: row.created_at.toISOString() } : undefined;
}

export async function visitsOfCustomer(db: Db, customerId: number) {
  const rows = await db("service_visits as v")
    .join("properties as p", "p.id", "v.property_id")
    .leftJoin("users as t", "t.id", "v.technician_id")
    .leftJoin("care_plans as cp", "cp.visit_id", "v.id")
    .where("p.customer_id", customerId)
    .orderBy([{ column: "v.visit_date", order: "desc" }, { column: "v.id", order: "desc" }])
    .select<{ id: number; property_id: number; visit_date: string; services: string[]; technician_name: string | null; notes: string | null; plan_id: number | null }[]>(
      "v.id", "v.property_id", "v.visit_date", "v.services", "t.name as technician_name", "v.notes", "cp.id as plan_id",
    );
  return rows.map((r) => ({ id: r.id, propertyId: r.property_id, visitDate: r.visit_date, services: r.services, technicianName: r.technician_name, notes: r.notes, planId: r.plan_id }));
}
