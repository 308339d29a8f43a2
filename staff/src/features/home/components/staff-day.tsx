import { Link } from "react-router-dom";
import type { StaffDayResponse } from "#shared/schemas/staff-day";
import { formatCalendarDay } from "#shared/ui/index";
import { DaySection } from "./day-section.tsx";
import { QuestionList } from "./question-list.tsx";
import { VisitCard } from "./visit-card.tsx";

/** Visits today and tomorrow, what is overdue, and the open questions of whoever's day it is. */
export function StaffDay({ day, now }: { day: StaffDayResponse; now: Date }) {
  const company = day.scope.kind === "company";
  const overdueQuestions = day.questions.filter((q) => q.overdue).length;
  return (
    <div className="flex flex-col gap-8">
      {day.overdueVisits.length > 0 && (
        <DaySection title="Follow-ups past their day" count={day.overdueVisits.length} empty="">
          <p className="text-ink-soft">Booked for a day that has gone by and not marked done. Do them, move them or close them on the follow-ups page.</p>
          <ul className="flex flex-col gap-3">
            {day.overdueVisits.map((v) => (
              <VisitCard key={v.id} visit={v} showTechnician={company} showDate />
            ))}
          </ul>
        </DaySection>
      )}
      <DaySection title={`Today, ${formatCalendarDay(day.today)}`} count={day.visitsToday.length} empty="No follow-up visits today.">
        <ul className="flex flex-col gap-3">
          {day.visitsToday.map((v) => (
            <VisitCard key={v.id} visit={v} showTechnician={company} showDate={false} />
          ))}
        </ul>
      </DaySection>
      <DaySection title={`Tomorrow, ${formatCalendarDay(day.tomorrow)}`} count={day.visitsTomorrow.length} empty="No follow-up visits tomorrow.">
        <ul className="flex flex-col gap-3">
          {day.visitsTomorrow.map((v) => (
            <VisitCard key={v.id} visit={v} showTechnician={company} showDate={false} />
          ))}
        </ul>
      </DaySection>
      <DaySection
        title={company ? "Open questions" : "Questions you have taken"}
        count={day.questions.length}
        empty={company ? "No open questions." : "None taken. Pick one from the queue."}
      >
        {overdueQuestions > 0 && (
          <p className="font-semibold text-rust-700">
            {overdueQuestions === 1 ? "1 question is" : `${overdueQuestions} questions are`} past the answer target.
          </p>
        )}
        <QuestionList questions={day.questions} showAssignee={company} now={now} />
      </DaySection>
      {!company && (
        <p>
          {day.unassignedQuestions === 0 ? "Every open question has someone on it." : `${day.unassignedQuestions} open ${day.unassignedQuestions === 1 ? "question has" : "questions have"} nobody on them yet. `}
          {day.unassignedQuestions > 0 && (
            <Link to="/questions?show=unassigned" className="font-semibold">
              Go to the queue
            </Link>
          )}
        </p>
      )}
    </div>
  );
}
