import { FieldError } from "#shared/ui/index";
import type { ReactNode } from "react";

export interface CheckboxGroupProps {
  id: string;
  legend: string;
  hint?: string;
  error?: string;
  children: ReactNode;
}

/** A fieldset of ticks with its legend, hint and one error for the whole group. */
export function CheckboxGroup({ id, legend, hint, error, children }: CheckboxGroupProps) {
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  return (
    <fieldset id={id} tabIndex={-1} aria-describedby={[hintId, errorId].filter(Boolean).join(" ") || undefined} className="flex flex-col gap-1">
      <legend className="font-semibold">{legend}</legend>
      {hint && (
        <p id={hintId} className="text-base text-ink-soft">
          {hint}
        </p>
      )}
      <div className="grid gap-x-4 sm:grid-cols-2">{children}</div>
      {error && <FieldError id={errorId} message={error} />}
    </fieldset>
  );
}
