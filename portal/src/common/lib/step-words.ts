import type { TFunction } from "i18next";
import type { StoredStep } from "#shared/schemas/plans";
import { wateringStarts } from "#shared/engine/waterings";
import { formatClock } from "./dates.ts";


/**
 * The line a homeowner reads first: "Water 3 times today: 7 am, 12 pm, 4 pm — 4 minutes per zone".
 * Built from the step's numbers so it reads in the chosen language; other steps use the
 * engine's title, which is English for now.
 */
export function stepHeadline(step: StoredStep, t: TFunction, language: string): string {
  // On a slope `times` lists every short run: the homeowner is told when each watering starts, and how it is split.
  const times = wateringStarts(step);
  if (step.kind !== "water" || times.length === 0 || step.minutesPerCycle === undefined) return step.title;
  // Plain commas read faster on a phone than "7 am, 12 pm and 4 pm".
  const clock = times.map((time) => formatClock(time, language)).join(", ");
  const when = t("steps.waterTimes", { count: times.length, times: clock });
  // The engine says where the minutes apply; it words this only two ways (zones or hose spots).
  const where = step.title.includes("each spot") ? "perSpot" : step.title.includes("per zone") ? "perZone" : "eachTime";
  const split = step.cycleAndSoak;
  if (split && split.runsPerCycle > 1 && split.cycleStarts.length > 0) {
    const amount = where === "eachTime" ? t("steps.runMinutes", { count: step.minutesPerCycle }) : t(`steps.minutes.${where}`, { count: step.minutesPerCycle });
    return `${when} — ${t("steps.inRuns", { count: split.runsPerCycle, amount, soak: split.soakMinutes })}`;
  }
  return `${when} — ${t(`steps.minutes.${where}`, { count: step.minutesPerCycle })}`;
}
