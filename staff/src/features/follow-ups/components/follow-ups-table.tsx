import { createColumnHelper, flexRender, getCoreRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import { followUpReasonLabels, type FollowUp, type FollowUpListQuery, type FollowUpStatus } from "#shared/schemas/follow-ups";
import { formatDay } from "../lib/labels.ts";
import { CallbackCost } from "./callback-cost.tsx";
import { FollowUpActions } from "./follow-up-actions.tsx";
import { CallbackBadge, StatusBadge } from "./status-badge.tsx";

type SortKey = FollowUpListQuery["sort"];

export interface FollowUpsTableProps {
  rows: FollowUp[];
  sort: SortKey;
  order: "asc" | "desc";
  onSort: (sort: SortKey, order: "asc" | "desc") => void;
  onOpen: (followUp: FollowUp, targetStatus?: FollowUpStatus) => void;
}

const column = createColumnHelper<FollowUp>();

/** Column ids are the server's sort keys, so react-table's sorting state maps onto the query as is. */
const columns = [
  column.accessor("date", { id: "date", header: "Date", cell: (c) => <span className="whitespace-nowrap">{formatDay(c.getValue())}</span> }),
  column.accessor("customerName", {
    id: "customer",
    header: "Customer and lawn",
    cell: (c) => (
      <>
        <span className="font-semibold">{c.getValue()}</span>
        <br />
        <span className="text-ink-soft">{c.row.original.street}</span>
      </>
    ),
  }),
  column.accessor("status", {
    id: "status",
    header: "Status",
    cell: (c) => (
      <div className="flex flex-col items-start gap-1">
        <StatusBadge status={c.getValue()} />
        {c.row.original.isCallback && <CallbackBadge />}
      </div>
    ),
  }),
  column.accessor("reason", { id: "reason", header: "Reason", cell: (c) => followUpReasonLabels[c.getValue()] }),
  column.accessor("technicianName", { id: "technician", header: "Technician", cell: (c) => c.getValue() ?? <span className="text-ink-soft">Not assigned</span> }),
  column.accessor("labourHours", { id: "labourHours", header: "Callback cost", cell: (c) => <CallbackCost followUp={c.row.original} /> }),
  column.display({ id: "actions", header: () => <span className="sr-only">Actions</span>, enableSorting: false }),
];

/** The desktop table. Sorting and paging happen on the server; this only draws the page it was given. */
export function FollowUpsTable({ rows, sort, order, onSort, onOpen }: FollowUpsTableProps) {
  const sorting: SortingState = [{ id: sort, desc: order === "desc" }];
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting },
    manualSorting: true,
    enableSortingRemoval: false,
    getCoreRowModel: getCoreRowModel(),
    onSortingChange: (updater) => {
      const next = typeof updater === "function" ? updater(sorting) : updater;
      const first = next[0];
      if (first) onSort(first.id as SortKey, first.desc ? "desc" : "asc");
    },
  });

  return (
    <div className="relative overflow-x-auto rounded-xl border border-line bg-surface">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Follow-up visits, sorted by {sort} {order === "asc" ? "ascending" : "descending"}</caption>
        <thead className="border-b-2 border-line bg-canvas">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                const sortable = header.column.getCanSort();
                return (
                  <th
                    key={header.id}
                    scope="col"
                    aria-sort={sorted === "asc" ? "ascending" : sorted === "desc" ? "descending" : undefined}
                    className="px-3 py-2 align-bottom font-semibold"
                  >
                    {sortable ? (
                      <button
                        type="button"
                        onClick={header.column.getToggleSortingHandler()}
                        className="-mx-2 inline-flex min-h-11 items-center gap-1 rounded-lg px-2 text-left font-semibold hover:bg-pine-50"
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <SortMark direction={sorted} />
                      </button>
                    ) : (
                      flexRender(header.column.columnDef.header, header.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className="border-b border-line last:border-0">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-3 align-top">
                  {cell.column.id === "actions" ? (
                    <FollowUpActions followUp={row.original} onOpen={onOpen} />
                  ) : (
                    flexRender(cell.column.columnDef.cell, cell.getContext())
                  )}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

function SortMark({ direction }: { direction: false | "asc" | "desc" }) {
  const mark = direction === "asc" ? "▲" : direction === "desc" ? "▼" : "↕";
  return (
    <span aria-hidden="true" className={`text-sm ${direction ? "text-pine-700" : "text-ink-soft"}`}>
      {mark}
    </span>
  );
}
