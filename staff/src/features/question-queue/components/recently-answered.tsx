import { Link } from "react-router-dom";
import { EmptyState, ErrorState, LoadingState, SelectField } from "#shared/ui/index";
import { useAnsweredQuestions } from "../api/get-answered-questions.ts";

const stamp = new Intl.DateTimeFormat("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit" });
export const ANSWERED_DAY_CHOICES = [7, 14, 30] as const;

/** What the team answered lately, newest first: for picking up a thread, or checking an answer a colleague gave. */
export function RecentlyAnswered({ days, onDaysChange }: { days: number; onDaysChange: (days: number) => void }) {
  const answered = useAnsweredQuestions(days);
  return (
    <div className="flex flex-col gap-4">
      <SelectField
        label="Answered in the last"
        className="max-w-xs"
        value={String(days)}
        onChange={(e) => onDaysChange(Number(e.target.value))}
        options={ANSWERED_DAY_CHOICES.map((d) => ({ value: String(d), label: `${d} days` }))}
      />
      {answered.isPending && <LoadingState label="Loading answered questions…" />}
      {answered.isError && (
        <ErrorState title="Answered questions didn't load" error={answered.error} onRetry={() => void answered.refetch()} retrying={answered.isRefetching} />
      )}
      {answered.data && answered.data.questions.length === 0 && (
        <EmptyState title={`Nothing answered in the last ${answered.data.days} days`}>
          <p>Answers the team gives show up here, newest first.</p>
        </EmptyState>
      )}
      {answered.data && answered.data.questions.length > 0 && (
        <>
          <p role="status" className="text-ink-soft">
            {answered.data.questions.length} answered in the last {answered.data.days} days, newest first
          </p>
          <ul className="flex flex-col gap-3">
            {answered.data.questions.map((q) => (
              <li key={q.messageId} className="rounded-xl border border-line bg-surface">
                <Link to={`/questions/${q.planId}`} className="flex flex-col gap-1 p-4 text-ink no-underline hover:bg-canvas">
                  <span className="flex flex-wrap items-baseline justify-between gap-2">
                    <span className="font-semibold">
                      {q.customerName} · {q.street}
                    </span>
                    <span className="text-sm text-ink-soft">{q.resolved ? "Closed" : "Still open"}</span>
                  </span>
                  <span className="line-clamp-2 [overflow-wrap:anywhere]">“{q.text}”</span>
                  <span className="line-clamp-2 text-ink-soft [overflow-wrap:anywhere]">
                    <strong className="text-ink">{q.answeredByName ?? "A former colleague"}</strong> answered{" "}
                    <time dateTime={q.answeredAt}>{stamp.format(new Date(q.answeredAt))}</time>: {q.answerText}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
        </>
      )}
    </div>
  );
}
