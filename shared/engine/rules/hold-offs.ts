import type { PlanContext } from "../context.ts";
import { toDayNumber } from "../dates.ts";
import { oneOffKey } from "../step-keys.ts";
import type { CautionId } from "../tables/cautions.ts";
import { HERBICIDE_AFTER_SEEDING_RULE, HIGH_N_QUICK_RELEASE_RULE, PRE_EMERGENT_RULE } from "../tables/feeding.ts";
import { FIRST_MOW_RULE } from "../tables/mowing.ts";
import type { Provenance } from "../tables/provenance.ts";
import { SOURCES } from "../tables/sources.ts";
import { PRIOR_PRE_EMERGENT_INTERVALS } from "../tables/pre-emergent.ts";
import type { HoldOff, HoldOffKind, PlanStep } from "../types.ts";
import { priorPreEmergentLastActiveDay } from "./pre-emergent.ts";

/**
 * A hold-off as day offsets from the visit; `endDay` is the last day still held off. "after_seeding"
 * windows keep products off the new seed; a "before_seeding" window comes from a product put down
 * before the visit that may still be active, so it starts on the day that product went down.
 */
export interface HoldOffWindow {
  readonly kind: HoldOffKind;
  readonly startDay: number;
  readonly endDay: number;
  readonly timing: "before_seeding" | "after_seeding";
}

/**
 * Before seeding: a pre-emergent put down in the months before the visit may still stop seed
 * until its label interval passes (tables/pre-emergent.ts, from memory), so no more seed goes
 * down on the lawn until then.
 */
export function beforeSeedingWindows(ctx: PlanContext): HoldOffWindow[] {
  const prior = ctx.input.visit.priorPreEmergent;
  const lastDay = priorPreEmergentLastActiveDay(ctx);
  if (!prior || lastDay === null) return [];
  return [{ kind: "new_seed", startDay: toDayNumber(prior.appliedOn) - ctx.visitDay, endDay: lastDay, timing: "before_seeding" }];
}

/**
 * Only new seed needs these windows. Herbicide windows last the program's
 * days AND until the new grass has had its several mowings, whichever is
 * later, because labels count mowings rather than days.
 */
export function holdOffWindows(ctx: PlanContext): HoldOffWindow[] {
  const { timeline } = ctx;
  if (!ctx.seeding || timeline.firstMow === null) return [];
  return [...beforeSeedingWindows(ctx), ...afterSeedingWindows(ctx, timeline.firstMow)];
}

function afterSeedingWindows(ctx: PlanContext, firstMow: number): HoldOffWindow[] {
  const { program } = ctx;
  const nthMowDay = firstMow + (program.mowingsBeforeHerbicide - 1) * FIRST_MOW_RULE.daysBetweenMowings;
  // Seed lying dormant is as vulnerable when it sprouts in spring as new seed: its windows count from then.
  const start = ctx.season.sowingStartDay;
  const herbicideEnd = Math.max(start + program.weedAndFeedHoldDays, nthMowDay);
  const after = "after_seeding" as const;
  return [
    { kind: "weed_and_feed", startDay: 0, endDay: herbicideEnd, timing: after },
    { kind: "broadleaf_herbicide", startDay: 0, endDay: herbicideEnd, timing: after },
    { kind: "crabgrass_pre_emergent", startDay: 0, endDay: start + program.preEmergentHoldDays, timing: after },
    { kind: "high_n_quick_release", startDay: 0, endDay: start + program.highNQuickReleaseHoldDays, timing: after },
    // Traffic stays off at least until the grass is firm enough for its first mowing.
    { kind: "heavy_traffic", startDay: 0, endDay: Math.max(program.trafficHoldDays, firstMow), timing: after },
  ];
}

const HOLD_OFF_TEXT: Readonly<Record<HoldOffKind, { why: string; source: string; provenance: Provenance; cautions: readonly CautionId[] }>> = {
  weed_and_feed: {
    why: "Weed-and-feed products stop seed from sprouting and injure seedlings. Wait until the new grass has been mowed several times.",
    source: HERBICIDE_AFTER_SEEDING_RULE.source,
    provenance: HERBICIDE_AFTER_SEEDING_RULE.provenance,
    cautions: ["label_is_law", "children_pets"],
  },
  broadleaf_herbicide: {
    why: "Broadleaf weed killers injure young grass. Pull weeds by hand for now; most die out once the lawn is mowed regularly.",
    source: HERBICIDE_AFTER_SEEDING_RULE.source,
    provenance: HERBICIDE_AFTER_SEEDING_RULE.provenance,
    cautions: ["label_is_law", "children_pets", "licensed_applicator"],
  },
  crabgrass_pre_emergent: {
    why: "Most crabgrass preventers also stop grass seed from growing. The product label sets the real waiting time.",
    source: PRE_EMERGENT_RULE.source,
    provenance: PRE_EMERGENT_RULE.provenance,
    cautions: ["label_is_law", "children_pets"],
  },
  high_n_quick_release: {
    why: "Strong quick-release nitrogen can burn seedlings and pushes soft top growth before roots are ready.",
    source: HIGH_N_QUICK_RELEASE_RULE.source,
    provenance: HIGH_N_QUICK_RELEASE_RULE.provenance,
    cautions: ["label_is_law", "phosphorus_rules"],
  },
  heavy_traffic: {
    why: "Feet, bikes and play crush seedlings and leave ruts in the soft seedbed.",
    source: SOURCES.tradePractice,
    provenance: "common practice",
    cautions: [],
  },
  new_seed: {
    why: "A weed preventer put down before the seeding may still be working in the soil, and it stops grass seed as well as weeds. More seed sown before it wears off would be wasted; the product label gives the waiting time.",
    source: PRIOR_PRE_EMERGENT_INTERVALS.crabgrass_preventer.source,
    provenance: PRIOR_PRE_EMERGENT_INTERVALS.crabgrass_preventer.provenance,
    cautions: ["label_is_law"],
  },
};

