import type { ImportBatchStatus } from "#shared/schemas/visit-import";
import type { Db } from "../../db.ts";
import { normaliseStreet } from "./import-key.ts";

export type KnownCustomer = { id: number; externalRef: string | null };
export type KnownProperty = { id: number; timeZone: string; lawn: Record<string, unknown> };

export async function customerByRef(db: Db, companyId: number, ref: string): Promise<KnownCustomer | undefined> {
  const row = await db("customers").where({ company_id: companyId, external_ref: ref }).first<{ id: number; external_ref: string } | undefined>("id", "external_ref");
  return row && { id: row.id, externalRef: row.external_ref };
}

/** Whoever has this e-mail address or phone number (addresses and numbers are unique across users). */
export async function accountByContact(db: Db, contact: { email?: string | null; phone?: string | null }) {
  if (!contact.email && !contact.phone) return undefined;
  const query = db("users").leftJoin("customers", "customers.user_id", "users.id");
  if (contact.email) query.where("users.email", contact.email);
  else query.where("users.phone", contact.phone!);
  return query.first<{ company_id: number; role: string; customer_id: number | null; external_ref: string | null } | undefined>(
    "users.company_id", "users.role", "customers.id as customer_id", "customers.external_ref",
  );
}

export async function propertyByStreet(db: Db, customerId: number, street: string): Promise<KnownProperty | undefined> {
  const rows = await db("properties").where({ customer_id: customerId }).select<{ id: number; street: string; time_zone: string; lawn: Record<string, unknown> }[]>("id", "street", "time_zone", "lawn");
  const wanted = normaliseStreet(street);
  const row = rows.find((r) => normaliseStreet(r.street) === wanted);
  return row && { id: row.id, timeZone: row.time_zone, lawn: row.lawn };
}

export async function importedKeys(db: Db, keys: readonly string[]): Promise<Set<string>> {
  if (keys.length === 0) return new Set();
  const rows = await db("service_visits").whereIn("import_key", keys).select<{ import_key: string }[]>("import_key");
  return new Set(rows.map((r) => r.import_key));
}

export async function activeStaffByEmail(db: Db, companyId: number): Promise<Map<string, number>> {
  const rows = await db("users").where({ company_id: companyId, active: true }).whereIn("role", ["technician", "manager"]).whereNotNull("email").select<{ id: number; email: string }[]>("id", "email");
  return new Map(rows.map((r) => [r.email.toLowerCase(), r.id]));
}

export async function insertCustomer(
  trx: Db,
  row: { companyId: number; ref: string; firstName: string; lastName: string; email: string | null; phone: string | null },
): Promise<number> {
  const [user] = await trx("users")
    .insert({ company_id: row.companyId, role: "customer", name: `${row.firstName} ${row.lastName}`, email: row.email, phone: row.phone })
    .returning<{ id: number }[]>("id");
  const [customer] = await trx("customers")
    .insert({ company_id: row.companyId, user_id: user!.id, first_name: row.firstName, last_name: row.lastName, external_ref: row.ref })
    .returning<{ id: number }[]>("id");
  return customer!.id;
}

/** A customer first known by e-mail or phone gets the company's number, so later rows match by it. */
export async function setExternalRef(trx: Db, customerId: number, ref: string): Promise<void> {
  await trx("customers").where({ id: customerId }).whereNull("external_ref").update({ external_ref: ref });
}

export async function insertProperty(
  trx: Db,
  row: { customerId: number; street: string; town: string; region: string; postalCode: string; timeZone: string; areaFt2: number; lawn: Record<string, unknown> },
): Promise<number> {
  // The first lawn is "Home"; further lawns of the same customer are told apart by their street.
  const hasOne = await trx("properties").where({ customer_id: row.customerId }).first("id");
  const [created] = await trx("properties")
    .insert({
      customer_id: row.customerId,
      label: hasOne ? row.street.slice(0, 80) : "Home",
      street: row.street,
      town: row.town,
      region: row.region,
      postal_code: row.postalCode,
      time_zone: row.timeZone,
      lawn_area_ft2: Math.round(row.areaFt2),
      lawn: JSON.stringify(row.lawn),
    })
    .returning<{ id: number }[]>("id");
  return created!.id;
}

export async function updateLawn(trx: Db, propertyId: number, lawn: Record<string, unknown>): Promise<void> {
  await trx("properties").where({ id: propertyId }).update({ lawn: JSON.stringify(lawn) });
}

type BatchRow = { id: number; status: ImportBatchStatus["status"]; row_count: number; processed_count: number; created_count: number; updated_at: Date; finished_at: Date | null };

const toStatus = (r: BatchRow): ImportBatchStatus => ({
  batchId: r.id,
  status: r.status,
  total: r.row_count,
  processed: r.processed_count,
  created: r.created_count,
  updatedAt: r.updated_at.toISOString(),
  finishedAt: r.finished_at?.toISOString() ?? null,
});

export async function batchStatus(db: Db, companyId: number, batchId: number): Promise<ImportBatchStatus | undefined> {
  const row = await db("import_batches").where({ id: batchId, company_id: companyId }).first<BatchRow | undefined>();
  return row && toStatus(row);
}

/** The batch of a file, made at its first preview; a running import keeps its state. */
export async function registerBatch(db: Db, row: { companyId: number; sha256: string; rowCount: number; userId: number }): Promise<number> {
  const [batch] = await db("import_batches")
    .insert({ company_id: row.companyId, file_sha256: row.sha256, row_count: row.rowCount, created_by: row.userId })
    .onConflict(["company_id", "file_sha256"])
    .merge({ updated_at: db.fn.now() })
    .returning<{ id: number }[]>("id");
  return batch!.id;
}

/** A run that has not reported progress for this long died with its server process. */
const STALE_RUN = "10 minutes";

/**
 * Marks the file's batch as running, unless another request (in any server process) is
 * importing the same file right now. Returns undefined in that case.
 */
export async function claimBatch(db: Db, row: { companyId: number; sha256: string; rowCount: number; userId: number }): Promise<number | undefined> {
  const { rows } = await db.raw<{ rows: { id: number }[] }>(
    `
    insert into import_batches (company_id, file_sha256, row_count, created_by, status)
    values (?, ?, ?, ?, 'running')
    on conflict (company_id, file_sha256) do update
      set status = 'running', processed_count = 0, row_count = excluded.row_count, updated_at = now(), finished_at = null
      where import_batches.status <> 'running' or import_batches.updated_at < now() - interval '${STALE_RUN}'
    returning id
    `,
    [row.companyId, row.sha256, row.rowCount, row.userId],
  );
  return rows[0]?.id;
}

export async function batchIdOfFile(db: Db, companyId: number, sha256: string): Promise<number | undefined> {
  const row = await db("import_batches").where({ company_id: companyId, file_sha256: sha256 }).first<{ id: number } | undefined>("id");
  return row?.id;
}

export async function recordProgress(db: Db, batchId: number, processed: number, createdNow: number): Promise<void> {
  await db("import_batches")
    .where({ id: batchId })
    .update({ processed_count: processed, created_count: db.raw("created_count + ?", [createdNow]), updated_at: db.fn.now() });
}

export async function finishBatch(db: Db, batchId: number, status: "done" | "failed"): Promise<void> {
  await db("import_batches").where({ id: batchId }).update({ status, updated_at: db.fn.now(), finished_at: db.fn.now() });
}
