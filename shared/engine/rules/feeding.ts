import { nutrientsDelivered, phosphateFromPhosphorus } from "../../calculators/fertilizer.ts";
import type { PlanContext } from "../context.ts";
import { formatNumber } from "../format.ts";
import type { ProductApplied } from "../schemas/plan-input.ts";
import { oneOffKey } from "../step-keys.ts";
import { HIGH_N_QUICK_RELEASE_RULE, SINGLE_FEEDING_N, STARTER_FEEDING } from "../tables/feeding.ts";
import type { PlanStep } from "../types.ts";
import type { HoldOffWindow } from "./hold-offs.ts";

const FEED_CAUTIONS = ["label_is_law", "children_pets", "phosphorus_rules"] as const;

/** A starter is phosphorus-rich (at least as much P as N on the bag) or organic (Nebraska Extension 2021: "starter or organic"). */
export function isStarterProduct(product: ProductApplied): boolean {
  return product.organic === true || (product.analysis.p > 0 && product.analysis.p >= product.analysis.n);
}

/** Pounds of nitrogen per 1,000 ft² one product puts down: rate × N % (Nebraska Backyard Farmer, "Lawn Fertilizer Calculations"). */
export function nitrogenLbPer1000(product: ProductApplied): number {
  return (product.rateLbPer1000 * product.analysis.n) / 100;
}

/**
 * "High-N quick-release" (HIGH_N_QUICK_RELEASE_RULE): nitrogen the largest of
 * the three grades, and flagged quick-release or put down at a full feeding's
 * worth or more. The references give no percentage threshold, so the bag's
 * own balance and the published per-application amount decide rather than
 * an invented cut-off.
 */
export function isHighNQuickRelease(product: ProductApplied): boolean {
  const nitrogenLed = product.analysis.n > product.analysis.p && product.analysis.n > product.analysis.k;
  if (!nitrogenLed) return false;
  return product.quickReleaseN === true || nitrogenLbPer1000(product) >= HIGH_N_QUICK_RELEASE_RULE.fullFeedingLbNPer1000 - 1e-9;
}

export function starterAppliedAtVisit(ctx: PlanContext): boolean {
  return ctx.services.has("starter_fertiliser") || ctx.input.visit.products.some(isStarterProduct);
}

export function nitrogenAppliedPer1000(ctx: PlanContext): number {
  return ctx.input.visit.products.reduce(
    (sum, p) => sum + nutrientsDelivered(p.analysis, p.rateLbPer1000, ctx.input.visit.areaFt2).perThousand.n,
    0,
  );
}

export function feedingSteps(ctx: PlanContext, windows: readonly HoldOffWindow[]): PlanStep[] {
  const steps: PlanStep[] = [];
  const area = ctx.input.visit.areaFt2;

  // Seed lying dormant is fed when it starts to grow in spring, not on cold ground.
  const start = ctx.season.sowingStartDay;
  if (ctx.seeding && !starterAppliedAtVisit(ctx)) {
    const starterDay = Math.max(1, start);
    const date = ctx.dateOf(starterDay);
    steps.push({
      key: oneOffKey("feed", "starter"),
      date,
      phase: ctx.phaseOf(starterDay),
      kind: "feed",
      title: "Spread a starter fertilizer on the seeded lawn",
      detail: `Use a starter (phosphorus-rich) or organic lawn fertilizer. Aim for about ${formatNumber(phosphateFromPhosphorus(STARTER_FEEDING.minPLbPer1000))}–${formatNumber(phosphateFromPhosphorus(STARTER_FEEDING.maxPLbPer1000))} lb of phosphate (P₂O₅, the middle number on the bag) per 1,000 ft², which is ${STARTER_FEEDING.minPLbPer1000}–${STARTER_FEEDING.maxPLbPer1000} lb of phosphorus, or follow the bag. Not a weed-and-feed. Water lightly afterward as usual.`,
      feed: { product: "starter", highNQuickRelease: false },
      why: {
        text: "Seedlings need phosphorus to build roots; starter fertilizer puts it where the seed is.",
        source: `${STARTER_FEEDING.source}; ${STARTER_FEEDING.conversionSource}`,
        provenance: STARTER_FEEDING.provenance,
      },
      cautions: FEED_CAUTIONS,
    });
  }

  const highN = windows.find((w) => w.kind === "high_n_quick_release");
  const followUpDay = highN ? Math.max(highN.endDay, start + ctx.program.highNQuickReleaseHoldDays) + 1 : 0;
  if (ctx.seeding && highN && followUpDay <= ctx.timeline.planEnd) {
    // The follow-up feed is slow-release, yet it still waits out the high-N
    // window: a homeowner handed "feed the lawn" may reach for any bag.
    const day = followUpDay;
    const date = ctx.dateOf(day);
    const n = SINGLE_FEEDING_N.minLbPer1000;
    steps.push({
      key: oneOffKey("feed", "follow_up"),
      date,
      phase: ctx.phaseOf(day),
      kind: "feed",
      title: "Feed the new lawn with a slow-release fertilizer",
      detail: `Aim for about ${n} lb of nitrogen per 1,000 ft² (${formatNumber((n * area) / 1000)} lb for your ${formatNumber(area, 0)} ft²). Choose slow-release nitrogen, not a weed-and-feed.`,
      feed: { product: "slow_release_n", highNQuickRelease: false, nitrogenLbPer1000: n },
      restrictedBy: ["high_n_quick_release"],
      why: {
        text: "A light feeding once the seedlings are established helps them thicken before winter or summer stress.",
        source: SINGLE_FEEDING_N.source,
        provenance: SINGLE_FEEDING_N.provenance,
      },
      cautions: FEED_CAUTIONS,
    });
  }

  // A thick lawn's fall feedings are rules/feeding-program.ts.
  return steps;
}
