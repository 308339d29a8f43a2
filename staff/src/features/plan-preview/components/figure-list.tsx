import type { ReactNode } from "react";

/** A short list of labelled figures; on a phone each label sits above its value. */
export function FigureList({ items }: { items: readonly { label: string; value: ReactNode }[] }) {
  return (
    <dl className="grid gap-x-4 gap-y-1 sm:grid-cols-[minmax(0,1fr)_auto]">
      {items.map(({ label, value }) => (
        <div key={label} className="contents">
          <dt className="text-ink-soft">{label}</dt>
          <dd className="mb-2 font-semibold tabular-nums sm:mb-0 sm:text-right">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
