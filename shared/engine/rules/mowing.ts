import type { PlanContext } from "../context.ts";
import { formatInches } from "../format.ts";
import { dailyKey } from "../step-keys.ts";
import { FIRST_MOW_RULE, MOW_DOWN_RULE, ONE_THIRD_RULE } from "../tables/mowing.ts";
import type { Why } from "../tables/provenance.ts";
import { AFTER_FROST_RULE } from "../tables/timing.ts";
import type { PlanStep } from "../types.ts";

const firstMowWhy: Why = {
  text: "Young grass needs its full leaf to feed new roots. Waiting, then cutting high with a sharp blade, avoids pulling seedlings out.",
  source: FIRST_MOW_RULE.source,
  provenance: FIRST_MOW_RULE.provenance,
};
const stepDownWhy: Why = {
  text: "Lowering one notch at a time keeps every cut well inside the one-third rule while the new grass toughens.",
  source: `${FIRST_MOW_RULE.source}; ${ONE_THIRD_RULE.source}`,
  provenance: "common practice",
};
const regularWhy: Why = {
  text: "Never take off more than a third of the grass height in one mowing.",
  source: ONE_THIRD_RULE.source,
  provenance: ONE_THIRD_RULE.provenance,
};

/**
 * New grass: first mow at the mower's highest setting, not before the
 * program's minimum days and not before the slowest species in the mix has
 * come up and grown (both folded into timeline.firstMow), then one setting
 * lower each week until the lawn's usual height. Lawns without seed keep
 * their usual height. Mowing stops a few weeks after the expected first frost.
 */
export function mowingSteps(ctx: PlanContext): PlanStep[] {
  const { property } = ctx.input;
  const { timeline } = ctx;
  const usualHeight = Math.min(property.currentMowingHeightIn, property.mowerHighestSettingIn);
  const settingStep = property.mowerSettingStepIn ?? MOW_DOWN_RULE.assumedSettingStepIn;
  const lastDay =
    ctx.frostDay === null ? timeline.planEnd : Math.min(timeline.planEnd, ctx.frostDay + AFTER_FROST_RULE.mowingContinuesDays);
  const steps: PlanStep[] = [];
  const firstDay = timeline.firstMow ?? FIRST_MOW_RULE.daysBetweenMowings;
  let height = timeline.firstMow === null ? usualHeight : property.mowerHighestSettingIn;

  for (let day = firstDay, n = 0; day <= lastDay; day += FIRST_MOW_RULE.daysBetweenMowings, n++) {
    const date = ctx.dateOf(day);
    const isFirstNewGrassMow = timeline.firstMow !== null && n === 0;
    const lowering = !isFirstNewGrassMow && timeline.firstMow !== null && height > usualHeight + 1e-9;
    if (lowering) height = Math.max(usualHeight, Math.round((height - settingStep) * 1000) / 1000);
    steps.push({
      key: dailyKey("mow", date),
      date,
      phase: ctx.phaseOf(day),
      kind: "mow",
      title: isFirstNewGrassMow
        ? `First mow of the new grass: highest setting (${formatInches(height)})`
        : lowering
          ? `Mow at ${formatInches(height)}, one setting lower than last time`
          : `Mow at ${formatInches(height)}`,
      detail: isFirstNewGrassMow
        ? "Wait until the grass and soil are dry and firm. Use a sharp blade, walk slowly and make wide turns. If the new grass is not yet a third taller than this height, wait a few days."
        : "Mow when the grass is dry, and only if it has grown about a third taller than this height.",
      heightIn: height,
      why: isFirstNewGrassMow ? firstMowWhy : lowering ? stepDownWhy : regularWhy,
      cautions: ["equipment_safety"],
    });
  }
  return steps;
}
