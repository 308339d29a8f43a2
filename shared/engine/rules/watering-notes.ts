import type { PlanContext } from "../context.ts";
import { inRanges } from "./season.ts";
import { formatNumber } from "../format.ts";
import { oneOffKey } from "../step-keys.ts";
import type { Why } from "../tables/provenance.ts";
import { SOURCES } from "../tables/sources.ts";
import { CATCH_CAN_TEST } from "../tables/watering.ts";
import type { PlanStep } from "../types.ts";

const catchCanWhy: Why = {
  text: "Sprinklers differ a lot. Measuring yours turns our estimate of minutes per zone into the right number.",
  source: CATCH_CAN_TEST.source,
  provenance: CATCH_CAN_TEST.provenance,
};
const frostWhy: Why = {
  text: "Grass barely uses water once nights turn frosty, and water left in pipes can freeze.",
  source: SOURCES.tradePractice,
  provenance: "common practice",
};

/** "0.6 inch an hour, typical of rotor heads (0.4–0.8)": the assumed rate, said to be a default. */
export function assumedRatePhrase(ctx: PlanContext): string {
  const typical = ctx.sprinklerDefault;
  const rate = `${formatNumber(ctx.precipitationRate, 2)} inch an hour`;
  return typical
    ? `${rate}, a typical figure for ${typical.name} (${formatNumber(typical.rateInPerHour.min, 2)}–${formatNumber(typical.rateInPerHour.max, 2)})`
    : `${rate}, our default for sprinkler systems`;
}

/** One-off watering notes: when to stop for frost, and how to measure the sprinkler. */
export function wateringNotes(ctx: PlanContext): PlanStep[] {
  const { timeline } = ctx;
  const notes: PlanStep[] = [];
  // Announced once light watering is over, since every later watering stops
  // at the frost; during germination the seed still needs its water and the
  // frost warning already covers the risk.
  if (ctx.frostDay !== null && ctx.frostDay > (timeline.germinationEnd ?? 0) && ctx.frostDay <= timeline.planEnd) {
    notes.push({
      key: oneOffKey("note", "frost_stop_watering"),
      date: ctx.dateOf(ctx.frostDay),
      phase: ctx.phaseOf(ctx.frostDay),
      kind: "note",
      title: "First frost is due about now: stop regular watering",
      detail:
        ctx.input.property.irrigation.kind === "in_ground"
          ? "Turn off the watering schedule and have the system drained before pipes freeze."
          : "Disconnect and drain hoses before they freeze.",
      why: frostWhy,
      cautions: [],
    });
  }
  // Minutes per cycle rest on a guessed rate until the homeowner measures it: asked the day after
  // the visit (when the soil warms, for seed lying dormant), and not once the frost has ended watering.
  const measureDay = Math.max(1, ctx.season.sowingStartDay);
  const watersAfter = (ctx.frostDay === null || measureDay < ctx.frostDay) && inRanges(measureDay, ctx.season.wateringClosed) === null;
  if (!ctx.precipitationRateMeasured && ctx.input.property.irrigation.kind !== "none" && watersAfter) {
    notes.push({
      key: oneOffKey("note", "catch_can_test"),
      date: ctx.dateOf(measureDay),
      phase: ctx.phaseOf(measureDay),
      kind: "note",
      title: "Measure how much water your sprinkler puts down",
      detail: `Set ${CATCH_CAN_TEST.cans} straight-sided cups or cans across one watered area, run it for ${CATCH_CAN_TEST.minutes} minutes, and note the milliliters in each. Send us the numbers and we will set exact minutes. Until then the plan assumes ${assumedRatePhrase(ctx)}.`,
      why: catchCanWhy,
      cautions: [],
    });
  }
  return notes;
}
