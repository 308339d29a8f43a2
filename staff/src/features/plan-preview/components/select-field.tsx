import { useId, type Ref, type SelectHTMLAttributes } from "react";
import { FieldErrorText } from "./field-error-text.tsx";

export interface SelectFieldProps extends SelectHTMLAttributes<HTMLSelectElement> {
  label: string;
  hint?: string;
  error?: string;
  ref?: Ref<HTMLSelectElement>;
}

/** A labelled select that looks like the shared TextField and takes register() directly. */
export function SelectField({ label, hint, error, id, className = "", ref, children, ...select }: SelectFieldProps) {
  const autoId = useId();
  const selectId = id ?? autoId;
  const hintId = hint ? `${selectId}-hint` : undefined;
  const errorId = error ? `${selectId}-error` : undefined;
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={selectId} className="font-semibold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-base text-ink-soft">
          {hint}
        </p>
      )}
      <select
        id={selectId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined}
        className={`min-h-12 w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink ${error ? "border-rust-700" : "border-line-strong"}`}
        {...select}
      >
        {children}
      </select>
      {error && <FieldErrorText id={errorId} message={error} />}
    </div>
  );
}
