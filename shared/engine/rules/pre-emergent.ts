import type { PlanContext } from "../context.ts";
import { toDayNumber } from "../dates.ts";
import type { PriorPreEmergent } from "../schemas/plan-input.ts";
import {
  LABELLED_AT_SEEDING,
  LABELLED_AT_SEEDING_RULE,
  PRE_EMERGENT_INGREDIENT_NAMES,
  PRIOR_PRE_EMERGENT_INTERVALS,
  type PriorPreEmergentProduct,
} from "../tables/pre-emergent.ts";
import type { WarningFinding, WarningSeverity } from "../types.ts";

/*
 * A crabgrass preventer, weed-and-feed or other pre-emergent put down BEFORE the seeding may still
 * be in the soil when the seed goes down: the seed then fails. (Products put down AFTER seeding are
 * the hold-offs of rules/hold-offs.ts.) Crew words name products and intervals; the homeowner's
 * words say what to expect and what to do, never whose product it was.
 */
const PRODUCT_WORDS: Readonly<Record<PriorPreEmergentProduct, { crew: string; homeowner: string }>> = {
  crabgrass_preventer: { crew: "A crabgrass preventer", homeowner: "the crabgrass preventer" },
  weed_and_feed: { crew: "A weed-and-feed", homeowner: "the weed-and-feed" },
  other_pre_emergent: { crew: "A pre-emergent herbicide", homeowner: "the weed preventer" },
};

const TEXT = {
  crewRisk: (what: string, elapsed: string, interval: string) =>
    `${what} went down ${elapsed}, inside the usual ${interval}-week label interval: expect much of the seed to fail. Check the label; re-seed bare spots once its interval has passed.`,
  crewCaution: (what: string, elapsed: string, interval: string) =>
    `${what} went down ${elapsed}, near the end of the usual ${interval}-week label interval: it may still stop some seed. Check the label; re-seed thin spots once its interval has passed.`,
  reason: "Pre-emergent herbicides stop seeds from establishing, grass seed included, for as long as they stay active in the soil.",
  crewLabelledAtSeeding: (ingredient: string) =>
    `The product put down before seeding contains ${ingredient}, which some labels allow at seeding time. Confirm this product's label allows it; if not, expect poor germination.`,
  labelledAtSeedingReason: "A few pre-emergent ingredients are labelled for use at seeding; the label of the product used is the rule.",
  homeowner: (what: string, severity: WarningSeverity) =>
    severity === "risk"
      ? `${capitalise(what)} put down on your lawn before the seeding may keep some of the new seed from sprouting. Keep watering as planned; if patches stay bare, send us a photo and we will re-seed them once it is safe.`
      : `${capitalise(what)} put down on your lawn a while ago may still slow some of the new seed. Keep watering as planned, and send us a photo of any patches that stay bare.`,
  homeownerReason: "Weed preventers stop seeds from sprouting, grass seed too, until they wear off.",
} as const;

/** "5 days before this seeding", "9 weeks before…": weeks once there are two of them. */
function elapsedWords(days: number): string {
  if (days === 0) return "on the day of this seeding";
  if (days < 14) return `${days} ${days === 1 ? "day" : "days"} before this seeding`;
  return `${Math.floor(days / 7)} weeks before this seeding`;
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** Days between the earlier product and the visit; 0 when it went down that very day. */
export function daysSincePriorPreEmergent(ctx: PlanContext, prior: PriorPreEmergent): number {
  return ctx.visitDay - toDayNumber(prior.appliedOn);
}

/** True when the crew named an ingredient that some labels allow at seeding (siduron, mesotrione). */
export function labelledAtSeeding(prior: PriorPreEmergent): boolean {
  return prior.activeIngredient !== undefined && LABELLED_AT_SEEDING.has(prior.activeIngredient);
}

/**
 * The last day (offset from the visit) the earlier product may still stop seed, or null when its
 * usual interval ended before the visit, the ingredient is labelled for seeding, or nothing was sown.
 */
export function priorPreEmergentLastActiveDay(ctx: PlanContext): number | null {
  const prior = ctx.input.visit.priorPreEmergent;
  if (!ctx.seeding || !prior || labelledAtSeeding(prior)) return null;
  const interval = PRIOR_PRE_EMERGENT_INTERVALS[prior.product];
  const lastDay = interval.possibleUntilWeeks * 7 - 1 - daysSincePriorPreEmergent(ctx, prior);
  return lastDay >= 0 ? lastDay : null;
}

export function priorPreEmergentFindings(ctx: PlanContext): WarningFinding[] {
  const prior = ctx.input.visit.priorPreEmergent;
  if (!ctx.seeding || !prior) return [];
  if (labelledAtSeeding(prior)) {
    return [
      {
        code: "pre_emergent_labelled_at_seeding",
        severity: "info",
        message: TEXT.crewLabelledAtSeeding(PRE_EMERGENT_INGREDIENT_NAMES[prior.activeIngredient!]),
        reason: TEXT.labelledAtSeedingReason,
        source: LABELLED_AT_SEEDING_RULE.source,
        provenance: LABELLED_AT_SEEDING_RULE.provenance,
      },
    ];
  }
  if (priorPreEmergentLastActiveDay(ctx) === null) return [];
  const interval = PRIOR_PRE_EMERGENT_INTERVALS[prior.product];
  const days = daysSincePriorPreEmergent(ctx, prior);
  const risk = days < interval.riskUntilWeeks * 7;
  const range = `${interval.riskUntilWeeks}–${interval.possibleUntilWeeks}`;
  const what = PRODUCT_WORDS[prior.product].crew;
  return [
    {
      code: "pre_emergent_before_seeding",
      severity: risk ? "risk" : "caution",
      message: risk ? TEXT.crewRisk(what, elapsedWords(days), range) : TEXT.crewCaution(what, elapsedWords(days), range),
      reason: TEXT.reason,
      source: interval.source,
      provenance: interval.provenance,
    },
  ];
}

/** The homeowner's version (rules/audiences.ts): what to expect and what to do. */
export function preEmergentHomeownerWording(ctx: PlanContext, finding: WarningFinding) {
  const prior = ctx.input.visit.priorPreEmergent;
  if (!prior) return null;
  return {
    severity: finding.severity,
    message: TEXT.homeowner(PRODUCT_WORDS[prior.product].homeowner, finding.severity),
    reason: TEXT.homeownerReason,
  };
}
