import type { z } from "zod";
import type { importPreviewResponseSchema, importResultSchema } from "#shared/schemas/visit-import";
import { Notice } from "#shared/ui/index";

type Result = z.infer<typeof importResultSchema>;
type Preview = z.infer<typeof importPreviewResponseSchema>;

/** What the import did; "matched" comes from the preview, which knew which customers already existed. */
export function ImportResults({ result, preview }: { result: Result; preview: Preview | undefined }) {
  const matchedRows = new Set(preview?.rows.filter((r) => r.customerAction === "match").map((r) => r.row) ?? []);
  const created = result.rows.filter((r) => r.outcome === "created");
  const matched = created.filter((r) => matchedRows.has(r.row)).length;
  const skipped = result.alreadyImported + result.duplicates;
  const failedRows = result.rows.filter((r) => r.outcome === "failed");
  const figures = [
    { label: "Created", value: result.created, hint: "visits with their care plans" },
    { label: "Matched", value: matched, hint: "of those for customers we already had" },
    { label: "Skipped", value: skipped, hint: "already imported or repeated in the file" },
    { label: "Failed", value: result.failed, hint: "fix and upload the whole file again", danger: result.failed > 0 },
  ];
  return (
    <section aria-labelledby="import-results-heading" className="flex flex-col gap-4">
      <h2 id="import-results-heading" className="text-2xl text-pine-900">
        Import finished
      </h2>
      <Notice tone={result.failed > 0 ? "warning" : result.created > 0 ? "success" : "info"} title={result.created === 0 ? "Nothing new was created" : undefined}>
        {resultMessage(result)}
      </Notice>
      <dl className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        {figures.map((f) => (
          <div key={f.label} className={`rounded-xl border p-3 ${"danger" in f && f.danger ? "border-rust-700 bg-rust-50" : "border-line bg-surface"}`} data-testid={`import-${f.label.toLowerCase()}`}>
            <dt className="font-semibold">{f.label}</dt>
            <dd className={`font-heading text-3xl font-bold ${"danger" in f && f.danger ? "text-rust-700" : "text-pine-900"}`}>{f.value}</dd>
            <dd className="text-base text-ink-soft">{f.hint}</dd>
          </div>
        ))}
      </dl>
      {failedRows.length > 0 && (
        <div>
          <h3 className="mb-2 text-lg">Rows that failed</h3>
          <ul className="flex flex-col gap-2">
            {failedRows.map((r) => (
              <li key={r.row} className="rounded-lg border-l-4 border-rust-700 bg-rust-50 p-3 text-rust-700">
                <span className="font-semibold">Row {r.row}: </span>
                {Object.entries(r.errors)
                  .map(([column, message]) => (column === "row" ? message : `${column}: ${message}`))
                  .join("; ")}
              </li>
            ))}
          </ul>
        </div>
      )}
    </section>
  );
}

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** The outcome in a sentence or two; a re-import says plainly that nothing was added twice. */
function resultMessage(result: Result): string {
  const parts: string[] = [];
  if (result.created > 0) parts.push(`${plural(result.created, "new visit", "new visits")} created, with ${result.created === 1 ? "its care plan" : "their care plans"}.`);
  const skipped = result.alreadyImported + result.duplicates;
  if (skipped > 0) parts.push(`${plural(skipped, "row was", "rows were")} already imported or repeated in the file, so nothing was added twice.`);
  if (result.failed > 0) parts.push(`${plural(result.failed, "row", "rows")} failed: fix them and upload the whole file again; rows already in are skipped.`);
  return parts.join(" ");
}
