import type { CallbackReport } from "#shared/schemas/callback-report";
import { formatCount, formatHours, formatMoney, formatPercent, formatRate } from "../lib/format.ts";

/** The four numbers a manager looks at first. Each figure has a test id so browser tests can read it. */
export function HeadlineFigures({ report }: { report: CallbackReport }) {
  const { overall, cost, answerTime } = report;
  const had = report.adherence.find((a) => a.group === "had_callback");
  const without = report.adherence.find((a) => a.group === "no_callback");
  return (
    <dl className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
      <Figure
        testId="headline-callback-rate"
        label="Callback rate"
        value={formatRate(overall.ratePer100)}
        detail={`per 100 seeding visits: ${formatCount(overall.callbacks)} callbacks after ${formatCount(overall.seedingVisits)} seeding visits`}
      />
      <Figure
        testId="headline-callback-cost"
        label="Cost of callbacks"
        value={formatMoney(cost.totalCost)}
        detail={`${formatMoney(cost.labourCost)} labor, ${formatMoney(cost.materialsCost)} materials`}
      />
      <Figure
        testId="headline-answer-time"
        label="Median time to first answer"
        value={answerTime ? formatHours(answerTime.medianHours) : "—"}
        detail={answerTime ? `${formatCount(answerTime.answered)} of ${formatCount(answerTime.questions)} questions answered` : "Questions aren't counted yet"}
      />
      <Figure
        testId="headline-adherence"
        label="Steps done: with / without a callback"
        value={`${formatPercent(had?.sharePct ?? null)} / ${formatPercent(without?.sharePct ?? null)}`}
        detail={`of due care-plan steps, ${formatCount(had?.customers ?? 0)} customers with a callback, ${formatCount(without?.customers ?? 0)} without`}
      />
    </dl>
  );
}

function Figure({ testId, label, value, detail }: { testId: string; label: string; value: string; detail: string }) {
  return (
    <div className="flex flex-col rounded-xl border border-line bg-surface p-4" data-testid={testId}>
      <dt className="font-semibold text-ink-soft">{label}</dt>
      <dd className="mt-1 font-heading text-3xl font-bold text-pine-900" data-testid={`${testId}-value`}>
        {value}
      </dd>
      <dd className="mt-1 text-base text-ink-soft">{detail}</dd>
    </div>
  );
}
