import type { StepChange } from "#shared/schemas/homeowner-view";
import type { TodayResponse } from "#shared/schemas/plans";
import { formatCalendarDay } from "#shared/ui/index";
import { StepRow } from "./step-row.tsx";

/** The homeowner's Today: the day's steps, what to hold off on, and what comes next. */
export function TodayView({ today, changes }: { today: TodayResponse; changes: Map<number, StepChange> }) {
  return (
    <div className="flex flex-col gap-4">
      <p className="font-semibold">
        {formatCalendarDay(today.today, { withYear: true })} at the lawn · {today.plan.street}
      </p>
      {today.steps.length === 0 ? (
        <p className="rounded-xl border-2 border-dashed border-line bg-surface p-4 text-ink-soft">Nothing to do on the lawn today.</p>
      ) : (
        <ul className="flex flex-col gap-3">
          {today.steps.map((s) => (
            <StepRow key={s.id} step={s} change={changes.get(s.id)} timeZone={today.plan.timeZone} />
          ))}
        </ul>
      )}
      {today.activeHoldOffs.length > 0 && (
        <div className="flex flex-col gap-2">
          <h4 className="text-lg font-semibold">Hold off for now</h4>
          <ul className="flex flex-col gap-2">
            {today.activeHoldOffs.map((h) => (
              <li key={`${h.kind}-${h.start}`} className="rounded-xl border border-line bg-surface p-4">
                <p className="font-semibold">
                  {h.kind.replaceAll("_", " ")} until {formatCalendarDay(h.end)}
                </p>
                <p>{h.why}</p>
              </li>
            ))}
          </ul>
        </div>
      )}
      {today.nextMilestone && (
        <p>
          <span className="font-semibold">Coming up:</span> {today.nextMilestone.title} on {formatCalendarDay(today.nextMilestone.date)}
        </p>
      )}
    </div>
  );
}
