import type { CautionId, Phase, Plan, PlanStep } from "#shared/engine/index";
import { PHASE_LABELS } from "../lib/labels.ts";
import { formatDay, formatDayRange } from "../lib/local-dates.ts";
import { StepWhy } from "./step-why.tsx";

const PHASE_ORDER: readonly Phase[] = ["prep", "germination", "establishment", "maturing"];

interface Day {
  date: string;
  steps: PlanStep[];
}

/** Steps of one phase, one entry per calendar day, in date order. */
function daysOf(steps: readonly PlanStep[]): Day[] {
  const byDate = new Map<string, PlanStep[]>();
  for (const step of steps) byDate.set(step.date, [...(byDate.get(step.date) ?? []), step]);
  return [...byDate.entries()].sort(([a], [b]) => a.localeCompare(b)).map(([date, daySteps]) => ({ date, steps: daySteps }));
}

/** The care plan day by day, grouped by phase (before the visit, germination, establishment, maturing). */
export function PlanTimeline({ plan, cautionTexts }: { plan: Plan; cautionTexts: ReadonlyMap<CautionId, string> }) {
  const allSteps = [...plan.prepSteps, ...plan.steps];
  const phases = PHASE_ORDER.map((phase) => ({
    phase,
    range: plan.meta.phases.find((p) => p.phase === phase),
    days: daysOf(allSteps.filter((step) => step.phase === phase)),
  })).filter((group) => group.days.length > 0);

  return (
    <section aria-labelledby="plan-timeline-heading" className="flex flex-col gap-4">
      <h3 id="plan-timeline-heading" className="text-xl text-pine-900">
        Day by day
      </h3>
      {phases.length === 0 && <p className="text-ink-soft">This visit needs no follow-up steps.</p>}
      {phases.map(({ phase, range, days }) => (
        <section key={phase} aria-labelledby={`plan-phase-${phase}`} className="flex flex-col gap-2">
          <h4 id={`plan-phase-${phase}`} className="sticky top-0 z-10 border-b-2 border-pine-700 bg-canvas py-1 font-heading text-lg font-bold text-pine-900">
            {PHASE_LABELS[phase]}
            {range && <span className="ml-2 text-base font-normal text-ink-soft">{formatDayRange(range.start, range.end)}</span>}
          </h4>
          <ol className="flex flex-col gap-3">
            {days.map((day) => (
              <li key={day.date} className="grid gap-x-3 sm:grid-cols-[6.5rem_minmax(0,1fr)]">
                <p className="font-semibold text-loam-700">{formatDay(day.date)}</p>
                <ul className="flex flex-col gap-2">
                  {day.steps.map((step) => (
                    <li key={step.key} data-testid="plan-step" className="rounded-lg border border-line bg-surface p-3">
                      <p className="font-semibold">{step.title}</p>
                      {step.times && step.times.length > 0 && (
                        <p className="text-pine-800">
                          Start at <span className="font-semibold tabular-nums">{step.times.join(", ")}</span>
                        </p>
                      )}
                      <p className="text-base">{step.detail}</p>
                      <StepWhy stepTitle={`${formatDay(step.date)}: ${step.title}`} why={step.why} cautionIds={step.cautions} cautionTexts={cautionTexts} />
                    </li>
                  ))}
                </ul>
              </li>
            ))}
          </ol>
        </section>
      ))}
    </section>
  );
}
