import type { PlanContext } from "../context.ts";
import type { HoldOff, PlanStep, WarningFinding } from "../types.ts";
import { shadeSteps, shadeWarnings, applyShadeNitrogen } from "./shade.ts";
import { applyCycleAndSoak, slopeSteps, slopeWarnings } from "./slopes.ts";
import { applySod, isSodInstallation, sodHoldOffs, sodWarnings } from "./sod.ts";

/*
 * Sod, slopes and shade, chained into generate.ts in one place. Each is a post-pass over
 * the steps the other rules made, so they apply whatever those rules produce.
 */

/** Steps of their own: slope washout checks, the shade note. */
export function situationSteps(ctx: PlanContext): PlanStep[] {
  return [...slopeSteps(ctx), ...shadeSteps(ctx)];
}

/** Sod's watering and mowing replace the ordinary ones: first of the post-passes, so the season and place passes see them. */
export function sodPass(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  return isSodInstallation(ctx) ? applySod(ctx, steps) : steps;
}

/** Last of the post-passes: cycle-and-soak splits waterings where they finally fall, then shade lowers nitrogen. */
export function slopeAndShadePasses(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  return applyShadeNitrogen(ctx, applyCycleAndSoak(ctx, steps));
}

export function situationHoldOffs(ctx: PlanContext): HoldOff[] {
  return sodHoldOffs(ctx);
}

export function situationWarnings(ctx: PlanContext): WarningFinding[] {
  return [...sodWarnings(ctx), ...slopeWarnings(ctx), ...shadeWarnings(ctx)];
}
