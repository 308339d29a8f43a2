import type { ReactNode } from "react";

export interface ReportColumn<Row> {
  header: string;
  cell: (row: Row) => ReactNode;
  /** Right-aligned, for figures that are compared down the column. */
  numeric?: boolean;
}

export interface ReportTableProps<Row> {
  caption: string;
  columns: ReportColumn<Row>[];
  rows: Row[];
  rowKey: (row: Row) => string;
  /** Shown in place of the rows when there are none. */
  empty: string;
}

/** The figures behind a chart: the primary content, read by screen readers and scrolled sideways on phones. */
export function ReportTable<Row>({ caption, columns, rows, rowKey, empty }: ReportTableProps<Row>) {
  if (rows.length === 0) return <p className="rounded-lg border border-dashed border-line bg-surface p-4 text-ink-soft">{empty}</p>;
  return (
    <div className="relative overflow-x-auto rounded-xl border border-line bg-surface" tabIndex={0} role="region" aria-label={caption}>
      <table className="w-full border-collapse text-left text-base">
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b-2 border-line bg-canvas">
          <tr>
            {columns.map((column) => (
              <th key={column.header} scope="col" className={`px-2 py-2 align-bottom font-semibold sm:px-3 ${column.numeric ? "text-right" : ""}`}>
                {column.header}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={rowKey(row)} className="border-b border-line last:border-0">
              {columns.map((column, i) =>
                i === 0 ? (
                  <th key={column.header} scope="row" className="px-2 py-2 text-left font-semibold sm:px-3">
                    {column.cell(row)}
                  </th>
                ) : (
                  <td key={column.header} className={`px-2 py-2 sm:px-3 ${column.numeric ? "text-right tabular-nums" : ""}`}>
                    {column.cell(row)}
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
