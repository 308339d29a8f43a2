import { Link } from "react-router-dom";
import type { StaffDayQuestion } from "#shared/schemas/staff-day";
import { waitingTime } from "#shared/ui/index";

/** Open questions, oldest first; overdue ones are marked so they are answered first. */
export function QuestionList({ questions, showAssignee, now }: { questions: StaffDayQuestion[]; showAssignee: boolean; now: Date }) {
  return (
    <ul className="flex flex-col gap-2">
      {questions.map((q) => (
        <li key={q.messageId} className="rounded-xl border border-line bg-surface">
          <Link to={`/questions/${q.planId}`} className="flex flex-col gap-1 p-4 no-underline hover:bg-canvas">
            <span className="flex flex-wrap items-baseline justify-between gap-2">
              <span className="font-semibold text-ink">
                {q.customerName} · {q.street}
              </span>
              {q.overdue ? (
                <span className="rounded-md bg-rust-50 px-2 text-sm font-semibold text-rust-700">Overdue · waiting {waitingTime(q.askedAt, now)}</span>
              ) : (
                <span className="text-sm text-ink-soft">waiting {waitingTime(q.askedAt, now)}</span>
              )}
            </span>
            <span className="line-clamp-2 text-ink [overflow-wrap:anywhere]">{q.text}</span>
            {showAssignee && <span className="text-sm text-ink-soft">{q.assignedToName ? `Taken by ${q.assignedToName}` : "Not taken yet"}</span>}
          </Link>
        </li>
      ))}
    </ul>
  );
}
