import { useId, type ReactNode } from "react";

/** A titled list on the home screen with its count, and what to say when it is empty. */
export function DaySection({ title, count, empty, children }: { title: string; count: number; empty: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <h3 id={headingId} className="text-xl text-pine-900">
        {title} <span className="font-sans text-base font-normal text-ink-soft">({count})</span>
      </h3>
      {count === 0 ? <p className="rounded-xl border-2 border-dashed border-line bg-surface p-4 text-ink-soft">{empty}</p> : children}
    </section>
  );
}
