import type { PropertySummary } from "#shared/schemas/properties";

/** The customer's lawns with the facts a plan depends on. */
export function PropertyList({ properties }: { properties: PropertySummary[] }) {
  return (
    <ul className="grid gap-3 md:grid-cols-2">
      {properties.map((p) => (
        <li key={p.id} className="rounded-xl border border-line bg-surface p-4">
          <p className="font-semibold">{p.label}</p>
          <p>
            {p.street}, {p.town}, {p.region} {p.postalCode}
          </p>
          <p className="text-base text-ink-soft">
            {p.lawnAreaFt2 ? `${p.lawnAreaFt2.toLocaleString("en-US")} ft² of lawn` : "Lawn size not recorded"} · {p.timeZone}
          </p>
        </li>
      ))}
    </ul>
  );
}
