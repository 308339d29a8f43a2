import { useId } from "react";
import { useTranslation } from "react-i18next";
import type { StoredPlan, StoredStep } from "#shared/schemas/plans";
import type { PlanVisit } from "#shared/schemas/follow-ups";
import { VisitOnDay } from "../../../common/components/visit-on-day.tsx";
import { formatDayWithWeekday, formatShortDate } from "../../../common/lib/dates.ts";
import { DayStep } from "./day-step.tsx";

export interface PlanTimelineProps {
  plan: StoredPlan;
  today: string;
  /** The day "Jump to today" lands on: today, or the next day with steps. */
  anchorDate: string | undefined;
  /** Booked and past visits, shown on their dates. */
  visits?: readonly PlanVisit[];
}

type PhaseName = "prep" | "germination" | "establishment" | "maturing";
const phaseNames = new Set<string>(["prep", "germination", "establishment", "maturing"]);

function groupByDate(steps: readonly StoredStep[], visitDates: readonly string[] = []): [string, StoredStep[]][] {
  const days = new Map<string, StoredStep[]>();
  // A visit on a day with nothing else to do still gets its day.
  for (const date of visitDates) days.set(date, []);
  for (const step of steps) days.set(step.date, [...(days.get(step.date) ?? []), step]);
  return [...days.entries()].sort(([a], [b]) => a.localeCompare(b));
}

/** The whole plan, phase by phase and day by day; today stands out and can be jumped to. */
export function PlanTimeline({ plan, today, anchorDate, visits = [] }: PlanTimelineProps) {
  const dated = visits.filter((v): v is PlanVisit & { scheduledFor: string } => v.scheduledFor !== null);
  return (
    <div className="space-y-10">
      {plan.phases.map((phase) => {
        const steps = plan.steps.filter((s) => s.phase === phase.phase);
        if (steps.length === 0) return null;
        const phaseVisits = dated.filter((v) => v.scheduledFor >= phase.start && v.scheduledFor <= phase.end);
        return (
          <PhaseSection
            key={phase.phase}
            phase={phase}
            days={groupByDate(steps, phaseVisits.map((v) => v.scheduledFor))}
            visits={phaseVisits}
            today={today}
            anchorDate={anchorDate}
            cautions={plan.cautions}
          />
        );
      })}
    </div>
  );
}

interface PhaseSectionProps {
  phase: StoredPlan["phases"][number];
  days: [string, StoredStep[]][];
  today: string;
  anchorDate: string | undefined;
  cautions: StoredPlan["cautions"];
  visits: readonly (PlanVisit & { scheduledFor: string })[];
}

function PhaseSection({ phase, days, today, anchorDate, cautions, visits }: PhaseSectionProps) {
  const { t, i18n } = useTranslation();
  const headingId = useId();
  const name = phaseNames.has(phase.phase) ? t(`plan.phase.${phase.phase as PhaseName}`) : phase.phase;
  return (
    <section aria-labelledby={headingId} className="plan-phase">
      <h2 id={headingId} className="text-2xl text-pine-900">
        {name}
      </h2>
      <p className="text-ink-soft">
        {t("plan.phaseDates", { start: formatShortDate(phase.start, i18n.language), end: formatShortDate(phase.end, i18n.language) })}
      </p>
      <ol className="mt-3 space-y-3">
        {days.map(([date, steps]) => {
          const isToday = date === today;
          return (
            <li
              key={date}
              id={date === anchorDate ? "today" : undefined}
              className={`plan-day scroll-mt-4 rounded-xl border-2 bg-surface px-4 py-2 ${isToday ? "border-pine-700 ring-4 ring-pine-100" : "border-line"}`}
              aria-current={isToday ? "date" : undefined}
            >
              <h3 className="flex items-center gap-2 pt-2 text-lg">
                {formatDayWithWeekday(date, i18n.language)}
                {isToday && <span className="rounded-full bg-pine-700 px-2 py-0.5 font-sans text-sm text-white">{t("plan.todayMarker")}</span>}
              </h3>
              <div className="divide-y divide-line">
                {visits.filter((v) => v.scheduledFor === date).map((visit) => (
                  <VisitOnDay key={`visit-${visit.id}`} visit={visit} />
                ))}
                {steps.map((step) => (
                  <DayStep key={step.id} step={step} isPast={date < today} cautions={cautions} />
                ))}
              </div>
            </li>
          );
        })}
      </ol>
    </section>
  );
}
