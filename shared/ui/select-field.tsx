import type { Ref, SelectHTMLAttributes } from "react";
import { LabelledField, controlBorder, useFieldIds } from "./labelled-field.tsx";

export interface SelectOption {
  value: string;
  label: string;
}

export interface SelectFieldProps extends Omit<SelectHTMLAttributes<HTMLSelectElement>, "size"> {
  label: string;
  hint?: string;
  error?: string;
  options: readonly SelectOption[];
  /** A first option with an empty value, e.g. "Any status". */
  placeholderOption?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled native select (best on phones) that takes react-hook-form's `register()` spread. */
export function SelectField({ label, hint, error, options, placeholderOption, id, className = "", ref, ...select }: SelectFieldProps) {
  const ids = useFieldIds(id, hint, error);
  return (
    <LabelledField ids={ids} label={label} hint={hint} error={error} className={className}>
      <select
        id={ids.controlId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={ids.describedBy}
        className={`min-h-12 w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink ${controlBorder(error)}`}
        {...select}
      >
        {placeholderOption !== undefined && <option value="">{placeholderOption}</option>}
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
    </LabelledField>
  );
}
