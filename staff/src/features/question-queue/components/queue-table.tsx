import { useState } from "react";
import { createColumnHelper, flexRender, getCoreRowModel, getSortedRowModel, useReactTable, type SortingState } from "@tanstack/react-table";
import type { QueueRow } from "../lib/queue-rows.ts";
import { AnswerState, AssignButton, Assignee, PhotoCount, PhotoThumb, PlanDayText, QuestionExcerpt, QuestionLink, Waiting } from "./queue-cells.tsx";

const column = createColumnHelper<QueueRow>();

/** The queue on wide screens: one row per question, sortable by waiting time and customer. */
export function QueueTable({ rows, now }: { rows: QueueRow[]; now: Date }) {
  // The server's order (waiting for an answer first, then oldest waiting) until a header is pressed.
  const [sorting, setSorting] = useState<SortingState>([]);
  const columns = [
    column.accessor((row) => row.question.customerName, { id: "customer", header: "Customer", cell: (c) => <QuestionLink row={c.row.original} /> }),
    column.accessor((row) => row.question.street, { id: "lawn", header: "Lawn", enableSorting: false }),
    column.accessor((row) => row.question.askedAt, { id: "waiting", header: "Waiting", cell: (c) => <Waiting row={c.row.original} now={now} /> }),
    column.accessor((row) => (row.answered ? 1 : 0), { id: "status", header: "Status", cell: (c) => <AnswerState row={c.row.original} /> }),
    column.accessor((row) => row.question.planDay.dayOfPlan ?? -1, { id: "planDay", header: "Plan day", cell: (c) => <PlanDayText row={c.row.original} /> }),
    column.accessor((row) => row.question.photoCount, {
      id: "photos",
      header: "Photos",
      cell: (c) => (
        <span className="flex items-center gap-2">
          <PhotoThumb row={c.row.original} />
          <PhotoCount row={c.row.original} />
        </span>
      ),
    }),
    column.display({ id: "question", header: "Question", cell: (c) => <QuestionExcerpt row={c.row.original} /> }),
    column.accessor((row) => row.question.assignedToName ?? "", {
      id: "assignee",
      header: "Assigned to",
      cell: (c) => (
        <span className="flex flex-col items-start gap-1">
          <Assignee row={c.row.original} />
          <AssignButton row={c.row.original} />
        </span>
      ),
    }),
  ];
  const table = useReactTable({ data: rows, columns, state: { sorting }, onSortingChange: setSorting, getCoreRowModel: getCoreRowModel(), getSortedRowModel: getSortedRowModel() });

  return (
    <div className="overflow-x-auto rounded-xl border border-line bg-surface">
      <table className="w-full border-collapse text-left">
        <caption className="sr-only">Open questions: waiting for an answer first, then oldest waiting first</caption>
        <thead className="border-b-2 border-line bg-pine-50">
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const sorted = header.column.getIsSorted();
                return (
                  <th key={header.id} scope="col" aria-sort={sorted ? (sorted === "asc" ? "ascending" : "descending") : undefined} className="px-3 py-2 font-semibold whitespace-nowrap">
                    {header.column.getCanSort() ? (
                      <button type="button" onClick={header.column.getToggleSortingHandler()} className="inline-flex min-h-11 items-center gap-1 font-semibold text-pine-900 hover:underline">
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true">{sorted === "asc" ? "▲" : sorted === "desc" ? "▼" : "↕"}</span>
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
            <tr key={row.id} className="border-b border-line last:border-0 hover:bg-canvas">
              {row.getVisibleCells().map((cell) => (
                <td key={cell.id} className="px-3 py-2 align-middle">
                  {flexRender(cell.column.columnDef.cell, cell.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
