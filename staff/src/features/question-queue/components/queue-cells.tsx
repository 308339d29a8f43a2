import { Link } from "react-router-dom";
import { errorMessage, useSignedInUser, waitingTime } from "#shared/ui/index";
import { useAssignQuestion } from "../../../common/api/assign-question.ts";
import type { QueueRow } from "../lib/queue-rows.ts";

const askedFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });

/** The customer's name as the link to the question: the row's one tab stop. */
export function QuestionLink({ row }: { row: QueueRow }) {
  return (
    <Link to={`/questions/${row.question.planId}`} className="inline-flex min-h-11 items-center font-semibold" data-testid="queue-question-link">
      {row.question.customerName}
    </Link>
  );
}

/** "3 h" and, past the company's answer target, an "Overdue" mark that doesn't rely on colour. */
export function Waiting({ row, now, label = "" }: { row: QueueRow; now: Date; label?: string }) {
  const asked = new Date(row.question.askedAt);
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      <time dateTime={row.question.askedAt} title={`Asked ${askedFormat.format(asked)}`}>
        {label}
        {waitingTime(row.question.askedAt, now)}
      </time>
      {row.question.overdue && <span className="rounded-md bg-rust-50 px-2 text-sm font-bold text-rust-700">Overdue</span>}
    </span>
  );
}

export function PlanDayText({ row }: { row: QueueRow }) {
  return <span>{row.planDayText}</span>;
}

/** Whether someone has replied since the question: answered ones still wait to be marked resolved. */
export function AnswerState({ row }: { row: QueueRow }) {
  return row.answered ? (
    <span className="text-ink-soft">Answered, still open</span>
  ) : (
    <span className="font-semibold text-pine-900">Waiting for an answer</span>
  );
}

export function Assignee({ row }: { row: QueueRow }) {
  return row.question.assignedToName ? <span>{row.question.assignedToName}</span> : <span className="text-ink-soft">Unassigned</span>;
}

/** "Assign to me", or "Unassign" on the signed-in person's own question; shown at once, undone if refused. */
export function AssignButton({ row }: { row: QueueRow }) {
  const user = useSignedInUser();
  const assign = useAssignQuestion();
  const mine = row.question.assignedToId === user.id;
  const about = <span className="sr-only">: {row.question.customerName}'s question</span>;
  return (
    <span className="inline-flex flex-col gap-1">
      <button
        type="button"
        disabled={assign.isPending}
        aria-busy={assign.isPending || undefined}
        onClick={() => assign.mutate({ messageId: row.question.messageId, userId: mine ? null : user.id, userName: mine ? null : user.name })}
        className="inline-flex min-h-11 items-center rounded-lg border-2 border-pine-700 bg-surface px-3 font-semibold whitespace-nowrap text-pine-700 hover:bg-pine-50 disabled:opacity-60"
      >
        {mine ? "Unassign" : "Assign to me"}
        {about}
      </button>
      {assign.isError && (
        <span role="alert" className="text-sm text-rust-700">
          {errorMessage(assign.error)}
        </span>
      )}
    </span>
  );
}

export function PhotoCount({ row }: { row: QueueRow }) {
  const n = row.question.photoCount;
  return <span className="whitespace-nowrap">{n === 0 ? "No photos" : n === 1 ? "1 photo" : `${n} photos`}</span>;
}

/** The first photo, small, so a glance down the queue shows which lawns look worst. Decorative: the count says it in words. */
export function PhotoThumb({ row }: { row: QueueRow }) {
  if (!row.question.thumbUrl) return null;
  return <img src={row.question.thumbUrl} alt="" loading="lazy" className="h-12 w-16 shrink-0 rounded-md border border-line object-cover" />;
}

/** The question's first line, cut short: enough to triage without opening it. */
export function QuestionExcerpt({ row }: { row: QueueRow }) {
  const text = row.question.text.replace(/\s+/g, " ").trim();
  return <span className="text-ink-soft">{text.length > 90 ? `${text.slice(0, 89)}…` : text}</span>;
}
