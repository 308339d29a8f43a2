import type { ReactNode } from "react";

export interface BreakdownSectionProps {
  id: string;
  title: string;
  /** One sentence with the main finding, so the chart's message is there in words too. */
  summary: ReactNode;
  chart: ReactNode;
  table: ReactNode;
}

/** A heading, the finding in words, the chart and the table behind it. */
export function BreakdownSection({ id, title, summary, chart, table }: BreakdownSectionProps) {
  return (
    <section aria-labelledby={id} className="flex min-w-0 flex-col gap-3">
      <h2 id={id} className="text-2xl text-pine-900">
        {title}
      </h2>
      <p>{summary}</p>
      {chart}
      {table}
    </section>
  );
}
