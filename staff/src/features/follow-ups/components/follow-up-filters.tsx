import { useId, useState } from "react";
import type { FollowUpListQuery } from "#shared/schemas/follow-ups";
import type { TeamMember } from "#shared/schemas/team";
import { Button, CheckboxField, SelectField, TextField } from "#shared/ui/index";
import { reasonOptions, statusOptions } from "../lib/labels.ts";

export interface FollowUpFiltersProps {
  query: FollowUpListQuery;
  staff: readonly TeamMember[];
  onChange: (changes: Partial<Record<keyof FollowUpListQuery, string | boolean | undefined>>) => void;
  onReset: () => void;
}

/** Filters apply as they change: each is a native control, so they work alike with touch, mouse and keyboard. */
export function FollowUpFilters({ query, staff, onChange, onReset }: FollowUpFiltersProps) {
  const technicians = staff.map((member) => ({ value: String(member.id), label: member.name }));
  const active = [query.status, query.reason, query.technicianId, query.callback, query.from, query.to].filter((v) => v !== undefined).length;
  // Phones start with the filters folded away so the list is in view; wider screens always show them.
  const [shownOnPhone, setShownOnPhone] = useState(false);
  const fieldsId = useId();
  return (
    <section aria-labelledby="follow-up-filters-heading" className="rounded-xl border border-line bg-surface p-4">
      <div className="flex flex-wrap items-center justify-between gap-2">
        <h2 id="follow-up-filters-heading" className="text-xl text-pine-900">
          Filters
        </h2>
        <div className="flex flex-wrap gap-2">
          {active > 0 && (
            <Button variant="quiet" onClick={onReset}>
              Clear filters ({active})
            </Button>
          )}
          <Button variant="secondary" className="md:hidden" aria-expanded={shownOnPhone} aria-controls={fieldsId} onClick={() => setShownOnPhone(!shownOnPhone)}>
            {shownOnPhone ? "Hide" : "Show"}
          </Button>
        </div>
      </div>
      <div id={fieldsId} className={`${shownOnPhone ? "grid" : "hidden"} mt-3 gap-4 sm:grid-cols-2 md:grid lg:grid-cols-3`}>
        <SelectField
          label="Status"
          options={statusOptions}
          placeholderOption="Any status"
          value={query.status ?? ""}
          onChange={(e) => onChange({ status: e.target.value })}
        />
        <SelectField
          label="Reason"
          options={reasonOptions}
          placeholderOption="Any reason"
          value={query.reason ?? ""}
          onChange={(e) => onChange({ reason: e.target.value })}
        />
        <SelectField
          label="Technician"
          options={technicians}
          placeholderOption="Anyone"
          value={query.technicianId ? String(query.technicianId) : ""}
          onChange={(e) => onChange({ technicianId: e.target.value })}
        />
        <TextField label="From" type="date" value={query.from ?? ""} max={query.to} onChange={(e) => onChange({ from: e.target.value })} />
        <TextField label="To" type="date" value={query.to ?? ""} min={query.from} onChange={(e) => onChange({ to: e.target.value })} />
        <CheckboxField
          className="self-end"
          label="Callbacks only"
          checked={query.callback === true}
          onChange={(e) => onChange({ callback: e.target.checked ? true : undefined })}
        />
      </div>
    </section>
  );
}
