import type { PlanContext } from "../context.ts";
import { formatInches } from "../format.ts";
import { dailyKey } from "../step-keys.ts";
import {
  FIRST_MOW_RULE,
  MOW_DOWN_RULE,
  ONE_THIRD_RULE,
  WARM_SEASON_MOWING_HEIGHT_IN,
  WINTER_RYEGRASS_MOWING_HEIGHT_IN,
} from "../tables/mowing.ts";
import type { SourcedRange, Why } from "../tables/provenance.ts";
import { SPECIES_FACTS } from "../tables/species.ts";
import { AFTER_FROST_RULE } from "../tables/timing.ts";
import type { PlanStep } from "../types.ts";
import { isWinterOverseeding } from "./warm-season.ts";

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

const SPECIES_TEXT = {
  warmFirstTitle: (height: string, name: string) => `First mow of the new grass: ${height}, the top of the usual height for ${name}`,
  warmWhy:
    "Summer grasses such as this one grow best kept short: cut low from the start, they spread sideways and thicken. Never take more than a third off at once.",
  winterFirstTitle: (height: string) => `First mow of the winter ryegrass: ${height}`,
  winterWhy:
    "Ryegrass sown into a summer lawn for winter color is kept shorter than a cool-season lawn, which keeps it fine and even and lets the summer grass come back in spring.",
} as const;

/** First and settled heights of new grass whose species has its own height range. */
interface SpeciesHeights {
  readonly first: number;
  readonly target: number;
  readonly firstTitle: string;
  readonly why: Why;
}

function whyFor(text: string, range: SourcedRange): Why {
  return { text, source: `${range.source}; ${ONE_THIRD_RULE.source}`, provenance: range.provenance };
}

/**
 * Winter ryegrass, or seed that is all warm-season, is first cut at the top of its own range (never above
 * the mower's highest setting) and brought down to the lawn's usual height kept inside that range.
 * Anything else (cool-season or mixed seed, or summer-grass seed patched into a cool-season lawn, whose
 * grass would be scalped) keeps the highest-setting rule: null.
 */
function speciesHeights(ctx: PlanContext, usualHeight: number): SpeciesHeights | null {
  const { visit, property } = ctx.input;
  const newLawn = property.lawnCondition === "bare" || ctx.services.has("new_seeding");
  let range: SourcedRange | null = null;
  let name = "";
  if (isWinterOverseeding(ctx)) {
    range = WINTER_RYEGRASS_MOWING_HEIGHT_IN;
  } else {
    if (ctx.lawnSeason !== "warm" && !newLawn) return null;
    for (const entry of visit.seedMix) {
      const r = WARM_SEASON_MOWING_HEIGHT_IN[entry.species];
      if (!r) return null;
      // In a mix of summer grasses the one that needs the most leaf sets the first height.
      if (range === null || r.max > range.max) {
        range = r;
        name = SPECIES_FACTS[entry.species].name;
      }
    }
  }
  if (range === null) return null;
  const first = Math.min(property.mowerHighestSettingIn, range.max);
  const target = Math.min(first, Math.max(range.min, usualHeight));
  const height = formatInches(first);
  return name === ""
    ? { first, target, firstTitle: SPECIES_TEXT.winterFirstTitle(height), why: whyFor(SPECIES_TEXT.winterWhy, range) }
    : { first, target, firstTitle: SPECIES_TEXT.warmFirstTitle(height, name), why: whyFor(SPECIES_TEXT.warmWhy, range) };
}

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
  const bySpecies = timeline.firstMow === null ? null : speciesHeights(ctx, usualHeight);
  // Winter ryegrass is a cool-season grass: it keeps growing, and needs mowing, through the frosts.
  const mowsThroughWinter = bySpecies !== null && isWinterOverseeding(ctx);
  const lastDay =
    ctx.frostDay === null || mowsThroughWinter
      ? timeline.planEnd
      : Math.min(timeline.planEnd, ctx.frostDay + AFTER_FROST_RULE.mowingContinuesDays);
  const settledHeight = bySpecies?.target ?? usualHeight;
  const steps: PlanStep[] = [];
  const firstDay = timeline.firstMow ?? FIRST_MOW_RULE.daysBetweenMowings;
  let height = timeline.firstMow === null ? usualHeight : (bySpecies?.first ?? property.mowerHighestSettingIn);

  for (let day = firstDay, n = 0; day <= lastDay; day += FIRST_MOW_RULE.daysBetweenMowings, n++) {
    const date = ctx.dateOf(day);
    const isFirstNewGrassMow = timeline.firstMow !== null && n === 0;
    const lowering = !isFirstNewGrassMow && timeline.firstMow !== null && height > settledHeight + 1e-9;
    if (lowering) height = Math.max(settledHeight, Math.round((height - settingStep) * 1000) / 1000);
    steps.push({
      key: dailyKey("mow", date),
      date,
      phase: ctx.phaseOf(day),
      kind: "mow",
      title: isFirstNewGrassMow
        ? (bySpecies?.firstTitle ?? `First mow of the new grass: highest setting (${formatInches(height)})`)
        : lowering
          ? `Mow at ${formatInches(height)}, one setting lower than last time`
          : `Mow at ${formatInches(height)}`,
      detail: isFirstNewGrassMow
        ? "Wait until the grass and soil are dry and firm. Use a sharp blade, walk slowly and make wide turns. If the new grass is not yet a third taller than this height, wait a few days."
        : "Mow when the grass is dry, and only if it has grown about a third taller than this height.",
      heightIn: height,
      why: isFirstNewGrassMow ? (bySpecies?.why ?? firstMowWhy) : lowering ? stepDownWhy : regularWhy,
      cautions: ["equipment_safety"],
    });
  }
  return steps;
}
