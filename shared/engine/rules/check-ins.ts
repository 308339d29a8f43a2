import type { PlanContext } from "../context.ts";
import { dailyKey } from "../step-keys.ts";
import { SOURCES } from "../tables/sources.ts";
import type { PlanStep } from "../types.ts";

/**
 * Photo check-ins when a question is most likely: when the quickest grass in
 * the mix should start to show, and a few days after the slowest should be
 * up (so a patchy stand is caught while there is still time to reseed), plus
 * the program's own days.
 */
const AFTER_SLOWEST_DAYS = 3;

export function checkInSteps(ctx: PlanContext): PlanStep[] {
  const planned = new Map<number, string>();
  // Seed lying dormant: sprouts are counted from the day the soil warms, not from the visit.
  const start = ctx.season.sowingStartDay;
  if (ctx.mix) {
    planned.set(start + ctx.mix.fastest.emergenceDays.min, `The ${ctx.mix.fastest.name} in your mix usually starts to show about now.`);
    const afterSlowest = start + ctx.mix.slowest.emergenceDays.max + AFTER_SLOWEST_DAYS;
    if (!planned.has(afterSlowest)) {
      planned.set(afterSlowest, `Even the ${ctx.mix.slowest.name} should be up by now. A photo lets us spot thin patches while there is time to fix them.`);
    }
  }
  for (const programDay of ctx.program.checkInPhotoDays) {
    const day = programDay + start;
    if (!planned.has(day)) planned.set(day, "A progress photo lets us check the lawn and answer questions early.");
  }
  const days = [...planned.keys()].filter((d) => d >= 1 && d <= ctx.timeline.planEnd).sort((a, b) => a - b);
  return days.map((day) => {
    const date = ctx.dateOf(day);
    return {
      key: dailyKey("check_in_photo", date),
      date,
      phase: ctx.phaseOf(day),
      kind: "check_in_photo",
      title: "Send us a photo of the lawn",
      detail: `${planned.get(day) ?? ""} Take it from standing height, with a shoe or a ruler in the picture for scale.`,
      why: {
        text: "Comparing photos over time is the quickest way for a technician to see whether germination is on track.",
        source: ctx.mix ? `${ctx.mix.slowest.emergenceDays.source} (emergence days)` : SOURCES.sproutlineChoice,
        provenance: ctx.mix ? ctx.mix.slowest.emergenceDays.provenance : "common practice",
      },
      cautions: [],
    };
  });
}
