import type { ReactNode } from "react";

/** One boxed part of the form as a fieldset, so its inputs are grouped for screen readers. */
export function FormSection({ legend, hint, children }: { legend: string; hint?: ReactNode; children: ReactNode }) {
  return (
    <fieldset className="flex min-w-0 flex-col gap-4 rounded-xl border border-line bg-surface p-4 sm:p-5">
      <legend className="px-1 font-heading text-xl font-bold text-pine-900">{legend}</legend>
      {hint && <div className="-mt-2 text-ink-soft">{hint}</div>}
      {children}
    </fieldset>
  );
}
