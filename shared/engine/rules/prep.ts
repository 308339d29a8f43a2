import type { PlanContext } from "../context.ts";
import { formatInches, formatNumber } from "../format.ts";
import { dailyKey } from "../step-keys.ts";
import { MOW_DOWN_RULE, ONE_THIRD_RULE } from "../tables/mowing.ts";
import { AERATION_PREP_RULE } from "../tables/watering.ts";
import { SOURCES } from "../tables/sources.ts";
import type { PlanStep } from "../types.ts";
import { winterOverseedingPrepHeight } from "./warm-season.ts";

const EPSILON = 1e-9;
const roundHeight = (x: number) => Math.round(x * 1000) / 1000;

/**
 * Heights for mowing down before overseeding. Each cut may take at most a
 * third of the blade, and a mower can only sit on its own settings, so each
 * stage is the LOWEST setting at or above two-thirds of the current height
 * (4 in → 2.67 in allowed → 3 in with ½-inch settings), until the target is
 * reachable in one cut. If the mower's steps are too coarse to go lower
 * without breaking the rule, mowing down stops where it is.
 */
export function mowDownStages(currentIn: number, targetIn: number, settingStepIn: number): number[] {
  const stages: number[] = [];
  let height = currentIn;
  for (let guard = 0; guard < 12 && height > targetIn + EPSILON; guard++) {
    const lowestAllowed = height * (1 - ONE_THIRD_RULE.maxFractionRemoved);
    const next =
      lowestAllowed <= targetIn + EPSILON
        ? targetIn
        : roundHeight(Math.ceil(lowestAllowed / settingStepIn - EPSILON) * settingStepIn);
    if (next >= height - EPSILON) break;
    stages.push(next);
    height = next;
  }
  return stages;
}

const mowDownWhy = {
  text: "Mowing in stages keeps each cut within a third of the blade, so the lawn is not shocked before the seed goes down.",
  source: `${ONE_THIRD_RULE.source}; staging: ${MOW_DOWN_RULE.source}`,
  provenance: "published",
} as const;

const WINTER_LOW_CUT_TEXT = {
  why: "A low cut opens the summer grass so the ryegrass seed reaches the soil and gets the light it needs to sprout.",
  lastCut:
    "This low cut lets the ryegrass seed reach the soil. Bag or rake up the clippings and any loose dead runners so the seed is not left lying on them.",
} as const;

