import { useId, type InputHTMLAttributes, type Ref } from "react";

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
  const autoId = useId();
  const inputId = id ?? autoId;
  const hintId = hint ? `${inputId}-hint` : undefined;
  const errorId = error ? `${inputId}-error` : undefined;
  const describedBy = [hintId, errorId].filter(Boolean).join(" ") || undefined;

  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={inputId} className="font-semibold">
        {label}
      </label>
      {hint && (
        <p id={hintId} className="text-ink-soft text-base">
          {hint}
        </p>
      )}
      <input
        id={inputId}
        ref={ref}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        // 18px text keeps mobile browsers from zooming in on focus.
        className={
          "min-h-12 w-full rounded-lg border-2 bg-surface px-3 py-2 text-lg text-ink " +
          (error ? "border-rust-700" : "border-line-strong")
        }
        {...input}
      />
      {error && (
        <p id={errorId} className="flex items-start gap-1 font-semibold text-rust-700">
          <span aria-hidden="true">⚠</span>
          {error}
        </p>
      )}
    </div>
  );
}
