import Papa from "papaparse";
import { followUpReasonLabels, type FollowUp } from "#shared/schemas/follow-ups";

/**
 * Spreadsheets run a cell that starts with = + - @ (or a tab or carriage return) as a
 * formula, so text a customer or colleague typed could run in the manager's spreadsheet
 * (OWASP "CSV Injection"). A leading single quote makes the spreadsheet show it as text.
 */
export function neutraliseFormula(cell: string): string {
  return /^[=+\-@\t\r]/.test(cell) ? `'${cell}` : cell;
}

/** Writes rows as CSV (RFC 4180 quoting by papaparse), every cell neutralised. */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null)[])[]): string {
  const cells = rows.map((row) => row.map((cell) => neutraliseFormula(cell === null ? "" : String(cell))));
  return Papa.unparse({ fields: header.map(neutraliseFormula), data: cells }, { newline: "\r\n" });
}

const header = [
  "id", "date", "status", "customer", "street", "technician", "reason", "reason_note", "callback",
  "labour_hours", "materials_cost", "outcome", "outcome_note", "requested_at", "requested_by",
] as const;

export function followUpsCsv(rows: readonly FollowUp[]): string {
  return toCsv(
    header,
    rows.map((f) => [
      f.id, f.date, f.status, f.customerName, f.street, f.technicianName, followUpReasonLabels[f.reason], f.reasonNote,
      f.isCallback ? "yes" : "no", f.labourHours, f.materialsCost, f.isCallback ? f.outcome : "", f.outcomeNote, f.createdAt, f.createdByName,
    ]),
  );
}
