import { SelectField, serviceLabel } from "#shared/ui/index";
import { QUEUE_FILTERS, QUEUE_FILTER_LABELS, type QueueFilter } from "../lib/queue-rows.ts";

export interface QueueFiltersProps {
  filter: QueueFilter;
  service: string | null;
  filterCounts: Record<QueueFilter, number>;
  serviceCounts: Map<string, number>;
  onFilterChange: (filter: QueueFilter) => void;
  onServiceChange: (service: string | null) => void;
}

/** Filter buttons with their counts, and the service type; both live in the address so Back works. */
export function QueueFilters({ filter, service, filterCounts, serviceCounts, onFilterChange, onServiceChange }: QueueFiltersProps) {
  const services = [...serviceCounts.keys()].sort((a, b) => serviceLabel(a).localeCompare(serviceLabel(b)));
  if (service && !serviceCounts.has(service)) services.unshift(service);
  return (
    <div className="flex flex-col gap-4 md:flex-row md:items-end md:justify-between">
      <div role="group" aria-label="Show questions" className="grid grid-cols-2 gap-2 sm:flex sm:flex-wrap">
        {QUEUE_FILTERS.map((f) => (
          <button
            key={f}
            type="button"
            aria-pressed={filter === f}
            onClick={() => onFilterChange(f)}
            className="inline-flex min-h-11 items-center justify-between gap-2 rounded-lg border-2 border-pine-700 bg-surface px-4 font-semibold text-pine-700 hover:bg-pine-50 aria-pressed:bg-pine-700 aria-pressed:text-white"
          >
            {QUEUE_FILTER_LABELS[f]}
            <span className="rounded-full bg-pine-100 px-2 text-sm text-pine-900">{filterCounts[f]}</span>
          </button>
        ))}
      </div>
      <SelectField
        label="Service type"
        className="md:w-72"
        value={service ?? ""}
        onChange={(event) => onServiceChange(event.target.value || null)}
        placeholderOption="Any service type"
        options={services.map((s) => ({ value: s, label: `${serviceLabel(s)} (${serviceCounts.get(s) ?? 0})` }))}
      />
    </div>
  );
}
