import { isoDigits } from "./dates.ts";
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

/*
 * Sorting runs twice per plan on ~55 steps of several shapes, so a comparator
 * reading `date`/`kind`/`key` off each pair was one of the engine's costliest
 * spots. Instead each step gets one number, (yyyymmdd · 16 + kind) · 4096 +
 * index, and a typed-array sort (no JS callbacks) orders them: the same order
 * as compareSteps, stable through the index. Only steps sharing date and kind
 * still need their keys compared, which is rare. Anything unexpected (a date
 * not in YYYY-MM-DD, a huge list) falls back to the comparator.
 */
const INDEX_SLOTS = 4096;
let order = new Float64Array(128);

export function sortSteps(steps: PlanStep[]): PlanStep[] {
  const n = steps.length;
  if (n < 2) return steps;
  if (n > INDEX_SLOTS) return steps.sort(compareSteps);
  if (order.length < n) order = new Float64Array(Math.max(n, order.length * 2));
  for (let i = 0; i < n; i++) {
    const step = steps[i] as PlanStep;
    const day = isoDigits(step.date);
    const kind = KIND_ORDER[step.kind];
    if (day < 0 || kind === undefined) return steps.sort(compareSteps);
    order[i] = (day * 16 + kind) * INDEX_SLOTS + i;
  }
  const sorted = order.subarray(0, n).sort();
  const original = steps.slice();
  let runStart = 0;
  let runKey = Math.floor((sorted[0] as number) / INDEX_SLOTS);
  for (let j = 0; j < n; j++) {
    const packed = sorted[j] as number;
    const key = Math.floor(packed / INDEX_SLOTS);
    steps[j] = original[packed - key * INDEX_SLOTS] as PlanStep;
    if (key !== runKey) {
      if (j - runStart > 1) sortRun(steps, runStart, j);
      runStart = j;
      runKey = key;
    }
  }
  if (n - runStart > 1) sortRun(steps, runStart, n);
  return steps;
}

/** Steps of one date and kind, already in input order: order them by key (stable, as compareSteps would). */
function sortRun(steps: PlanStep[], from: number, to: number): void {
  const run = steps.slice(from, to).sort(compareSteps);
  for (let i = 0; i < run.length; i++) steps[from + i] = run[i] as PlanStep;
}
