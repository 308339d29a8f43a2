import { useId, type ReactNode } from "react";

/** A titled part of the customer page, with what to say when it has nothing in it. */
export function Section({ title, count, empty, children }: { title: string; count: number; empty: string; children: ReactNode }) {
  const headingId = useId();
  return (
    <section aria-labelledby={headingId} className="flex flex-col gap-3">
      <h2 id={headingId} className="text-2xl text-pine-900">
        {title} <span className="font-sans text-lg font-normal text-ink-soft">({count})</span>
      </h2>
      {count === 0 ? <p className="rounded-xl border-2 border-dashed border-line bg-surface p-4 text-ink-soft">{empty}</p> : children}
    </section>
  );
}
