import type { PlanContext } from "../context.ts";
import { civilFromDays, daysFromCivil, daysInMonth, monthOfDayNumber } from "../dates.ts";
import { formatNumber } from "../format.ts";
import { oneOffKey } from "../step-keys.ts";
import { FALL_FEEDING_PROGRAM as PROGRAM } from "../tables/feeding-program.ts";
import { AUTUMN_MONTHS } from "../tables/timing.ts";
import type { PlanStep, WarningFinding } from "../types.ts";
import { nitrogenAppliedPer1000 } from "./feeding.ts";

/*
 * A thick lawn doesn't need seed: the fall feeding program keeps it thick. The steps are only
 * produced here; season cut-offs and local blackout dates are later passes over every feed step.
 */
const TEXT = {
  title: (nth: number, of: number) => `Feed the lawn (fall feeding ${nth} of ${of})`,
  detail: (n: number, totalLb: string, area: string) =>
    `Spread a lawn fertilizer that gives about ${formatNumber(n, 2)} lb of nitrogen per 1,000 ft² (${totalLb} lb of nitrogen for your ${area} ft²). Slow-release nitrogen is best; not a weed-and-feed. Follow the bag's rate and sweep any off paths and driveways.`,
  why: "Your lawn is already thick, so it needs no seed. Feeding it a little at a time through the fall builds roots and keeps it thick next year.",
  crewSeeded:
    "This lawn is recorded as thick: seed isn't needed. Offer the fall feeding program instead: about 2 lb N per 1,000 ft² over the fall, in feedings of ¾–1 lb N, 4–6 weeks apart.",
  crewSeededReason: "A thick cool-season lawn thickens further from fall feeding; seed sown into it has little room to take.",
} as const;

const FEED_CAUTIONS = ["label_is_law", "children_pets", "phosphorus_rules"] as const;

/** Thick (or thick but summer-brown) cool-season lawn, nothing sown, visit in the fall. */
export function feedingProgramApplies(ctx: PlanContext): boolean {
  const condition = ctx.input.property.lawnCondition;
  return (
    !ctx.seeding &&
    (condition === "thick" || condition === "thick_dormant") &&
    ctx.lawnSeason === "cool" &&
    (AUTUMN_MONTHS[ctx.hemisphere] as readonly number[]).includes(monthOfDayNumber(ctx.visitDay))
  );
}

/** Offset from the visit of the last day of this fall (30 November up north, 31 May down south). */
function lastDayOfFall(ctx: PlanContext): number {
  const { year } = civilFromDays(ctx.visitDay);
  const months = AUTUMN_MONTHS[ctx.hemisphere];
  const month = months[months.length - 1]!;
  return daysFromCivil(year, month, daysInMonth(year, month)) - ctx.visitDay;
}

/** The day before the season closes to feeding (cold ground), so no feeding is planned only to be dropped. */
function lastOpenDay(ctx: PlanContext): number {
  for (const closed of ctx.season.feedingClosed) if (closed.to > 0) return closed.from - 1;
  return Number.POSITIVE_INFINITY;
}

export interface FeedingProgramPlan {
  /** Nitrogen the visit put down, per 1,000 ft². */
  readonly appliedAtVisit: number;
  /** The program's feedings still to come, as day offsets and lb N per 1,000 ft². */
  readonly feedings: readonly { readonly day: number; readonly nitrogenLbPer1000: number }[];
}

/**
 * What is left of the ~2 lb N after the visit's own feeding, split into the fewest feedings of at
 * most 1 lb (rounded to the quarter pound), 6 weeks apart, closer (never under 4) to fit before the
 * end of the fall, of the plan and of the season's feeding days. When even 4 weeks apart not all
 * fit, the ones that do carry
 * up to the 1 lb cap each and the total falls short rather than any feeding going over.
 */
export function feedingProgram(ctx: PlanContext): FeedingProgramPlan {
  const appliedAtVisit = nitrogenAppliedPer1000(ctx);
  const remaining = PROGRAM.totalLbNPer1000 - appliedAtVisit;
  if (remaining < PROGRAM.minPerFeedingLbN) return { appliedAtVisit, feedings: [] };
  const visitCounted = appliedAtVisit >= PROGRAM.countsAsFeedingFromLbN;
  const lastDay = Math.min(lastDayOfFall(ctx), ctx.timeline.planEnd, lastOpenDay(ctx));
  // Without a feeding at the visit, the first one goes down the next day.
  const first = visitCounted ? PROGRAM.minWeeksApart * 7 : 1;
  if (first > lastDay) return { appliedAtVisit, feedings: [] };
  const minApart = PROGRAM.minWeeksApart * 7;
  const fitting = 1 + Math.floor((lastDay - first) / minApart);
  // A remainder within half a rounding step of whole feedings needs no extra trip.
  const needed = Math.max(1, Math.ceil((remaining - PROGRAM.roundToLbN / 2) / PROGRAM.maxPerFeedingLbN));
  const count = Math.min(needed, fitting);
  const steps = 1 / PROGRAM.roundToLbN;
  const each = Math.min(PROGRAM.maxPerFeedingLbN, Math.round((remaining / count) * steps) / steps);
  // Spacing counts from the visit when its feeding was the first, else from the first feeding.
  const start = visitCounted ? 0 : first;
  const gaps = visitCounted ? count : count - 1;
  const preferred = PROGRAM.preferredWeeksApart * 7;
  const apart = gaps === 0 ? preferred : Math.max(minApart, Math.min(preferred, Math.floor((lastDay - start) / gaps)));
  const feedings = Array.from({ length: count }, (_, i) => ({
    day: visitCounted ? apart * (i + 1) : first + apart * i,
    nitrogenLbPer1000: each,
  }));
  return { appliedAtVisit, feedings };
}

export function feedingProgramSteps(ctx: PlanContext): PlanStep[] {
  if (!feedingProgramApplies(ctx)) return [];
  const { appliedAtVisit, feedings } = feedingProgram(ctx);
  const offset = appliedAtVisit >= PROGRAM.countsAsFeedingFromLbN ? 1 : 0;
  const area = ctx.input.visit.areaFt2;
  return feedings.map((f, i): PlanStep => ({
    key: oneOffKey("feed", `fall_program_${i + 1 + offset}`),
    date: ctx.dateOf(f.day),
    phase: ctx.phaseOf(f.day),
    kind: "feed",
    title: TEXT.title(i + 1 + offset, feedings.length + offset),
    detail: TEXT.detail(f.nitrogenLbPer1000, formatNumber((f.nitrogenLbPer1000 * area) / 1000), formatNumber(area, 0)),
    feed: { product: "slow_release_n", highNQuickRelease: false, nitrogenLbPer1000: f.nitrogenLbPer1000 },
    why: { text: TEXT.why, source: PROGRAM.source, provenance: PROGRAM.provenance },
    cautions: FEED_CAUTIONS,
  }));
}

/** For the crew: seed logged on a lawn recorded as thick, where the feeding program does more. */
export function feedingProgramFindings(ctx: PlanContext): WarningFinding[] {
  if (!ctx.seeding || ctx.input.property.lawnCondition !== "thick" || ctx.lawnSeason !== "cool") return [];
  return [
    {
      code: "thick_lawn_feeding_program",
      severity: "caution",
      message: TEXT.crewSeeded,
      reason: TEXT.crewSeededReason,
      source: PROGRAM.source,
      provenance: PROGRAM.provenance,
    },
  ];
}
