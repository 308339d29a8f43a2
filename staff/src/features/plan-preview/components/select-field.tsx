import type { Ref, SelectHTMLAttributes } from "react";
import { LabelledField, controlBorder, useFieldIds } from "#shared/ui/index";

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled select that looks like the shared TextField and takes register() directly. */
export function SelectField({ label, hint, error, id, className = "", ref, children, ...select }: SelectFieldProps) {
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
        {children}
      </select>
    </LabelledField>
  );
}
