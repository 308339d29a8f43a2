import { Link } from "react-router-dom";
import type { PlanHeader } from "#shared/schemas/plans";
import { formatCalendarDay, serviceLabel } from "#shared/ui/index";
import { PlanWarningsPanel } from "./plan-warnings-panel.tsx";

/** One care plan with how far the homeowner has got: done, skipped, still to do. */
export function PlanCard({ plan }: { plan: PlanHeader }) {
  const { done, skipped, total } = plan.progress;
  const pct = (n: number) => (total > 0 ? (n / total) * 100 : 0);
  return (
    <article id={`plan-${plan.id}`} tabIndex={-1} className="flex flex-col gap-2 rounded-xl border border-line bg-surface p-4 focus:outline-3 focus:outline-focus">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="text-lg">
          {plan.street} <span className="font-sans text-base font-normal text-ink-soft">({plan.propertyLabel})</span>
        </h3>
        <span className={`rounded-md px-2 text-sm font-semibold ${plan.status === "active" ? "bg-pine-100 text-pine-900" : "bg-loam-100 text-loam-700"}`}>
          {plan.status === "active" ? "Active" : "Cancelled"}
        </span>
      </div>
      <p>
        Visit {formatCalendarDay(plan.visitDate, { withYear: true })}: {plan.services.map(serviceLabel).join(", ")}
      </p>
      <div aria-hidden="true" className="flex h-3 overflow-hidden rounded-full bg-canvas ring-1 ring-line-strong">
        <div className="bg-pine-700" style={{ width: `${pct(done)}%` }} />
        <div className="bg-straw-800" style={{ width: `${pct(skipped)}%` }} />
      </div>
      <p className="text-base">
        <strong>
          {done} of {total} steps done
        </strong>
        {skipped > 0 && <>, {skipped} skipped</>} · program version {plan.programVersion}
      </p>
      <PlanWarningsPanel planId={plan.id} />
      <div className="flex flex-wrap gap-x-5">
        <Link to={`/plans/${plan.id}/as-homeowner`} className="inline-flex min-h-11 items-center font-semibold">
          See it as the homeowner does
        </Link>
        <Link to={`/questions/${plan.id}`} className="inline-flex min-h-11 items-center font-semibold">
          Questions and answers on this plan
        </Link>
      </div>
    </article>
  );
}
