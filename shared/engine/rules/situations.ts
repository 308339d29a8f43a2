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

/** Sod first (its watering replaces the ordinary one), then cycle-and-soak over every watering, then shade nitrogen. */
export function applySituations(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  const sod = isSodInstallation(ctx) ? applySod(ctx, steps) : (steps as PlanStep[]);
  return applyShadeNitrogen(ctx, applyCycleAndSoak(ctx, sod));
}

export function situationHoldOffs(ctx: PlanContext): HoldOff[] {
  return sodHoldOffs(ctx);
}

export function situationWarnings(ctx: PlanContext): WarningFinding[] {
  return [...sodWarnings(ctx), ...slopeWarnings(ctx), ...shadeWarnings(ctx)];
}
