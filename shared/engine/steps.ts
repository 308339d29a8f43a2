import type { PlanStep, StepKind } from "./types.ts";

/** Within a day: get the lawn ready, then water, feed, mow, tidy and photograph. */
const KIND_ORDER: Readonly<Record<StepKind, number>> = {
  prep_mow: 0,
  flag_hazards: 1,
  clear_debris: 2,
  note: 3,
  water: 4,
  feed: 5,
  mow: 6,
  leaf_cleanup: 7,
  check_in_photo: 8,
};

/** Total order (date, kind, key) so output never depends on rule evaluation order. */
export function compareSteps(a: PlanStep, b: PlanStep): number {
  if (a.date !== b.date) return a.date < b.date ? -1 : 1;
  const byKind = KIND_ORDER[a.kind] - KIND_ORDER[b.kind];
  if (byKind !== 0) return byKind;
  return a.key < b.key ? -1 : a.key > b.key ? 1 : 0;
}

export function sortSteps(steps: PlanStep[]): PlanStep[] {
  return steps.sort(compareSteps);
}
