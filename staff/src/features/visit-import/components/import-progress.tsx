import type { ImportBatchStatus } from "#shared/schemas/visit-import";

/** A real progress bar from the server's count; until the first count arrives it says it is starting. */
export function ImportProgress({ status, total }: { status: ImportBatchStatus | undefined; total: number }) {
  const processed = status?.status === "running" ? status.processed : 0;
  const percent = total > 0 ? Math.round((processed / total) * 100) : 0;
  return (
    <div className="flex flex-col gap-2 rounded-xl border border-line bg-surface p-4">
      <p id="import-progress-label" className="font-semibold">
        Importing… {processed} of {total} rows
      </p>
      <progress aria-labelledby="import-progress-label" max={total || 1} value={processed} className="h-4 w-full accent-pine-700">
        {percent}%
      </progress>
      <p className="text-ink-soft">Keep this page open. A full file of 2,000 rows takes about a minute.</p>
    </div>
  );
}
