import type { CustomerDetail } from "#shared/schemas/customers";
import { formatCalendarDay, serviceLabel } from "#shared/ui/index";

type Visit = CustomerDetail["visits"][number];

/** Visits newest first, with who did them and their notes (the application record is inside the notes). */
export function VisitList({ visits, streetOf }: { visits: Visit[]; streetOf: (propertyId: number) => string }) {
  const sorted = [...visits].sort((a, b) => b.visitDate.localeCompare(a.visitDate));
  return (
    <ol className="flex flex-col gap-3">
      {sorted.map((visit) => (
        <li key={visit.id} className="rounded-xl border border-line bg-surface p-4">
          <p className="font-semibold">
            {formatCalendarDay(visit.visitDate, { withYear: true })} · {streetOf(visit.propertyId)}
          </p>
          <p>{visit.services.map(serviceLabel).join(", ")}</p>
          <p className="text-base text-ink-soft">{visit.technicianName ? `By ${visit.technicianName}` : "Technician not recorded"}</p>
          {visit.notes && (
            <details className="mt-1">
              <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-pine-800">Notes</summary>
              <p className="rounded-lg bg-canvas p-3 text-base whitespace-pre-line [overflow-wrap:anywhere]">{visit.notes}</p>
            </details>
          )}
        </li>
      ))}
    </ol>
  );
}
