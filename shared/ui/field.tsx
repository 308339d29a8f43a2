import type { InputHTMLAttributes, Ref } from "react";
import { LabelledField, controlBorder, useFieldIds } from "./labelled-field.tsx";

export interface TextFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "size"> {
  label: string;
  /** Help shown under the label, read out with the input. */
  hint?: string;
  /** The error for this field, shown in place and announced with the input. */
  error?: string;
  ref?: Ref<HTMLInputElement>;
}

/** A labelled text input that takes react-hook-form's `register()` spread directly. */
export function TextField({ label, hint, error, id, className = "", ref, ...input }: TextFieldProps) {
  const ids = useFieldIds(id, hint, error);
  return (
    <LabelledField ids={ids} label={label} hint={hint} error={error} className={className}>
      <input
        id={ids.controlId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={ids.describedBy}
        // 18px text keeps mobile browsers from zooming in on focus.
        className={`min-h-12 w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink ${controlBorder(error)}`}
        {...input}
      />
    </LabelledField>
  );
}
