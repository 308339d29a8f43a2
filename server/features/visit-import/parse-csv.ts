import Papa from "papaparse";
import { IMPORT_COLUMNS, REQUIRED_IMPORT_COLUMNS } from "#shared/schemas/visit-import";
import { HttpError } from "../../http/errors.ts";
import { isBlankRow } from "./row-mapping.ts";

export type CsvRecord = {
  /** The line number a spreadsheet shows: the header is 1. */
  row: number;
  cells: Record<string, string | undefined>;
  /** A line with more or fewer cells than the header. */
  shapeError: string | null;
};

const fileError = (message: string, fields?: Record<string, string>) => new HttpError(400, "invalid_file", message, fields);

/**
 * Reads the file's text as CSV with a header row. Column names are matched without regard
 * to case or surrounding spaces; unknown or missing columns refuse the whole file, because
 * a misspelt column would otherwise drop its data silently.
 */
export function readCsv(text: string, maxRows: number): CsvRecord[] {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ""), {
    header: true,
    // Always commas: list cells use ";", which papaparse's delimiter guess would otherwise pick.
    delimiter: ",",
    skipEmptyLines: false,
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  const header = parsed.meta.fields ?? [];
  const known = new Set<string>(IMPORT_COLUMNS);
  const unknown = header.filter((h) => h && !known.has(h));
  if (unknown.length) throw fileError(`Unknown column${unknown.length > 1 ? "s" : ""}: ${unknown.join(", ")}. Download the template for the column names.`);
  const missing = REQUIRED_IMPORT_COLUMNS.filter((c) => !header.includes(c));
  if (missing.length) throw fileError(`The header row lacks ${missing.join(", ")}. Download the template for the column names.`);
  const duplicated = header.filter((h, i) => header.indexOf(h) !== i);
  if (duplicated.length) throw fileError(`Column ${duplicated[0]} appears more than once.`);

  const shapeErrors = new Map<number, string>();
  for (const e of parsed.errors) {
    if (e.row !== undefined && (e.code === "TooFewFields" || e.code === "TooManyFields")) shapeErrors.set(e.row, e.message);
  }
  const records = parsed.data
    .map((cells, i) => ({ row: i + 2, cells, shapeError: shapeErrors.get(i) ?? null }))
    .filter((r) => !isBlankRow(r.cells));
  if (records.length === 0) throw fileError("The file has no visit rows under its header.");
  if (records.length > maxRows) throw fileError(`The file has ${records.length} rows; import at most ${maxRows.toLocaleString("en-US")} at a time (split the file).`);
  return records;
}
