import type { ReactNode } from "react";

/** One boxed part of the form ("The visit", "Seed", …) as a fieldset, so its inputs are grouped for screen readers. */
export function FormSection({ legend, children }: { legend: string; children: ReactNode }) {
  return (
    <fieldset className="flex flex-col gap-4 rounded-xl border border-line bg-surface p-4 sm:p-5">
      <legend className="px-1 font-heading text-xl font-bold text-pine-900">{legend}</legend>
      {children}
    </fieldset>
  );
}
