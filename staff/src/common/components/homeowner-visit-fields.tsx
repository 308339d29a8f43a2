import type { ComponentProps } from "react";
import { customerPrepSuggestions, type FollowUpReason } from "#shared/schemas/follow-ups";
import { TextAreaField, TextField } from "#shared/ui/index";

type InputProps = Omit<ComponentProps<typeof TextField>, "label">;
type AreaProps = Omit<ComponentProps<typeof TextAreaField>, "label">;

export interface HomeownerVisitFieldsProps {
  start: InputProps;
  end: InputProps;
  prep: AreaProps;
  /** Suggestions follow the reason; none until one is picked. */
  reason: FollowUpReason | "" | undefined;
  onSuggest: (text: string) => void;
  disabled?: boolean;
}

/**
 * What the homeowner is told about a booked visit: when the crew arrives and what to do before.
 * Shared by booking from a question and the follow-ups page, so both ask the same way.
 */
export function HomeownerVisitFields({ start, end, prep, reason, onSuggest, disabled }: HomeownerVisitFieldsProps) {
  const suggestions = reason ? customerPrepSuggestions[reason] : [];
  return (
    <fieldset className="flex flex-col gap-4 rounded-lg border-2 border-line p-4">
      <legend className="px-1 font-heading text-lg font-bold text-pine-900">What the homeowner sees</legend>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Arriving from" type="time" step={900} disabled={disabled} {...start} />
        <TextField label="Arriving by" type="time" step={900} disabled={disabled} {...end} />
      </div>
      <TextAreaField
        label="Before the visit, please… (optional)"
        hint="Shown on the homeowner's Today screen and in their calendar."
        rows={2}
        maxLength={500}
        disabled={disabled}
        {...prep}
      />
      {suggestions.length > 0 && !disabled && (
        <div>
          <p className="text-base text-ink-soft">Suggestions for this reason:</p>
          <ul className="mt-1 flex flex-wrap gap-2">
            {suggestions.map((text) => (
              <li key={text}>
                <button
                  type="button"
                  className="min-h-11 rounded-full border-2 border-pine-700 px-3 py-1 text-left text-base font-semibold text-pine-900 hover:bg-pine-100 focus-visible:outline-3"
                  onClick={() => onSuggest(text)}
                >
                  {text}
                </button>
              </li>
            ))}
          </ul>
        </div>
      )}
    </fieldset>
  );
}