const flagWhy = {
  text: "Aerator tines and slicer blades break sprinkler heads and cut buried pet-fence and cable lines they cannot see.",
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

const clearWhy = {
  text: "Sticks, toys and dog waste jam the machines and keep seed from reaching the soil.",
  source: SOURCES.tradePractice,
  provenance: "common practice",
} as const;

const moistSoilWhy = {
  text: "Tines go deeper and pull cleaner cores from soil that is moist but not muddy; dry, hard soil lets them skid over the top.",
  source: AERATION_PREP_RULE.source,
  provenance: AERATION_PREP_RULE.provenance,
} as const;

function waterBeforeAerationStep(ctx: PlanContext): PlanStep {
  const date = ctx.dateOf(-1);
  const byHand = ctx.input.property.irrigation.kind === "none";
  return {
    key: dailyKey("note", date, "water_before_aeration"),
    date,
    phase: "prep",
    kind: "note",
    title: "If the soil is dry, water the lawn the day before the visit",
    detail: `If it has not rained in the last few days, put down about ${formatNumber(AERATION_PREP_RULE.waterBeforeIn, 2)} inch of water${byHand ? " with a hose-end sprinkler" : ""}. Do not water on the morning of the visit: muddy soil clogs the tines.`,
    why: moistSoilWhy,
    cautions: ["watering_restrictions"],
  };
}

/** After core aeration the soil plugs stay where they fall: they break down and feed the surface. */
export function aerationCoreSteps(ctx: PlanContext): PlanStep[] {
  if (!ctx.services.has("aeration")) return [];
  const date = ctx.dateOf(0);
  return [
    {
      key: dailyKey("note", date, "leave_cores"),
      date,
      phase: ctx.phaseOf(0),
      kind: "note",
      title: "Leave the soil cores on the lawn",
      detail: "The little plugs the aerator pulled crumble back into the lawn within a week or two of rain, watering and mowing. Do not rake them up.",
      why: {
        text: "Cores left on top return soil and its microbes to the surface, which helps break down thatch and settles seed in.",
        source: AERATION_PREP_RULE.source,
        provenance: AERATION_PREP_RULE.provenance,
      },
      cautions: [],
    },
  ];
}

export function prepSteps(ctx: PlanContext): PlanStep[] {
  const { services, input, program } = ctx;
  const { property } = input;
  const steps: PlanStep[] = [];
  const dayBefore = ctx.dateOf(-1);

  const overseedingIntoTurf =
    (services.has("overseeding") || services.has("slit_seeding")) && property.lawnCondition !== "bare";
  if (overseedingIntoTurf) {
    const step = property.mowerSettingStepIn ?? MOW_DOWN_RULE.assumedSettingStepIn;
    // Winter ryegrass on a warm-season lawn goes lower than a cool-season overseeding (scalped bermudagrass).
    const winter = winterOverseedingPrepHeight(ctx, step);
    const stages = mowDownStages(property.currentMowingHeightIn, winter?.heightIn ?? program.seedingMowHeightIn, step);
    const why = winter
      ? { text: WINTER_LOW_CUT_TEXT.why, source: `${winter.source}; ${ONE_THIRD_RULE.source}`, provenance: winter.provenance }
      : mowDownWhy;
    stages.forEach((height, i) => {
      const daysBeforeVisit = 1 + (stages.length - 1 - i) * program.prepMowStageDays;
      const date = ctx.dateOf(-daysBeforeVisit);
      const isLast = i === stages.length - 1;
      steps.push({
        key: dailyKey("prep_mow", date),
        date,
        phase: "prep",
        kind: "prep_mow",
        title: `Mow at ${formatInches(height)}${stages.length > 1 ? ` (cut ${i + 1} of ${stages.length} before the visit)` : ""}`,
        detail: isLast
          ? winter
            ? WINTER_LOW_CUT_TEXT.lastCut
            : "This is the short cut the seed needs. Bag or rake up the clippings so seed can reach the soil."
          : `Take the grass down to ${formatInches(height)} and leave it there for about a week before the next cut.`,
        heightIn: height,
        why,
        cautions: ["equipment_safety"],
      });
    });
  }

  const machineWork = ["aeration", "dethatching", "slit_seeding", "overseeding", "new_seeding", "top_dressing"] as const;
  if (machineWork.some((s) => services.has(s))) {
    steps.push({
      key: dailyKey("clear_debris", dayBefore),
      date: dayBefore,
      phase: "prep",
      kind: "clear_debris",
      title: "Pick up sticks, toys and pet waste from the lawn",
      detail: "Clear the lawn so the crew's machines can cover every part of it.",
      why: clearWhy,
      cautions: [],
    });
  }

  if (services.has("aeration")) steps.push(waterBeforeAerationStep(ctx));

  if (services.has("aeration") || services.has("slit_seeding") || services.has("dethatching")) {
    const sprinklers = property.irrigation.kind === "in_ground" ? "sprinkler heads, valve boxes, " : "";
    steps.push({
      key: dailyKey("flag_hazards", dayBefore),
      date: dayBefore,
      phase: "prep",
      kind: "flag_hazards",
      title: "Mark sprinkler heads and buried lines with flags",
      detail: `After your last mow, put a small flag on ${sprinklers}invisible pet-fence wires, shallow cables and anything else hidden in the grass.`,
      why: flagWhy,
      cautions: ["equipment_safety"],
    });
  }
  return steps;
}
