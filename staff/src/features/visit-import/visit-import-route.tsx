import { useState } from "react";
import { Button, CheckboxField, ErrorState, LoadingState, Page, buttonClasses, errorMessage, isApiRequestError } from "#shared/ui/index";
import { useImportStatus } from "./api/get-import-status.ts";
import { usePreviewImport } from "./api/preview-import.ts";
import { useRunImport } from "./api/run-import.ts";
import { importTemplateHref } from "./api/template.ts";
import { FileDrop } from "./components/file-drop.tsx";
import { ImportProgress } from "./components/import-progress.tsx";
import { ImportResults } from "./components/import-results.tsx";
import { PreviewSummary } from "./components/preview-summary.tsx";
import { PreviewTable } from "./components/preview-table.tsx";
import { fileProblem } from "./lib/file-check.ts";
import { readCsvLocally, type LocalCsv } from "./lib/read-csv.ts";

/** A day's visits from a spreadsheet: check every row first, then import; the same file twice creates nothing twice. */
export function VisitImportRoute() {
  const [file, setFile] = useState<File | null>(null);
  const [csv, setCsv] = useState<LocalCsv | null>(null);
  const [pickError, setPickError] = useState<string | null>(null);
  const [onlyProblems, setOnlyProblems] = useState(false);
  const preview = usePreviewImport();
  const run = useRunImport();
  const status = useImportStatus(preview.data?.batchId, run.isPending);

  const choose = (picked: File) => {
    const problem = fileProblem(picked);
    setPickError(problem);
    preview.reset();
    run.reset();
    setCsv(null);
    setFile(problem ? null : picked);
    if (problem) return;
    preview.mutate(picked);
    // Only for showing the cells; if the browser can't read it, the server's verdict still shows.
    readCsvLocally(picked).then(setCsv, () => setCsv(null));
  };
  const startOver = () => {
    setFile(null);
    setCsv(null);
    preview.reset();
    run.reset();
  };

  const fileError = isApiRequestError(preview.error) && (preview.error.code === "invalid_file" || preview.error.status === 413);

  return (
    <Page
      title="Import visits"
      width="wide"
      intro="Upload a CSV file of a day's visits done outside the app. Each row creates the customer and lawn if they are new, the visit and its care plan. Importing the same file again creates nothing twice."
      actions={
        <a href={importTemplateHref} download className={buttonClasses("secondary")}>
          Download the template
        </a>
      }
    >
      <div className="flex flex-col gap-6">
        {!run.data && !run.isPending && (
          <FileDrop onFile={choose} disabled={preview.isPending} error={pickError ?? (fileError ? errorMessage(preview.error) : null)} />
        )}
        {file && (
          <p className="text-ink-soft">
            File: <span className="font-semibold text-ink">{file.name}</span> ({Math.max(1, Math.round(file.size / 1024))} KB)
          </p>
        )}
        {preview.isPending && <LoadingState label="Checking every row… a full file of 2,000 rows takes about 10 seconds." />}
        {preview.isError && !fileError && <ErrorState title="The file couldn't be checked" error={preview.error} onRetry={() => file && preview.mutate(file)} />}

        {preview.data && !run.data && !run.isPending && (
          <section aria-labelledby="import-preview-heading" className="flex flex-col gap-4">
            <h2 id="import-preview-heading" className="text-2xl text-pine-900">
              Check before importing
            </h2>
            <PreviewSummary preview={preview.data} />
            <CheckboxField label="Show only rows with problems" checked={onlyProblems} onChange={(e) => setOnlyProblems(e.target.checked)} />
            <PreviewTable rows={preview.data.rows} csv={csv} onlyProblems={onlyProblems} />
            <div className="flex flex-wrap items-center gap-3">
              <Button onClick={() => file && run.mutate(file)}>
                {importLabel(preview.data.rows.filter((r) => r.ok && r.visitAction === "create").length)}
              </Button>
              <Button variant="secondary" onClick={startOver}>
                Choose another file
              </Button>
              {preview.data.invalid > 0 && <p className="text-ink-soft">Rows with problems are left out; fix them and upload the whole file again later.</p>}
            </div>
          </section>
        )}

        {run.isPending && <ImportProgress status={status.data} total={preview.data?.total ?? 0} />}
        {run.isError && <ErrorState title="The import stopped" error={run.error} onRetry={() => file && run.mutate(file)} retryLabel="Import again" />}
        {run.data && (
          <>
            <ImportResults result={run.data} preview={preview.data} />
            <Button variant="secondary" className="self-start" onClick={startOver}>
              Import another file
            </Button>
          </>
        )}
      </div>
    </Page>
  );
}

function importLabel(newVisits: number): string {
  if (newVisits === 0) return "Import (nothing new in this file)";
  return `Import ${newVisits} new ${newVisits === 1 ? "visit" : "visits"}`;
}
