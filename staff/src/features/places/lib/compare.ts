import type { PlaceSamplePlan } from "../api/preview-place-sample.ts";

/** Warnings that come from place rules; the sample shows these, not the job's other warnings. */
export const PLACE_WARNING_CODES = ["fertilizer_in_blackout", "phosphorus_without_reason", "watering_days_limit_new_lawn"] as const;

export interface FeedChange {
  key: string;
  title: string;
  before: string;
  /** The new date, or null when the feeding was left out. */
  after: string | null;
}

export interface SampleComparison {
  feeds: FeedChange[];
  waterings: { before: number; after: number; moved: number };
  warnings: PlaceSamplePlan["warnings"];
}

/** What the place's rules changed in the sample plan. */
export function compareSample(without: PlaceSamplePlan, withRules: PlaceSamplePlan): SampleComparison {
  const after = new Map(withRules.steps.filter((s) => s.kind === "feed").map((s) => [s.key, s.date]));
  const feeds = without.steps.filter((s) => s.kind === "feed").map((s) => ({ key: s.key, title: s.title, before: s.date, after: after.get(s.key) ?? null }));
  const wateringBefore = new Set(without.steps.filter((s) => s.kind === "water").map((s) => s.date));
  const wateringAfter = withRules.steps.filter((s) => s.kind === "water");
  return {
    feeds,
    waterings: { before: wateringBefore.size, after: wateringAfter.length, moved: wateringAfter.filter((s) => !wateringBefore.has(s.date)).length },
    warnings: withRules.warnings.filter((w) => (PLACE_WARNING_CODES as readonly string[]).includes(w.code)),
  };
}
