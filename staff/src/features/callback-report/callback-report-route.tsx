import { ErrorState, LoadingState, Notice, Page } from "#shared/ui/index";
import { useCallbackReport } from "./api/get-callback-report.ts";
import { ByMonth, ByReason, ByService, ByTechnician } from "./components/breakdowns.tsx";
import { Adherence, AnswerTimes, CostBreakdown } from "./components/cost-and-care.tsx";
import { HeadlineFigures } from "./components/headline-figures.tsx";
import { RangeForm } from "./components/range-form.tsx";
import { formatDay } from "./lib/format.ts";
import { useReportRange } from "./lib/range.ts";

/** Which services, crews and causes lead to callbacks, what they cost, and how homeowners kept to their plans. */
export function CallbackReportRoute() {
  const [range, setRange] = useReportRange();
  const report = useCallbackReport(range);
  const data = report.data;

  return (
    <Page
      title="Callback report"
      width="wide"
      intro="Callbacks per 100 seeding visits, counted against the seeding visit they came from. Record callbacks on the follow-up visits page and they show here."
    >
      <div className="flex flex-col gap-8">
        <RangeForm range={range} onChange={setRange} />
        {report.isError && <ErrorState title="The report didn't load" error={report.error} onRetry={() => void report.refetch()} retrying={report.isFetching} />}
        {report.isPending && !report.isError && <LoadingState label="Working out the report…" />}
        {data && (
          <div className={`flex flex-col gap-8 transition-opacity ${report.isPlaceholderData ? "opacity-60" : ""}`} aria-busy={report.isPlaceholderData}>
            <p className="text-ink-soft" aria-live="polite">
              Seeding visits from {formatDay(data.range.from)} to {formatDay(data.range.to)}.
            </p>
            <HeadlineFigures report={data} />
            {data.notes.length > 0 && (
              <Notice title="About these figures">
                <ul className="list-disc pl-5">
                  {data.notes.map((note) => (
                    <li key={note}>{note}</li>
                  ))}
                </ul>
              </Notice>
            )}
            <div className="grid gap-8 lg:grid-cols-2">
              <ByTechnician report={data} />
              <ByReason report={data} />
              <ByService report={data} />
              <CostBreakdown report={data} />
            </div>
            <ByMonth report={data} />
            <div className="grid gap-8 lg:grid-cols-2">
              <AnswerTimes report={data} />
              <Adherence report={data} />
            </div>
          </div>
        )}
      </div>
    </Page>
  );
}
