import { importLimits, type ImportRowOutcome, type ImportRowPreview } from "#shared/schemas/visit-import";
import type { SessionUser } from "../../auth/session-user.ts";
import type { Db } from "../../db.ts";
import { HttpError } from "../../http/errors.ts";
import { currentProgram } from "../plans/program-repo.ts";
import { createPlanForVisit, type PlanChangeHook } from "../plans/service.ts";
import { noticeOfNewPlan } from "../notices/service.ts";
import { insertVisit } from "../visits/repo.ts";
import { analyseRow, keyOfRecord, type FileContext, type PendingInFile, type RowAnalysis } from "./analyse-row.ts";
import { sha256Hex } from "./import-key.ts";
import { readCsv, type CsvRecord } from "./parse-csv.ts";
import * as repo from "./repo.ts";
import { engineErrorsToColumns, type RowErrors } from "./row-mapping.ts";

export type UploadedFile = { bytes: Buffer };

async function fileContext(db: Db, companyId: number): Promise<FileContext> {
  const company = await db("companies").where({ id: companyId }).first<{ time_zone: string }>("time_zone");
  return { companyId, timeZone: company.time_zone, program: await currentProgram(db, companyId), staffByEmail: await repo.activeStaffByEmail(db, companyId) };
}

function readFile(file: UploadedFile): CsvRecord[] {
  return readCsv(file.bytes.toString("utf8"), importLimits.maxRows);
}

/** Checks every row without writing anything but the file's batch (which the progress view polls). */
export async function previewImport(db: Db, user: SessionUser, file: UploadedFile) {
  const records = readFile(file);
  const batchId = await repo.registerBatch(db, { companyId: user.companyId, sha256: sha256Hex(file.bytes), rowCount: records.length, userId: user.id });
  const ctx = await fileContext(db, user.companyId);
  const pending: PendingInFile = new Map();
  const firstRowOfKey = new Map<string, number>();
  const rows: ImportRowPreview[] = [];
  for (const chunk of chunks(records, importLimits.chunkSize)) {
    const analyses: RowAnalysis[] = [];
    for (const record of chunk) analyses.push(await analyseRow(db, ctx, record, pending));
    const imported = await repo.importedKeys(db, analyses.flatMap((a) => (a.key ? [a.key] : [])));
    for (const a of analyses) {
      const duplicateOf = a.key ? firstRowOfKey.get(a.key) : undefined;
      if (a.key && duplicateOf === undefined) firstRowOfKey.set(a.key, a.row);
      const settled = duplicateOf !== undefined || (a.key !== null && imported.has(a.key));
      rows.push({
        row: a.row,
        // A row already in the database or repeating an earlier row creates nothing, so it has nothing left to fix.
        ok: settled || Object.keys(a.errors).length === 0,
        errors: settled ? {} : (a.errors as Record<string, string>),
        customerAction: a.customer ? (a.customer.kind === "create" ? "create" : "match") : null,
        visitAction: a.key === null ? null : duplicateOf !== undefined ? "duplicate_in_file" : imported.has(a.key) ? "already_imported" : "create",
        visitKey: a.key,
        duplicateOfRow: duplicateOf ?? null,
      });
    }
  }
  const valid = rows.filter((r) => r.ok).length;
  return { batchId, total: rows.length, valid, invalid: rows.length - valid, rows };
}

class RowFailed extends Error {
  constructor(readonly errors: RowErrors) {
    super("row failed");
  }
}

const isUniqueViolation = (err: unknown, constraint?: string) =>
  (err as { code?: string }).code === "23505" && (!constraint || (err as { constraint?: string }).constraint === constraint);

/**
 * Imports one row in its own transaction: its customer, lawn, visit and care plan land
 * together or not at all, and a bad row never undoes the good ones before it.
 */
