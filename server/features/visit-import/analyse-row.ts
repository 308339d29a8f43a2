import { parsePlanInput, type ProgramSettings, type Visit } from "#shared/engine/index";
import type { Db } from "../../db.ts";
import { importKey, normaliseStreet } from "./import-key.ts";
import type { CsvRecord } from "./parse-csv.ts";
import * as repo from "./repo.ts";
import { engineErrorsToColumns, mapRow, newCustomerErrors, newPropertyErrors, type LawnFacts, type MappedRow, type RowErrors } from "./row-mapping.ts";

/** What every row of one file is checked against. */
export type FileContext = { companyId: number; timeZone: string; program: ProgramSettings; staffByEmail: Map<string, number> };

/**
 * Customers and lawns that earlier rows of the same file will create: a preview treats a
 * later row of that customer as a match, as the import will.
 */
export type PendingInFile = Map<string, { lawn: Record<string, unknown>; timeZone: string } | null>;
const pendingCustomerKey = (ref: string) => `customer:${ref}`;
const pendingPropertyKey = (ref: string, street: string) => `property:${ref}:${normaliseStreet(street)}`;

export type RowAnalysis = {
  row: number;
  errors: RowErrors;
  mapped: MappedRow;
  key: string | null;
  customer: { kind: "match"; id: number | null; setRef: boolean } | { kind: "create" } | null;
  property: { kind: "match"; id: number | null; lawn: Record<string, unknown>; lawnChanged: boolean } | { kind: "create"; lawn: Record<string, unknown>; timeZone: string } | null;
  technicianId: number | null;
  /** The visit as the engine parsed it (defaults filled in); set when the row is valid. */
  visit: Visit | null;
};

const keyColumns = ["customer_ref", "street", "visit_date", "services"] as const;

function keyOf(ctx: FileContext, mapped: MappedRow, errors: RowErrors): string | null {
  return keyColumns.some((c) => errors[c]) ? null : importKey(ctx.companyId, mapped.customerRef, mapped.visit.date, mapped.visit.services, mapped.street);
}

/** The row's import key without any database reads; null when the cells it is made of are wrong. */
export function keyOfRecord(ctx: FileContext, record: CsvRecord): string | null {
  const { row, errors } = mapRow(record.cells, ctx.timeZone);
  return keyOf(ctx, row, errors);
}

/** The lawn facts a new lawn must have; a known lawn already has them. */
const requiredLawnColumns: [keyof LawnFacts, keyof RowErrors][] = [
  ["grassType", "grass_species"],
  ["lawnCondition", "lawn_condition"],
  ["irrigation", "irrigation"],
  ["currentMowingHeightIn", "mowing_height_in"],
  ["mowerHighestSettingIn", "mower_highest_in"],
];

async function findCustomer(db: Db, ctx: FileContext, mapped: MappedRow, errors: RowErrors, pending: PendingInFile | undefined): Promise<RowAnalysis["customer"]> {
  const byRef = await repo.customerByRef(db, ctx.companyId, mapped.customerRef);
  if (byRef) return { kind: "match", id: byRef.id, setRef: false };
  if (pending?.has(pendingCustomerKey(mapped.customerRef))) return { kind: "match", id: null, setRef: false };
  // Someone the company already has (signed up through a visit logged in the app) gets this number.
  let match: RowAnalysis["customer"] = null;
  for (const column of ["email", "phone"] as const) {
    const value = mapped[column];
    if (!value) continue;
    const account = await repo.accountByContact(db, { [column]: value });
    if (!account) continue;
    if (account.company_id === ctx.companyId && account.role === "customer" && account.customer_id !== null && account.external_ref === null) {
      match = { kind: "match", id: account.customer_id, setRef: true };
    } else if (account.company_id === ctx.companyId && account.role === "customer") {
      errors[column] ??= `Already belongs to customer ${account.external_ref}; check customer_ref`;
    } else {
      errors[column] ??= "Already belongs to another account";
    }
  }
  if (match) return match;
  for (const [column, message] of Object.entries(newCustomerErrors(mapped))) errors[column as keyof RowErrors] ??= message;
  return { kind: "create" };
}

async function findProperty(db: Db, mapped: MappedRow, customer: NonNullable<RowAnalysis["customer"]>, errors: RowErrors, pending: PendingInFile | undefined): Promise<{ property: RowAnalysis["property"]; timeZone: string }> {
  const given = mapped.lawn as Record<string, unknown>;
  const lawnChanged = Object.keys(given).length > 0;
  if (customer.kind === "match" && customer.id !== null) {
    const known = await repo.propertyByStreet(db, customer.id, mapped.street);
    if (known) return { property: { kind: "match", id: known.id, lawn: { ...known.lawn, ...given }, lawnChanged }, timeZone: known.timeZone };
  }
  const earlier = pending?.get(pendingPropertyKey(mapped.customerRef, mapped.street));
  if (earlier) return { property: { kind: "match", id: null, lawn: { ...earlier.lawn, ...given }, lawnChanged }, timeZone: earlier.timeZone };

  for (const [column, message] of Object.entries(newPropertyErrors(mapped))) errors[column as keyof RowErrors] ??= message;
  for (const [fact, column] of requiredLawnColumns) {
    if (mapped.lawn[fact] === undefined) errors[column] ??= "Required for a new property";
  }
  return { property: { kind: "create", lawn: given, timeZone: mapped.timeZone }, timeZone: mapped.timeZone };
}

/**
 * Checks one row against the file's company: maps its cells, matches the customer and the
 * lawn, and runs the care-plan engine's own validation on what the plan would be made from,
 * so a row that passes here also makes a plan. Reads only.
 */
export async function analyseRow(db: Db, ctx: FileContext, record: CsvRecord, pending?: PendingInFile): Promise<RowAnalysis> {
  const { row: mapped, errors } = mapRow(record.cells, ctx.timeZone);
  if (record.shapeError) errors.row = record.shapeError;
  const key = keyOf(ctx, mapped, errors);

  const customer = errors.customer_ref ? null : await findCustomer(db, ctx, mapped, errors, pending);
  const found = customer ? await findProperty(db, mapped, customer, errors, pending) : { property: null, timeZone: mapped.timeZone };

  let technicianId: number | null = null;
  if (mapped.technicianEmail) {
    technicianId = ctx.staffByEmail.get(mapped.technicianEmail) ?? null;
    if (technicianId === null) errors.technician_email = "No active technician or manager of your company has this address";
  }

  let visit: Visit | null = null;
  if (found.property) {
    const parsed = parsePlanInput({ visit: mapped.visit, property: { ...found.property.lawn, timeZone: found.timeZone }, program: ctx.program });
    if (parsed.ok) visit = parsed.value.visit;
    else for (const [column, message] of Object.entries(engineErrorsToColumns(parsed.fields))) errors[column as keyof RowErrors] ??= message;
  }

  const analysis: RowAnalysis = { row: record.row, errors, mapped, key, customer, property: found.property, technicianId, visit };
  if (pending && Object.keys(errors).length === 0 && found.property) {
    pending.set(pendingCustomerKey(mapped.customerRef), null);
    pending.set(pendingPropertyKey(mapped.customerRef, mapped.street), { lawn: found.property.lawn, timeZone: found.timeZone });
  }
  return analysis;
}