/** The source of a window's text: a before-seeding window cites the interval of the product actually named. */
function sourceOf(ctx: PlanContext, w: HoldOffWindow): Pick<HoldOff, "source" | "provenance"> {
  const prior = ctx.input.visit.priorPreEmergent;
  if (w.timing === "before_seeding" && prior) {
    const interval = PRIOR_PRE_EMERGENT_INTERVALS[prior.product];
    return { source: interval.source, provenance: interval.provenance };
  }
  return { source: HOLD_OFF_TEXT[w.kind].source, provenance: HOLD_OFF_TEXT[w.kind].provenance };
}

export function holdOffsFor(ctx: PlanContext, windows: readonly HoldOffWindow[]): HoldOff[] {
  return windows.map((w) => ({
    kind: w.kind,
    start: ctx.dateOf(w.startDay),
    end: ctx.dateOf(w.endDay),
    ...HOLD_OFF_TEXT[w.kind],
    ...sourceOf(ctx, w),
  }));
}

/** Notes on the first day weed control, or more seed, is allowed again, so the homeowner hears when the wait is over. */
export function holdOffEndSteps(ctx: PlanContext, windows: readonly HoldOffWindow[]): PlanStep[] {
  return [...weedControlAllowedSteps(ctx, windows), ...newSeedAllowedSteps(ctx, windows)];
}

function newSeedAllowedSteps(ctx: PlanContext, windows: readonly HoldOffWindow[]): PlanStep[] {
  const window = windows.find((w) => w.kind === "new_seed");
  if (!window || window.endDay + 1 > ctx.timeline.planEnd) return [];
  const day = window.endDay + 1;
  return [
    {
      key: oneOffKey("note", "new_seed_allowed"),
      date: ctx.dateOf(day),
      phase: ctx.phaseOf(day),
      kind: "note",
      title: "Bare patches can be re-seeded from now on",
      detail: "The weed preventer put down before the seeding should have worn off by now. If some patches stayed bare, send us a photo and we will re-seed them. Check the product label if you still have it.",
      restrictedBy: ["new_seed"],
      why: { text: HOLD_OFF_TEXT.new_seed.why, ...sourceOf(ctx, window) },
      cautions: ["label_is_law"],
    },
  ];
}

function weedControlAllowedSteps(ctx: PlanContext, windows: readonly HoldOffWindow[]): PlanStep[] {
  const herbicide = windows.filter((w) => w.kind === "weed_and_feed" || w.kind === "broadleaf_herbicide");
  if (herbicide.length === 0) return [];
  const day = Math.max(...herbicide.map((w) => w.endDay)) + 1;
  if (day > ctx.timeline.planEnd) return [];
  const date = ctx.dateOf(day);
  return [
    {
      key: oneOffKey("note", "weed_control_allowed"),
      date,
      phase: ctx.phaseOf(day),
      kind: "note",
      title: "Weed control is allowed again if the lawn needs it",
      detail: "The new grass has had time and mowings enough. If weeds are still a problem, ask us or follow the product label exactly.",
      restrictedBy: ["weed_and_feed", "broadleaf_herbicide"],
      why: { text: HOLD_OFF_TEXT.weed_and_feed.why, source: HERBICIDE_AFTER_SEEDING_RULE.source, provenance: HERBICIDE_AFTER_SEEDING_RULE.provenance },
      cautions: ["label_is_law", "children_pets"],
    },
  ];
}

/** True when a step's date falls inside any hold-off it is restricted by. */
export function violatesHoldOff(step: PlanStep, holdOffs: readonly HoldOff[]): boolean {
  const restricted = step.restrictedBy ?? [];
  return holdOffs.some((h) => restricted.includes(h.kind) && step.date >= h.start && step.date <= h.end);
}

