import { isValidIsoDate, type IsoDate } from "./dates.ts";
import { generatePlan } from "./generate.ts";
import type { PlanInput } from "./schemas/plan-input.ts";
import { sortSteps } from "./steps.ts";
import type { Plan, PlanStep } from "./types.ts";

/** What recompute needs from the stored plan: its steps, with any done/skipped state. */
export interface PreviousPlan {
  readonly steps: readonly PlanStep[];
  readonly prepSteps?: readonly PlanStep[];
}

/*
 * Merge rule, and why:
 * - A step the homeowner ticked off or skipped is kept exactly as it was,
 *   whatever its date: it is their record, and a done one-off (the starter
 *   feed) must not come back just because the visit moved.
 * - A step dated before `today` is history and is kept even if untouched,
 *   so the plan never rewrites what it told the homeowner yesterday — except
 *   an untouched one-off that the new plan still schedules from today on:
 *   that task is still to do, so the new date wins.
 * - Everything from `today` on comes from a fresh plan for the new input,
 *   so moved visit dates and new observations (sprouts, rain) shift the
 *   future only.
 */
function mergeSteps(previous: readonly PlanStep[], fresh: readonly PlanStep[], today: IsoDate): PlanStep[] {
  const freshFuture = fresh.filter((s) => s.date >= today);
  const freshFutureKeys = new Set(freshFuture.map((s) => s.key));
  const kept = previous.filter(
    (s) => s.state !== undefined || (s.date < today && !freshFutureKeys.has(s.key)),
  );
  const keptKeys = new Set(kept.map((s) => s.key));
  return sortSteps([...kept, ...freshFuture.filter((s) => !keptKeys.has(s.key))]);
}

export function recomputePlan(previous: PreviousPlan, newInput: PlanInput, today?: IsoDate): Plan {
  const anchor = today ?? newInput.options.today;
  if (!isValidIsoDate(anchor)) throw new RangeError("recomputePlan needs today's local date (YYYY-MM-DD)");
  const fresh = generatePlan(newInput);
  return {
    ...fresh,
    meta: { ...fresh.meta, recomputedOn: anchor },
    prepSteps: mergeSteps(previous.prepSteps ?? [], fresh.prepSteps, anchor),
    steps: mergeSteps(previous.steps, fresh.steps, anchor),
  };
}
