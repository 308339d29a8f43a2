import type { SeedMixEntry } from "./schemas/plan-input.ts";
import { SPECIES_FACTS, type SpeciesFacts } from "./tables/species.ts";

/** Emergence facts of the species actually sown, which drive watering and mowing dates. */
export interface MixFacts {
  readonly entries: readonly SeedMixEntry[];
  /** Species whose sprouts show first: the lowest minimum emergence. */
  readonly fastest: SpeciesFacts;
  /** Species that may take longest: the highest maximum emergence. */
  readonly slowest: SpeciesFacts;
}

export function mixFacts(entries: readonly SeedMixEntry[]): MixFacts | null {
  let fastest: SpeciesFacts | null = null;
  let slowest: SpeciesFacts | null = null;
  for (const entry of entries) {
    const facts = SPECIES_FACTS[entry.species];
    if (!fastest || facts.emergenceDays.min < fastest.emergenceDays.min) fastest = facts;
    if (!slowest || facts.emergenceDays.max > slowest.emergenceDays.max) slowest = facts;
  }
  return fastest && slowest ? { entries, fastest, slowest } : null;
}

/** Percent-weighted range, so a 90/10 tall fescue/bluegrass mix is judged mostly as tall fescue. */
export function weightedRange(
  entries: readonly SeedMixEntry[],
  pick: (facts: SpeciesFacts) => { min: number; max: number },
): { min: number; max: number } {
  const totalPercent = entries.reduce((sum, e) => sum + e.percent, 0);
  let min = 0;
  let max = 0;
  for (const entry of entries) {
    const range = pick(SPECIES_FACTS[entry.species]);
    min += (range.min * entry.percent) / totalPercent;
    max += (range.max * entry.percent) / totalPercent;
  }
  return { min, max };
}
