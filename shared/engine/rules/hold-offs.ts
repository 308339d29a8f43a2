import type { PlanContext } from "../context.ts";
import { oneOffKey } from "../step-keys.ts";
import type { CautionId } from "../tables/cautions.ts";
import { HERBICIDE_AFTER_SEEDING_RULE, HIGH_N_QUICK_RELEASE_RULE, PRE_EMERGENT_RULE } from "../tables/feeding.ts";
import { FIRST_MOW_RULE } from "../tables/mowing.ts";
import type { Provenance } from "../tables/provenance.ts";
import { SOURCES } from "../tables/sources.ts";
import type { HoldOff, HoldOffKind, PlanStep } from "../types.ts";

/** A hold-off as day offsets from the visit; `endDay` is the last day still held off. */
export interface HoldOffWindow {
  readonly kind: HoldOffKind;
  readonly startDay: number;
  readonly endDay: number;
}

/**
 * Only new seed needs these windows. Herbicide windows last the program's
 * days AND until the new grass has had its several mowings, whichever is
 * later, because labels count mowings rather than days.
 */
export function holdOffWindows(ctx: PlanContext): HoldOffWindow[] {
  const { timeline, program } = ctx;
  if (!ctx.seeding || timeline.firstMow === null) return [];
  const nthMowDay = timeline.firstMow + (program.mowingsBeforeHerbicide - 1) * FIRST_MOW_RULE.daysBetweenMowings;
  // Seed lying dormant is as vulnerable when it sprouts in spring as new seed: its windows count from then.
  const start = ctx.season.sowingStartDay;
  const herbicideEnd = Math.max(start + program.weedAndFeedHoldDays, nthMowDay);
  return [
    { kind: "weed_and_feed", startDay: 0, endDay: herbicideEnd },
    { kind: "broadleaf_herbicide", startDay: 0, endDay: herbicideEnd },
    { kind: "crabgrass_pre_emergent", startDay: 0, endDay: start + program.preEmergentHoldDays },
    { kind: "high_n_quick_release", startDay: 0, endDay: start + program.highNQuickReleaseHoldDays },
    // Traffic stays off at least until the grass is firm enough for its first mowing.
    { kind: "heavy_traffic", startDay: 0, endDay: Math.max(program.trafficHoldDays, timeline.firstMow) },
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
};

export function holdOffsFor(ctx: PlanContext, windows: readonly HoldOffWindow[]): HoldOff[] {
  return windows.map((w) => ({
    kind: w.kind,
    start: ctx.dateOf(w.startDay),
    end: ctx.dateOf(w.endDay),
    ...HOLD_OFF_TEXT[w.kind],
  }));
}

/** A note on the first day weed control is allowed again, so the homeowner hears when the wait is over. */
export function holdOffEndSteps(ctx: PlanContext, windows: readonly HoldOffWindow[]): PlanStep[] {
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

