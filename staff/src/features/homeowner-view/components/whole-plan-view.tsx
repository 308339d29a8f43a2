import type { StepChange } from "#shared/schemas/homeowner-view";
import type { StoredPlan, StoredStep } from "#shared/schemas/plans";
import { formatCalendarDay } from "#shared/ui/index";
import { StepRow } from "./step-row.tsx";

function byDate(steps: readonly StoredStep[]): [string, StoredStep[]][] {
  const days = new Map<string, StoredStep[]>();
  for (const step of steps) days.set(step.date, [...(days.get(step.date) ?? []), step]);
  return [...days];
}

/** Every step of the plan, day by day, as the homeowner's plan screen lists them. */
export function WholePlanView({ plan, changes, today }: { plan: StoredPlan; changes: Map<number, StepChange>; today: string | null }) {
  const { done, skipped, total } = plan.progress;
  return (
    <div className="flex flex-col gap-4">
      <p>
        <strong>
          {done} of {total} steps done
        </strong>
        {skipped > 0 && <>, {skipped} skipped</>}
        {plan.firstMowDate && <> · first mow {formatCalendarDay(plan.firstMowDate)}</>}
      </p>
      {plan.steps.length === 0 ? (
        <p className="rounded-xl border-2 border-dashed border-line bg-surface p-4 text-ink-soft">This plan has no steps.</p>
      ) : (
        <ol className="flex flex-col gap-5">
          {byDate(plan.steps).map(([date, steps]) => (
            <li key={date} className="flex flex-col gap-2">
              <h4 className="font-semibold text-pine-900">
                {formatCalendarDay(date, { withYear: true })}
                {date === today && <span className="ml-2 rounded-md bg-pine-100 px-2 text-sm">Today</span>}
              </h4>
              <ul className="flex flex-col gap-2">
                {steps.map((s) => (
                  <StepRow key={s.id} step={s} change={changes.get(s.id)} timeZone={plan.timeZone} />
                ))}
              </ul>
            </li>
          ))}
        </ol>
      )}
    </div>
  );
}
