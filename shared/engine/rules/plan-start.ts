import type { PlanContext } from "../context.ts";
import { toDayNumber } from "../dates.ts";

/**
 * The first day (offset from the visit) the plan shows: the visit day, or `options.today` when
 * the plan is made later. One-off advice is dated here so a plan made after the visit still has it
 * (steps before that day are left out of the plan).
 */
export function firstPlanDay(ctx: PlanContext): number {
  const today = ctx.input.options.today;
  return today === undefined ? 0 : Math.max(0, toDayNumber(today) - ctx.visitDay);
}
