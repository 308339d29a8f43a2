import { daysBetween, isValidIsoDate } from "#shared/engine/dates";
import type { StoredPlan } from "#shared/schemas/plans";
import { relativeDay, todayInZone } from "./calendar-days.ts";

const phaseNames: Record<string, string> = {
  prep: "preparation",
  germination: "germination",
  establishment: "establishment",
  maturing: "maturing",
};

export interface PlanDay {
  /** The lawn's today (YYYY-MM-DD) in the plan's time zone. */
  today: string;
  /** Days since the visit, counting the visit day as day 1; null before the visit. */
  dayOfPlan: number | null;
  /** "day 9 of the germination phase", "2 days before the visit", "plan ended 3 days ago". */
  where: string;
  /** "last watered yesterday", or null when the plan has no watering due yet. */
  watering: string | null;
  skipped: number;
  /** The whole line: "day 9 of the germination phase, last watered yesterday, 2 steps skipped". */
  summary: string;
}

type PlanForDay = Pick<StoredPlan, "timeZone" | "visitDate" | "phases" | "steps">;

/**
 * Where a homeowner is in their care plan, for a technician answering a question.
 * Computed on the lawn's own calendar (the plan's zone), never the reader's.
 */
export function describePlanDay(plan: PlanForDay, now: Date = new Date()): PlanDay {
  const today = todayInZone(plan.timeZone, now);
  const dayOfPlan = isValidIsoDate(plan.visitDate) && plan.visitDate <= today ? daysBetween(plan.visitDate, today) + 1 : null;
  const where = describePhase(plan, today);
  const watering = describeWatering(plan, today);
  const skipped = plan.steps.filter((step) => step.state === "skipped").length;
  const parts = [where, watering, skipped > 0 ? `${skipped} ${skipped === 1 ? "step" : "steps"} skipped` : "no steps skipped"].filter(Boolean);
  return { today, dayOfPlan, where, watering, skipped, summary: parts.join(", ") };
}

function describePhase(plan: PlanForDay, today: string): string {
  const phase = plan.phases.find((p) => p.start <= today && today <= p.end);
  if (phase && phase.phase !== "prep") {
    return `day ${daysBetween(phase.start, today) + 1} of the ${phaseNames[phase.phase] ?? phase.phase} phase`;
  }
  if (today < plan.visitDate) {
    const days = daysBetween(today, plan.visitDate);
    return days === 1 ? "the visit is tomorrow" : `${days} days before the visit`;
  }
  const lastEnd = plan.phases.reduce((max, p) => (p.end > max ? p.end : max), plan.visitDate);
  if (today > lastEnd) return `the plan ended ${relativeDay(lastEnd, today)}`;
  return `day ${daysBetween(plan.visitDate, today) + 1} after the visit`;
}

function describeWatering(plan: PlanForDay, today: string): string | null {
  const waterSteps = plan.steps.filter((step) => step.kind === "water" && step.date <= today);
  if (waterSteps.length === 0) return null;
  const lastDone = waterSteps.filter((step) => step.state === "done").reduce<string | null>((max, s) => (!max || s.date > max ? s.date : max), null);
  return lastDone ? `last watered ${relativeDay(lastDone, today)}` : "no watering ticked off yet";
}
