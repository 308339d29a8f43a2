import type { Place } from "#shared/schemas/place-rules";
import { Button } from "#shared/ui/index";
import { blackoutsText, phosphorusText, wateringText, whereText } from "../lib/describe.ts";

export interface PlaceCardProps {
  place: Place;
  /** Absent for technicians, who read the rules only. */
  onEdit?: () => void;
  onDelete?: () => void;
}

export function PlaceCard({ place, onEdit, onDelete }: PlaceCardProps) {
  const headingId = `place-${place.id}`;
  return (
    <li aria-labelledby={headingId} className="flex flex-col gap-2 rounded-xl border border-line bg-surface p-4">
      <div className="flex flex-wrap items-baseline gap-2">
        <h2 id={headingId} className="text-xl text-pine-900">
          {place.name}
        </h2>
        {place.isExample && <span className="rounded-full bg-straw-50 px-2 py-0.5 text-base font-semibold text-straw-800">Example</span>}
      </div>
      <p className="text-ink-soft">{whereText(place)}</p>
      <ul className="flex list-disc flex-col gap-0.5 pl-5">
        <li>{blackoutsText(place)}</li>
        <li>{phosphorusText(place)}</li>
        <li>{wateringText(place)}</li>
      </ul>
      {(onEdit || onDelete) && (
        <div className="flex flex-wrap gap-2">
          {onEdit && (
            <Button variant="secondary" onClick={onEdit} aria-label={`Edit ${place.name}`}>
              Edit
            </Button>
          )}
          {onDelete && (
            <Button variant="quiet" onClick={onDelete} aria-label={`Delete ${place.name}`}>
              Delete
            </Button>
          )}
        </div>
      )}
    </li>
  );
}
