import Papa from "papaparse";
import { IMPORT_COLUMNS, REQUIRED_IMPORT_COLUMNS } from "#shared/schemas/visit-import";
import { HttpError } from "../../http/errors.ts";
import { isBlankRow } from "./row-mapping.ts";

export type CsvRecord = {
  /** The line number a spreadsheet shows: the header is 1. */
  row: number;
  cells: Record<string, string | undefined>;
  /** A line with more or fewer cells than the header, or a quote that never closes; names the column. */
  shapeError: string | null;
};

const fileError = (message: string, fields?: Record<string, string>) => new HttpError(400, "invalid_file", message, fields);

/** The column letter a spreadsheet shows: 0 → A, 25 → Z, 26 → AA. */
export function columnLetter(index: number): string {
  let letters = "";
  for (let n = index + 1; n > 0; n = Math.floor((n - 1) / 26)) letters = String.fromCharCode(65 + ((n - 1) % 26)) + letters;
  return letters;
}

const HEADER = "Row 1 (the header)";
const TEMPLATE_HINT = "Download the template for the column names.";

/**
 * One kind of line ending for the whole file. Files edited on several systems mix CRLF, LF and
 * lone CR; papaparse picks one kind from the start of the file, and would then leave CRs in
 * cells or run two rows together.
 */
export const normaliseText = (text: string) => text.replace(/^\uFEFF/, "").replace(/\r\n?/g, "\n");

function shapeMessage(header: readonly string[], cellCount: number): string {
  if (cellCount < header.length) {
    const first = columnLetter(cellCount);
    return `This row has ${cellCount} cells where the header has ${header.length}: column ${first} (${header[cellCount]}) and after are missing. Check for a missing comma, or a cell with a comma that needs quotes.`;
  }
  return `This row has ${cellCount} cells where the header has ${header.length}: column ${columnLetter(header.length)} is past the last column. Check for an extra comma, or a cell with a comma that needs quotes.`;
}

/**
 * Reads the file's text as CSV with a header row. Column names are matched without regard
 * to case or surrounding spaces; unknown or missing columns refuse the whole file, because
 * a misspelt column would otherwise drop its data silently. Every error names its row and,
 * where there is one, its column (letter and name).
 */
export function readCsv(text: string, maxRows: number): CsvRecord[] {
  const parsed = Papa.parse<Record<string, string>>(normaliseText(text), {
    header: true,
    // Always commas: list cells use ";", which papaparse's delimiter guess would otherwise pick.
    delimiter: ",",
    newline: "\n",
    skipEmptyLines: false,
    transformHeader: (h) => h.trim().toLowerCase(),
  });
  // papaparse renames a repeated column ("street_1"); the person fixing the file needs the name they wrote.
  const renamed = parsed.meta.renamedHeaders ?? {};
  const header = (parsed.meta.fields ?? []).map((h) => (renamed[h] ?? h).trim().toLowerCase());
  const known = new Set<string>(IMPORT_COLUMNS);
  const unknown = header.flatMap((h, i) => (h && !known.has(h) ? [`column ${columnLetter(i)} "${h}"`] : []));
  if (unknown.length) throw fileError(`${HEADER}: unknown ${unknown.join(", ")}. ${TEMPLATE_HINT}`);
  const blank = header.findIndex((h) => !h);
  if (blank >= 0) throw fileError(`${HEADER}, column ${columnLetter(blank)}: the column has no name. Name it or delete it.`);
  const missing = REQUIRED_IMPORT_COLUMNS.filter((c) => !header.includes(c));
  if (missing.length) throw fileError(`${HEADER} lacks the required ${missing.length > 1 ? "columns" : "column"} ${missing.join(", ")}. ${TEMPLATE_HINT}`);
  const repeated = header.findIndex((h, i) => header.indexOf(h) !== i);
  if (repeated >= 0) {
    const name = header[repeated]!;
    throw fileError(`${HEADER}: columns ${columnLetter(header.indexOf(name))} and ${columnLetter(repeated)} are both "${name}".`);
  }

  const shapeErrors = new Map<number, string>();
  const quoteErrors = new Map<number, string>();
  for (const e of parsed.errors) {
    if (e.row === undefined) continue;
    if (e.code === "TooFewFields" || e.code === "TooManyFields") {
      const cells = Number(/parsed (\d+)/.exec(e.message)?.[1] ?? NaN);
      shapeErrors.set(e.row, Number.isFinite(cells) ? shapeMessage(header, cells) : e.message);
    } else if (e.code === "MissingQuotes" || e.code === "InvalidQuotes") {
      // papaparse counts the header in these errors' row, not in the others'.
      quoteErrors.set(e.row - 1, `A quote (") in this row opens a cell that does not close before the next comma or line: close it, and double any quote inside a cell ("").`);
    }
  }
  // A quote left open swallows the lines after it, so it is the cause of its row's wrong cell count.
  for (const [row, message] of quoteErrors) shapeErrors.set(row, message);
  const records = parsed.data
    .map((cells, i) => ({ row: i + 2, cells, shapeError: shapeErrors.get(i) ?? null }))
    .filter((r) => !isBlankRow(r.cells));
  if (records.length === 0) throw fileError("The file has no visit rows under its header (row 1).");
  if (records.length > maxRows) throw fileError(`The file has ${records.length} rows; import at most ${maxRows.toLocaleString("en-US")} at a time (split the file).`);
  return records;
}
