import type { PlanContext } from "../context.ts";
import { civilFromDays } from "../dates.ts";
import { dailyKey } from "../step-keys.ts";
import { SOURCES } from "../tables/sources.ts";
import { AUTUMN_MONTHS, LEAF_SEASON } from "../tables/timing.ts";
import type { PlanStep } from "../types.ts";

export function isAutumnVisit(ctx: PlanContext): boolean {
  const month = civilFromDays(ctx.visitDay).month;
  return (AUTUMN_MONTHS[ctx.hemisphere] as readonly number[]).includes(month);
}

/** Month and day as one comparable number (Sept. 1 → 901). */
const monthDay = (d: { month: number; day: number }) => d.month * 100 + d.day;

/**
 * Weekly leaf clean-up on the plan's dates that fall in the leaf season, so a
 * late-summer visit whose plan runs into autumn gets it too. Fallen leaves
 * shade out seedlings and hold damp against them.
 */
export function leafCleanupSteps(ctx: PlanContext): PlanStep[] {
  const season = LEAF_SEASON[ctx.hemisphere];
  const from = monthDay(season.start);
  const to = monthDay(season.end);
  const steps: PlanStep[] = [];
  for (let day = 7; day <= ctx.timeline.planEnd; day += 7) {
    const when = monthDay(civilFromDays(ctx.visitDay + day));
    if (when < from || when > to) continue;
    const date = ctx.dateOf(day);
    const beforeFirstMow = ctx.timeline.firstMow !== null && day < ctx.timeline.firstMow;
    steps.push({
      key: dailyKey("leaf_cleanup", date),
      date,
      phase: ctx.phaseOf(day),
      kind: "leaf_cleanup",
      title: "Clear fallen leaves off the lawn",
      detail: beforeFirstMow
        ? "Use a leaf blower on low or a light plastic rake: seedlings pull out easily. Do it when the surface is dry."
        : "Rake, blow or mulch them with the mower so the grass gets light.",
      why: {
        text: "A blanket of leaves blocks light and keeps the grass wet, which thins new and old grass alike.",
        source: LEAF_SEASON.source,
        provenance: LEAF_SEASON.provenance,
      },
      cautions: beforeFirstMow ? [] : ["equipment_safety"],
    });
  }
  return steps;
}

/** After dethatching without seed, the homeowner usually clears the loose thatch (with seed, the crew does it first). */
export function thatchCleanupSteps(ctx: PlanContext): PlanStep[] {
  if (!ctx.services.has("dethatching") || ctx.seeding) return [];
  const date = ctx.dateOf(0);
  return [
    {
      key: dailyKey("clear_debris", date, "thatch"),
      date,
      phase: ctx.phaseOf(0),
      kind: "clear_debris",
      title: "Rake up the loose thatch the machine pulled up",
      detail: "If the crew left any, rake it into piles and bag or compost it so it does not smother the grass.",
      why: {
        text: "Loose thatch left on top blocks light and water from reaching the soil.",
        source: SOURCES.tradePractice,
        provenance: "common practice",
      },
      cautions: ["equipment_safety"],
    },
  ];
}
