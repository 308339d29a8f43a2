import { daysBetween } from "#shared/engine/index";
import type { SamplePlan } from "../api/preview-sample-plan.ts";
import { holdOffLabels } from "./setting-labels.ts";

export interface Milestone {
  key: string;
  label: string;
  /** An ISO date, or a count of steps. */
  value: string | number | null;
}

/** The dates a manager checks after a change: when watering eases, first mow, hold-offs lifting, the end. */
export function milestonesOf(plan: SamplePlan): Milestone[] {
  const phaseEnd = (phase: string) => plan.meta.phases.find((p) => p.phase === phase)?.end ?? null;
  return [
    { key: "germination", label: "Germination watering ends", value: plan.meta.germinationWateringEnds },
    { key: "first-mow", label: "First mow", value: plan.meta.firstMowDate },
    { key: "establishment", label: "Establishment ends", value: phaseEnd("establishment") },
    ...plan.holdOffs.map((h) => ({ key: `hold-${h.kind}`, label: `${holdOffLabels[h.kind] ?? h.kind} until`, value: h.end })),
    { key: "plan-end", label: "Plan ends", value: plan.meta.planEnds },
    { key: "waterings", label: "Watering steps", value: plan.steps.filter((s) => s.kind === "water").length },
    { key: "steps", label: "All steps", value: plan.steps.length },
  ];
}

const dayFormat = new Intl.DateTimeFormat("en-US", { day: "numeric", month: "short", timeZone: "UTC" });

/** "Sep 24 (day 14)": the date and how far it is from the visit. */
export function formatMilestone(value: Milestone["value"], visitDate: string): string {
  if (value === null) return "—";
  if (typeof value === "number") return String(value);
  return `${dayFormat.format(new Date(`${value}T00:00:00Z`))} (day ${daysBetween(visitDate, value)})`;
}

/** How many lines of the comparison differ between the two plans. */
export function countMovedMilestones(before: SamplePlan | undefined, after: SamplePlan | undefined): number {
  if (!before || !after) return 0;
  const was = new Map(milestonesOf(before).map((m) => [m.key, m.value]));
  return milestonesOf(after).filter((m) => was.get(m.key) !== m.value).length;
}
