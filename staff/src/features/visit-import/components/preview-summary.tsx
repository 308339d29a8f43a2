import type { z } from "zod";
import type { importPreviewResponseSchema } from "#shared/schemas/visit-import";

type Preview = z.infer<typeof importPreviewResponseSchema>;

/** What importing this file would do, counted before anything is written. */
export function PreviewSummary({ preview }: { preview: Preview }) {
  const count = (test: (r: Preview["rows"][number]) => boolean) => preview.rows.filter(test).length;
  const figures = [
    { label: "Rows", value: preview.total },
    { label: "New visits", value: count((r) => r.ok && r.visitAction === "create") },
    { label: "New customers", value: count((r) => r.ok && r.visitAction === "create" && r.customerAction === "create") },
    { label: "Already imported", value: count((r) => r.visitAction === "already_imported") },
    { label: "Repeated in file", value: count((r) => r.visitAction === "duplicate_in_file") },
    { label: "With problems", value: preview.invalid, danger: preview.invalid > 0 },
  ];
  return (
    <dl className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-6">
      {figures.map((f) => (
        <div key={f.label} className={`rounded-xl border p-3 ${f.danger ? "border-rust-700 bg-rust-50 text-rust-700" : "border-line bg-surface"}`}>
          <dt className="text-base font-semibold">{f.label}</dt>
          <dd className="font-heading text-2xl font-bold">{f.value}</dd>
        </div>
      ))}
    </dl>
  );
}
