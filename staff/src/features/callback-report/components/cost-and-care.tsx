import type { CallbackReport } from "#shared/schemas/callback-report";
import { formatCount, formatHours, formatMoney, formatMonth, formatPercent } from "../lib/format.ts";
import { ReportTable } from "./report-table.tsx";

export function CostBreakdown({ report }: { report: CallbackReport }) {
  const { cost, labourRatePerHour } = report;
  const rows = [
    { item: "Callbacks", value: formatCount(cost.callbacks) },
    { item: "Labor hours", value: formatHours(cost.labourHours) },
    { item: `Labor at ${formatMoney(labourRatePerHour)} an hour`, value: formatMoney(cost.labourCost) },
    { item: "Materials", value: formatMoney(cost.materialsCost) },
    { item: "Total", value: formatMoney(cost.totalCost) },
    { item: "Average per callback", value: cost.averagePerCallback === null ? "—" : formatMoney(cost.averagePerCallback) },
  ];
  return (
    <section aria-labelledby="callback-cost" className="flex min-w-0 flex-col gap-3">
      <h2 id="callback-cost" className="text-2xl text-pine-900">
        Cost of callbacks
      </h2>
      <ReportTable caption="Cost of callbacks, item by item" rows={rows} rowKey={(r) => r.item} columns={[{ header: "Item", cell: (r) => r.item }, { header: "Amount", cell: (r) => r.value, numeric: true }]} empty="" />
    </section>
  );
}

export function AnswerTimes({ report }: { report: CallbackReport }) {
  const answerTime = report.answerTime;
  return (
    <section aria-labelledby="answer-time" className="flex min-w-0 flex-col gap-3">
      <h2 id="answer-time" className="text-2xl text-pine-900">
        Time to first answer
      </h2>
      {answerTime ? (
        <>
          <p>
            {answerTime.answered === 0
              ? "No questions were answered in this range."
              : `Median ${formatHours(answerTime.medianHours)} from a homeowner's question to the first answer.`}{" "}
            {answerTime.unanswered > 0 && `${formatCount(answerTime.unanswered)} of ${formatCount(answerTime.questions)} questions have no answer yet.`}
          </p>
          <ReportTable
            caption="Median time to first answer by month"
            rows={answerTime.byMonth}
            rowKey={(r) => r.month}
            columns={[
              { header: "Month", cell: (r) => formatMonth(r.month) },
              { header: "Answered", cell: (r) => formatCount(r.answered), numeric: true },
              { header: "Median wait", cell: (r) => formatHours(r.medianHours), numeric: true },
            ]}
            empty="No questions in this range."
          />
        </>
      ) : (
        <p className="text-ink-soft">Answer times aren't available yet.</p>
      )}
    </section>
  );
}

const groupLabels = { had_callback: "Had a callback", no_callback: "No callback" } as const;

export function Adherence({ report }: { report: CallbackReport }) {
  return (
    <section aria-labelledby="adherence" className="flex min-w-0 flex-col gap-3">
      <h2 id="adherence" className="text-2xl text-pine-900">
        Care-plan steps done
      </h2>
      <p>Share of due steps the homeowner ticked off, for plans that led to a callback against those that didn't.</p>
      <ReportTable
        caption="Plan adherence with and without a callback"
        rows={report.adherence}
        rowKey={(r) => r.group}
        columns={[
          { header: "Group", cell: (r) => groupLabels[r.group] },
          { header: "Customers", cell: (r) => formatCount(r.customers), numeric: true },
          { header: "Steps done", cell: (r) => `${formatCount(r.stepsDone)} of ${formatCount(r.stepsDue)}`, numeric: true },
          { header: "Share done", cell: (r) => formatPercent(r.sharePct), numeric: true },
        ]}
        empty="No care plans in this range."
      />
    </section>
  );
}
