import type { QueueRow } from "../lib/queue-rows.ts";
import { AnswerState, AssignButton, Assignee, PhotoCount, PhotoThumb, PlanDayText, QuestionExcerpt, QuestionLink, Waiting } from "./queue-cells.tsx";

/** The queue on a phone: one card per question, the same facts as the table. */
export function QueueCards({ rows, now }: { rows: QueueRow[]; now: Date }) {
  return (
    <ol className="flex flex-col gap-3" aria-label="Open questions: waiting for an answer first, then oldest waiting first">
      {rows.map((row) => (
        <li key={row.question.messageId} className="rounded-xl border border-line bg-surface p-4">
          <div className="flex gap-3">
            <div className="min-w-0 flex-1">
              <QuestionLink row={row} />
              <p>{row.question.street}</p>
            </div>
            <PhotoThumb row={row} />
          </div>
          <p className="text-base">
            <AnswerState row={row} /> · <Waiting row={row} now={now} label="Waiting " />
          </p>
          <p className="text-base">
            <PlanDayText row={row} /> · <PhotoCount row={row} />
          </p>
          <p className="mt-1 text-base">
            <QuestionExcerpt row={row} />
          </p>
          <div className="mt-2 flex flex-wrap items-center justify-between gap-2">
            <span>
              Assigned to: <Assignee row={row} />
            </span>
            <AssignButton row={row} />
          </div>
        </li>
      ))}
    </ol>
  );
}