async function importRow(db: Db, ctx: FileContext, record: CsvRecord, onChange: PlanChangeHook | undefined): Promise<ImportRowOutcome> {
  const outcome = (kind: ImportRowOutcome["outcome"], extra: Partial<ImportRowOutcome> = {}): ImportRowOutcome => ({
    row: record.row, outcome: kind, errors: {}, visitId: null, planId: null, customerId: null, duplicateOfRow: null, ...extra,
  });
  try {
    return await db.transaction(async (trx) => {
      const key = keyOfRecord(ctx, record);
      if (key && (await repo.importedKeys(trx, [key])).size > 0) return outcome("already_imported");
      const a = await analyseRow(trx, ctx, record);
      if (Object.keys(a.errors).length > 0 || !a.customer || !a.property || !a.visit || !a.key) throw new RowFailed(a.errors);
      const { mapped } = a;

      let customerId: number;
      if (a.customer.kind === "match" && a.customer.id !== null) {
        customerId = a.customer.id;
        if (a.customer.setRef) await repo.setExternalRef(trx, customerId, mapped.customerRef);
      } else {
        customerId = await repo.insertCustomer(trx, { companyId: ctx.companyId, ref: mapped.customerRef, firstName: mapped.firstName!, lastName: mapped.lastName!, email: mapped.email, phone: mapped.phone });
      }

      let propertyId: number;
      if (a.property.kind === "match" && a.property.id !== null) {
        propertyId = a.property.id;
        // The file's newer lawn facts (e.g. this season's frost date) are what the plan is made from.
        if (a.property.lawnChanged) await repo.updateLawn(trx, propertyId, a.property.lawn);
      } else {
        propertyId = await repo.insertProperty(trx, {
          customerId, street: mapped.street, town: mapped.town!, region: mapped.region!, postalCode: mapped.postalCode!,
          timeZone: a.property.kind === "create" ? a.property.timeZone : mapped.timeZone, areaFt2: a.visit.areaFt2, lawn: a.property.lawn,
        });
      }

      const { date, services, ...details } = a.visit;
      const visitId = await insertVisit(trx, { propertyId, technicianId: a.technicianId, date, services, details, notes: mapped.notes, importKey: a.key });
      const { planId } = await createPlanForVisit(trx, visitId, onChange);
      // Queued with the plan, in its transaction: a row that rolls back sends no welcome.
      await noticeOfNewPlan(trx, planId);
      return outcome("created", { visitId, planId, customerId });
    });
  } catch (err) {
    if (err instanceof RowFailed) return outcome("failed", { errors: err.errors as Record<string, string> });
    if (err instanceof HttpError && err.code === "plan_input_invalid") return outcome("failed", { errors: engineErrorsToColumns(err.fields ?? {}) as Record<string, string> });
    // Another import wrote the same visit between our check and our insert: it exists once, which is the point.
    if (isUniqueViolation(err, "service_visits_import_key_unique")) return outcome("already_imported");
    if (isUniqueViolation(err)) {
      return outcome("failed", { errors: { row: "Another import created this customer at the same moment. Import the file again to add this row." } });
    }
    throw err;
  }
}

/**
 * Imports a file row by row, in chunks, writing progress to the file's batch after each
 * chunk so the UI can poll GET /api/visit-imports/:batchId. Runs inside the request:
 * files are limited to importLimits.maxRows rows.
 */
export async function runImport(db: Db, user: SessionUser, file: UploadedFile, onChange?: PlanChangeHook) {
  const records = readFile(file);
  const sha256 = sha256Hex(file.bytes);
  const batchId = await repo.claimBatch(db, { companyId: user.companyId, sha256, rowCount: records.length, userId: user.id });
  if (batchId === undefined) {
    const running = await repo.batchIdOfFile(db, user.companyId, sha256);
    throw new HttpError(409, "import_running", `This file is being imported right now (batch ${running}). Follow its progress instead of starting it again.`);
  }
  const ctx = await fileContext(db, user.companyId);
  const seen = new Map<string, number>();
  const results: ImportRowOutcome[] = [];
  try {
    for (const chunk of chunks(records, importLimits.chunkSize)) {
      let createdInChunk = 0;
      for (const record of chunk) {
        const result = await importOnce(db, ctx, record, seen, onChange);
        if (result.outcome === "created") createdInChunk += 1;
        results.push(result);
      }
      await repo.recordProgress(db, batchId, results.length, createdInChunk);
    }
    await repo.finishBatch(db, batchId, "done");
  } catch (err) {
    await repo.finishBatch(db, batchId, "failed").catch(() => undefined);
    throw err;
  }
  const count = (kind: ImportRowOutcome["outcome"]) => results.filter((r) => r.outcome === kind).length;
  return {
    batchId,
    total: results.length,
    created: count("created"),
    alreadyImported: count("already_imported"),
    duplicates: count("duplicate_in_file"),
    failed: count("failed"),
    rows: results,
  };
}

/** A row that repeats an earlier row of the same file is reported, not imported again. */
async function importOnce(db: Db, ctx: FileContext, record: CsvRecord, seen: Map<string, number>, onChange: PlanChangeHook | undefined): Promise<ImportRowOutcome> {
  const key = keyOfRecord(ctx, record);
  const firstRow = key ? seen.get(key) : undefined;
  if (firstRow !== undefined) {
    return { row: record.row, outcome: "duplicate_in_file", errors: {}, visitId: null, planId: null, customerId: null, duplicateOfRow: firstRow };
  }
  if (key) seen.set(key, record.row);
  return importRow(db, ctx, record, onChange);
}

function* chunks<T>(items: readonly T[], size: number): Generator<T[]> {
  for (let i = 0; i < items.length; i += size) yield items.slice(i, i + size);
}
