import { useId, type ReactNode } from "react";
import { FieldError } from "./field-error.tsx";

export type FieldIds = { controlId: string; hintId?: string; errorId?: string; describedBy?: string };

/** Ids that tie a control to its label, hint and error, so screen readers announce them together. */
export function useFieldIds(id: string | undefined, hint: string | undefined, error: string | undefined): FieldIds {
  const autoId = useId();
  const controlId = id ?? autoId;
  const hintId = hint ? `${controlId}-hint` : undefined;
  const errorId = error ? `${controlId}-error` : undefined;
  return { controlId, hintId, errorId, describedBy: [hintId, errorId].filter(Boolean).join(" ") || undefined };
}

/** Border colour of a form control: red while it has an error. */
export const controlBorder = (error: string | undefined) => (error ? "border-rust-700" : "border-line-strong");

/** Label, optional hint, the control, and the error in place: the frame every field shares. */
export function LabelledField({ ids, label, hint, error, className = "", children }: { ids: FieldIds; label: string; hint?: string; error?: string; className?: string; children: ReactNode }) {
  return (
    <div className={`flex flex-col gap-1 ${className}`}>
      <label htmlFor={ids.controlId} className="font-semibold">
        {label}
      </label>
      {hint && (
        <p id={ids.hintId} className="text-base text-ink-soft">
          {hint}
        </p>
      )}
      {children}
      {error && <FieldError id={ids.errorId} message={error} />}
    </div>
  );
}
