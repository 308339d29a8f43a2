import { buildContext, type PlanContext } from "./context.ts";
import { checkInSteps } from "./rules/check-ins.ts";
import { feedingSteps } from "./rules/feeding.ts";
import { feedingProgramFindings, feedingProgramSteps } from "./rules/feeding-program.ts";
import { holdOffEndSteps, holdOffsFor, holdOffWindows } from "./rules/hold-offs.ts";
import { mowingSteps } from "./rules/mowing.ts";
import { aerationCoreSteps, prepSteps } from "./rules/prep.ts";
import { leafCleanupSteps, thatchCleanupSteps } from "./rules/seasonal.ts";
import { nitrogenWarnings } from "./rules/nitrogen-warnings.ts";
import { applyPlaceRules, placeRuleFindings } from "./rules/place-rules.ts";
import { warningsForAudiences } from "./rules/audiences.ts";
import { planWarnings } from "./rules/warnings.ts";
import { priorPreEmergentFindings } from "./rules/pre-emergent.ts";
import { situationHoldOffs, sodPass, slopeAndShadePasses, situationSteps, situationWarnings } from "./rules/situations.ts";
import { wateringSteps } from "./rules/watering.ts";
import { warmSeasonWarnings } from "./rules/warm-season.ts";
import { frozenGroundWatering, seasonFeedCutoff } from "./rules/season.ts";
import { dormantSeedingSteps } from "./rules/season-advice.ts";
import { hashInput } from "./hash.ts";
import type { PlanInput } from "./schemas/plan-input.ts";
import { sortSteps } from "./steps.ts";
import { calculatorSummary } from "./summary.ts";
import { CAUTION_IDS, CAUTIONS, type CautionId } from "./tables/cautions.ts";
import type { HoldOff, PhaseRange, Plan, PlanStep, PlanWarning, WarningFinding } from "./types.ts";

/** Bump when the same input would produce a different plan, so stored plans can be told apart. */
export const ENGINE_VERSION = 3;

/*
 * Post-passes every step goes through, whichever rule made it: sod's own watering and mowing,
 * no watering on cold or frozen ground, no feeding after the season's cut-off, the company's
 * rules for the lawn's place (which move feedings and waterings only to days the season leaves
 * open), then cycle-and-soak on slopes (on the days waterings finally fall) and less nitrogen in
 * shade. Rules that add feeding or watering get all of them by being listed before this.
 */
function postPasses(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  const seasonal = seasonFeedCutoff(ctx, frozenGroundWatering(ctx, sodPass(ctx, steps)));
  return slopeAndShadePasses(ctx, applyPlaceRules(ctx, seasonal));
}

/** Steps the homeowner reported skipping keep their place in the plan, marked skipped. */
function applySkips(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  if (ctx.skippedKeys.size === 0) return steps;
  return steps.map((s) => (ctx.skippedKeys.has(s.key) && s.state === undefined ? { ...s, state: "skipped" } : s));
}

/*
 * A plan made on `options.today` for a visit already past (logged today, or imported) starts on
 * that day: steps before it can no longer be done, so they are left out rather than shown as
 * missed. Same rule as recomputePlan, which only ever takes a fresh plan from today on.
 */
function fromToday(ctx: PlanContext, steps: PlanStep[]): PlanStep[] {
  const today = ctx.input.options.today;
  return today === undefined ? steps : steps.filter((s) => s.date >= today);
}

function phaseRanges(ctx: PlanContext, prep: readonly PlanStep[]): PhaseRange[] {
  const { timeline } = ctx;
  const ranges: PhaseRange[] = [];
  const first = prep[0];
  if (first) ranges.push({ phase: "prep", start: first.date, end: ctx.dateOf(-1) });
  let next = 0;
  if (timeline.germinationEnd !== null) {
    ranges.push({ phase: "germination", start: ctx.dateOf(0), end: ctx.dateOf(timeline.germinationEnd) });
    next = timeline.germinationEnd + 1;
  }
  ranges.push({ phase: "establishment", start: ctx.dateOf(next), end: ctx.dateOf(timeline.establishmentEnd) });
  ranges.push({ phase: "maturing", start: ctx.dateOf(timeline.establishmentEnd + 1), end: ctx.dateOf(timeline.planEnd) });
  return ranges;
}

function cautionsUsed(groups: readonly (readonly { cautions: readonly CautionId[] }[])[]): Plan["cautions"] {
  const used = new Set<CautionId>();
  for (const group of groups) for (const item of group) for (const id of item.cautions) used.add(id);
  return CAUTION_IDS.filter((id) => used.has(id)).map((id) => ({ id, text: CAUTIONS[id].text }));
}

/**
 * The warnings a visit would get, the same as its plan's, without the rest of the plan: cheap
 * enough to run on every keystroke of the visit form.
 */
export function visitWarnings(input: PlanInput): PlanWarning[] {
  const ctx = buildContext(input);
  return warningsForAudiences(ctx, findings(ctx));
}

/** Everything the rules find about a visit, before it is worded for crew and homeowner. */
function findings(ctx: PlanContext): WarningFinding[] {
  return [
    ...planWarnings(ctx),
    ...nitrogenWarnings(ctx),
    ...warmSeasonWarnings(ctx),
    ...placeRuleFindings(ctx),
    ...priorPreEmergentFindings(ctx),
    ...feedingProgramFindings(ctx),
    ...situationWarnings(ctx),
  ];
}

/**
 * The care plan for one visit. Pure and deterministic: it reads no clock and
 * no zone but the property's, so the same (already validated) input always
 * gives a deep-equal plan. Validate untrusted input with parsePlanInput first.
 */
export function generatePlan(input: PlanInput): Plan {
  const ctx = buildContext(input);
  const windows = holdOffWindows(ctx);
  const holdOffs: HoldOff[] = [...holdOffsFor(ctx, windows), ...situationHoldOffs(ctx)];
  const prep = sortSteps(fromToday(ctx, applySkips(ctx, prepSteps(ctx))));
  const steps = sortSteps(
    fromToday(
      ctx,
      applySkips(
        ctx,
        postPasses(ctx, [
          ...thatchCleanupSteps(ctx),
          ...aerationCoreSteps(ctx),
          ...wateringSteps(ctx),
          ...mowingSteps(ctx),
          ...feedingSteps(ctx, windows),
          ...feedingProgramSteps(ctx),
          ...holdOffEndSteps(ctx, windows),
          ...leafCleanupSteps(ctx),
          ...checkInSteps(ctx),
          ...dormantSeedingSteps(ctx),
          ...situationSteps(ctx),
        ]),
      ),
    ),
  );
  const { timeline } = ctx;
  return {
    meta: {
      engineVersion: ENGINE_VERSION,
      programVersion: input.program.version,
      inputHash: hashInput(input),
      visitDate: input.visit.date,
      timeZone: ctx.zone,
      hemisphere: ctx.hemisphere,
      seeding: ctx.seeding,
      phases: phaseRanges(ctx, prep),
      firstMowDate: timeline.firstMow === null ? null : ctx.dateOf(timeline.firstMow),
      germinationWateringEnds: timeline.germinationEnd === null ? null : ctx.dateOf(timeline.germinationEnd),
      planEnds: ctx.dateOf(timeline.planEnd),
      season: ctx.season.check,
    },
    prepSteps: prep,
    steps,
    holdOffs,
    warnings: warningsForAudiences(ctx, findings(ctx)),
    summary: calculatorSummary(ctx),
    cautions: cautionsUsed([prep, steps, holdOffs]),
  };
}
