import type { ImportRowPreview } from "#shared/schemas/visit-import";
import type { LocalCsv } from "../lib/read-csv.ts";

/** Always shown, so each row can be recognised; columns with a problem anywhere are added. */
const KEY_COLUMNS = ["customer_ref", "first_name", "last_name", "street", "visit_date", "services", "area_ft2"];

export interface PreviewTableProps {
  rows: ImportRowPreview[];
  csv: LocalCsv | null;
  onlyProblems: boolean;
}

/** Each row's cells with the faulty ones marked, and in words what is wrong and what will happen. */
export function PreviewTable({ rows, csv, onlyProblems }: PreviewTableProps) {
  const errorColumns = new Set(rows.flatMap((r) => Object.keys(r.errors)).filter((c) => c !== "row"));
  const columns = [...KEY_COLUMNS, ...[...errorColumns].filter((c) => !KEY_COLUMNS.includes(c))].filter(
    (c) => !csv || csv.columns.includes(c) || errorColumns.has(c),
  );
  const shown = onlyProblems ? rows.filter((r) => !r.ok) : rows;
  if (shown.length === 0) return <p className="rounded-lg border border-dashed border-line bg-surface p-4">Every row is fine.</p>;

  return (
    <div className="relative max-h-[70vh] overflow-auto rounded-xl border border-line bg-surface" tabIndex={0} role="region" aria-label="Rows of the file">
      <table className="w-full border-collapse text-left text-base">
        <caption className="sr-only">Rows of the file with what will happen to each; cells with a problem are marked</caption>
        <thead className="sticky top-0 z-[1] border-b-2 border-line bg-canvas">
          <tr>
            <th scope="col" className="px-2 py-2">
              Row
            </th>
            <th scope="col" className="px-2 py-2">
              What happens
            </th>
            {columns.map((c) => (
              <th key={c} scope="col" className="px-2 py-2 font-mono text-sm whitespace-nowrap">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {shown.map((row) => {
            const cells = csv?.rows.get(row.row) ?? {};
            return (
              <tr key={row.row} className={`border-b border-line align-top last:border-0 ${row.ok ? "" : "bg-rust-50/40"}`}>
                <th scope="row" className="px-2 py-2 font-semibold">
                  {row.row}
                </th>
                <td className="min-w-56 px-2 py-2">
                  <RowVerdict row={row} />
                </td>
                {columns.map((c) => {
                  const error = row.errors[c];
                  return (
                    <td key={c} className={`px-2 py-2 ${error ? "border-2 border-rust-700 bg-rust-50 font-semibold text-rust-700" : ""}`}>
                      <span className="whitespace-nowrap">{cells[c] || (error ? "(empty)" : "")}</span>
                      {error && <span className="sr-only"> — problem: {error}</span>}
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

function RowVerdict({ row }: { row: ImportRowPreview }) {
  const problems = Object.entries(row.errors);
  if (problems.length > 0) {
    return (
      <ul className="flex flex-col gap-1 text-rust-700">
        {problems.map(([column, message]) => (
          <li key={column}>
            <span aria-hidden="true">⚠ </span>
            {column === "row" ? "" : <span className="font-mono text-sm">{column}: </span>}
            {message}
          </li>
        ))}
      </ul>
    );
  }
  if (row.visitAction === "already_imported") return <span className="text-ink-soft">Already imported: skipped</span>;
  if (row.visitAction === "duplicate_in_file") return <span className="text-ink-soft">Repeats row {row.duplicateOfRow}: skipped</span>;
  return <span className="text-pine-800">New visit and plan for {row.customerAction === "match" ? "an existing customer" : "a new customer"}</span>;
}
