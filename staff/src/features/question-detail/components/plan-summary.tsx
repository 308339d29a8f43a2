import { Link } from "react-router-dom";
import type { StoredPlan } from "#shared/schemas/plans";
import { describePlanDay, formatCalendarDay, serviceLabel } from "#shared/ui/index";

/**
 * Where this homeowner is in their plan, in one line a technician can answer from:
 * "day 9 of the germination phase, last watered yesterday, 2 steps skipped".
 */
export function PlanSummary({ plan }: { plan: StoredPlan }) {
  const day = describePlanDay(plan);
  const { done, skipped, total } = plan.progress;
  return (
    <section aria-labelledby="plan-summary-heading" className="rounded-xl border border-line bg-pine-50 p-4 sm:p-5">
      <h2 id="plan-summary-heading" className="text-xl text-pine-900">
        Their care plan today
      </h2>
      <p className="mt-2 text-lg font-semibold first-letter:uppercase" data-testid="plan-day-summary">
        {day.summary}
      </p>
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-base">
        <dt className="font-semibold">Lawn</dt>
        <dd>
          {plan.street} ({plan.propertyLabel})
        </dd>
        <dt className="font-semibold">Visit</dt>
        <dd>
          {formatCalendarDay(plan.visitDate, { withYear: true })}: {plan.services.map(serviceLabel).join(", ")}
        </dd>
        {plan.firstMowDate && (
          <>
            <dt className="font-semibold">First mow</dt>
            <dd>{formatCalendarDay(plan.firstMowDate)}</dd>
          </>
        )}
        <dt className="font-semibold">Steps</dt>
        <dd>
          {done} done, {skipped} skipped, of {total}
        </dd>
      </dl>
      <Link to={`/plans/${plan.id}/as-homeowner`} className="mt-2 inline-flex min-h-11 items-center font-semibold">
        See their Today and plan as they do
      </Link>
    </section>
  );
}
