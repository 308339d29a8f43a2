import type { CustomerVisit } from "#shared/schemas/customers";
import { formatCalendarDay, serviceLabel } from "#shared/ui/index";

type Conditions = NonNullable<CustomerVisit["conditions"]>;
type ApplicationRecord = NonNullable<CustomerVisit["applicationRecord"]>;

const windText = ({ windMph, windDirection }: Pick<Conditions, "windMph" | "windDirection">): string | null => {
  if (windDirection === "calm") return "calm";
  const parts = [windMph !== undefined && `${windMph} mph`, windDirection && (windDirection === "variable" ? "variable" : `from ${windDirection}`)].filter(Boolean);
  return parts.length ? parts.join(" ") : null;
};

function conditionsText(c: Conditions): string | null {
  const parts = [c.temperatureF !== undefined && `${c.temperatureF} °F`, windText(c) && `wind ${windText(c)}`].filter(Boolean);
  return parts.length ? parts.join(", ") : null;
}

/** The record a regulator asks for, as it was logged. */
function ApplicationRecordDetails({ record }: { record: ApplicationRecord }) {
  const rows: [string, string | undefined][] = [
    ["Product", record.product],
    ["EPA registration no.", record.epaRegistrationNumber],
    ["State registration no.", record.stateRegistrationNumber],
    ["Rate", `${record.rate.amount} ${record.rate.unit}`],
    ["Area treated", `${record.areaTreated.toLocaleString("en-US")} ft²`],
    ["Target pest or weed", record.targetPest],
    ["Applicator", record.applicatorName],
    ["Applicator licence no.", record.applicatorLicenceNumber],
    ["Wind", windText(record) ?? undefined],
    ["Temperature", record.temperatureF !== undefined ? `${record.temperatureF} °F` : undefined],
    ["Applied at", record.appliedAt ? new Date(record.appliedAt).toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" }) : undefined],
  ];
  return (
    <details className="mt-1">
      <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-pine-800">Regulated application record</summary>
      <dl className="grid gap-x-4 gap-y-1 rounded-lg bg-canvas p-3 text-base sm:grid-cols-[auto_1fr]">
        {rows
          .filter(([, value]) => value)
          .map(([label, value]) => (
            <div key={label} className="contents">
              <dt className="font-semibold">{label}</dt>
              <dd className="[overflow-wrap:anywhere]">{value}</dd>
            </div>
          ))}
      </dl>
      <p className="mt-1 text-sm text-ink-soft">The product label and your state's rules govern the application; this is the record as logged.</p>
    </details>
  );
}

/** Visits newest first, with who did them, the conditions, the regulated-application record and the notes. */
export function VisitList({ visits, streetOf }: { visits: CustomerVisit[]; streetOf: (propertyId: number) => string }) {
  const sorted = [...visits].sort((a, b) => b.visitDate.localeCompare(a.visitDate));
  return (
    <ol className="flex flex-col gap-3">
      {sorted.map((visit) => {
        const conditions = visit.conditions && conditionsText(visit.conditions);
        return (
          <li key={visit.id} className="rounded-xl border border-line bg-surface p-4">
            <p className="font-semibold">
              {formatCalendarDay(visit.visitDate, { withYear: true })} · {streetOf(visit.propertyId)}
            </p>
            <p>{visit.services.map(serviceLabel).join(", ")}</p>
            <p className="text-base text-ink-soft">{visit.technicianName ? `By ${visit.technicianName}` : "Technician not recorded"}</p>
            {conditions && <p className="text-base">Conditions: {conditions}</p>}
            {visit.applicationRecord && <ApplicationRecordDetails record={visit.applicationRecord} />}
            {visit.notes && (
              <details className="mt-1">
                <summary className="inline-flex min-h-11 cursor-pointer items-center font-semibold text-pine-800">Notes</summary>
                <p className="rounded-lg bg-canvas p-3 text-base whitespace-pre-line [overflow-wrap:anywhere]">{visit.notes}</p>
              </details>
            )}
          </li>
        );
      })}
    </ol>
  );
}
