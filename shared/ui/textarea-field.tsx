import type { Ref, TextareaHTMLAttributes } from "react";
import { LabelledField, controlBorder, useFieldIds } from "./labelled-field.tsx";

export interface TextAreaFieldProps extends TextareaHTMLAttributes<HTMLTextAreaElement> {
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLTextAreaElement>;
}

/** A labelled multi-line input for notes, for react-hook-form's `register()`. */
export function TextAreaField({ label, hint, error, id, className = "", rows = 3, ref, ...textarea }: TextAreaFieldProps) {
  const ids = useFieldIds(id, hint, error);
  return (
    <LabelledField ids={ids} label={label} hint={hint} error={error} className={className}>
      <textarea
        id={ids.controlId}
        ref={ref}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={ids.describedBy}
        className={`w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink ${controlBorder(error)}`}
        {...textarea}
      />
    </LabelledField>
  );
}
