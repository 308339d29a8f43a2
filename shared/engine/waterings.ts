/*
 * A watering step's times as waterings, each with its runs. On a slope every watering is split
 * into short runs (rules/slopes.ts) and the step's `times` list every run; homeowners are told once
 * per watering ("water at 7:00 in 4 short runs"), not once per run. Pure and small: the server's
 * reminders and calendar feed and the portal's step cards share it.
 */

export type WateringRuns = { start: string; runs: string[] };

type StepTimes = {
  times?: readonly string[];
  cycleAndSoak?: { readonly runsPerCycle: number; readonly cycleStarts?: readonly string[] };
};

/** Each watering of the step with its runs' starts; a step without cycle-and-soak has one run per watering. */
export function wateringsOf(step: StepTimes): WateringRuns[] {
  const times = step.times ?? [];
  const starts = step.cycleAndSoak?.cycleStarts ?? [];
  if (starts.length === 0) return times.map((time) => ({ start: time, runs: [time] }));
  const sorted = [...times].sort();
  const limit = Math.max(1, step.cycleAndSoak!.runsPerCycle);
  return starts.map((start, i) => {
    const next = starts[i + 1];
    // A run belongs to the watering it follows: times from this start up to the next watering's start.
    const runs = sorted.filter((t) => t >= start && (next === undefined || t < next)).slice(0, limit);
    return { start, runs: runs.length > 0 ? runs : [start] };
  });
}

/** When each watering begins: the moments a homeowner is reminded. */
export function wateringStarts(step: StepTimes): string[] {
  return wateringsOf(step).map((w) => w.start);
}
