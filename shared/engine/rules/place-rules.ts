import type { PlanContext } from "../context.ts";
import { formatDate } from "../format.ts";
import { civilFromDays, minutesOfLocalTime, localTimeFromMinutes, toDayNumber } from "../dates.ts";
import type { BlackoutWindow, PlaceRules } from "../schemas/place-rules.ts";
import { dateOfKey, oneOffKey } from "../step-keys.ts";
import type { CautionId } from "../tables/cautions.ts";
import { FEED_DELAY_LIMIT_DAYS, PLACE_RULES_SOURCE, WATERING_MOVE_LIMIT_DAYS } from "../tables/place-rules.ts";
import type { Why } from "../tables/provenance.ts";
import { TAPER_RULE } from "../tables/watering.ts";
import type { PlanStep, WarningFinding } from "../types.ts";
import { inRanges } from "./season.ts";
import { isSodInstallation } from "./sod.ts";
import { SOD_WATERING } from "../tables/sod.ts";

/*
 * The company's rules for the place a lawn is in: fertilizer blackout dates, phosphorus only
 * with a reason, allowed watering days. A post-pass over the plan's steps, so each rule module
 * stays unaware of places. The rules are what the company entered, never law the engine knows.
 */

const WEEKDAY_NAMES = ["Sunday", "Monday", "Tuesday", "Wednesday", "Thursday", "Friday", "Saturday"] as const;

const TEXT = {
  feedMoved: (place: string, window: string, from: string) =>
    ` Moved from ${from}: ${place} allows no fertilizer from ${window}.`,
  feedDroppedTitle: "No feeding for now: local fertilizer dates",
  feedDroppedDetail: (place: string, window: string, what: string) =>
    `${place} allows no fertilizer from ${window}. By the time that ends this feeding would come too late, so your plan leaves it out (it was: “${what}”). Ask us about feeding once the window is over.`,
  feedDroppedWhy: "Some states and counties ban lawn fertilizer on certain dates, for example over winter or in the rainy season, to keep it out of lakes and streams.",
  wateringMoved: (place: string, days: string) => ` Moved to a day ${place} allows watering (${days}).`,
  newLawnStep: (place: string) => ` ${place} limits watering days: see the note on new lawns in your plan.`,
  blackoutVisitMessage: (place: string, window: string) =>
    `Fertilizer was applied at this visit, inside a blackout window of ${place} (${window}).`,
  blackoutVisitReason: "The company's rules for this place allow no fertilizer on these dates.",
  phosphorusMessage: (place: string, products: string) =>
    `${place} allows phosphorus only with a reason (new seeding or a soil test), and this visit records neither. Phosphorus in: ${products}.`,
  phosphorusReason: "Phosphorus a lawn doesn't need washes into lakes and streams; places that limit it accept new seeding or a soil test showing a need.",
  newLawnCrew: (place: string, days: string, exemption: string, until: string) =>
    `${place} allows watering only on ${days}${exemption}; the new seed needs watering every day until ${until}. Check whether the water utility grants new lawns an exemption or permit.`,
  newLawnHomeowner: (days: string, until: string) =>
    `Lawn watering in your area is allowed only on ${days}, but new seed needs water every day until about ${until}. Please check with your water utility: some allow new lawns to be watered more often for a few weeks, sometimes with a permit.`,
  newLawnReason: "Seed that dries out after it starts to sprout dies, and watering rules set by the water utility still apply.",
  exemption: (days: number) => ` (new lawns exempt for the first ${days} days)`,
} as const;

const FEED_CAUTIONS: readonly CautionId[] = ["label_is_law", "phosphorus_rules", "local_ordinances"];

const feedDroppedWhy: Why = { text: TEXT.feedDroppedWhy, source: PLACE_RULES_SOURCE, provenance: "common practice" };

/** Month-day as one comparable number: November 15 → 1115. */
const monthDayNumber = (month: number, day: number) => month * 100 + day;

function parseMonthDay(text: string): number {
  return monthDayNumber(Number(text.slice(0, 2)), Number(text.slice(3, 5)));
}

interface Window {
  readonly from: number;
  readonly to: number;
  readonly text: string;
}

/** "11-15" → "November 15", worded as the engine words any date. */
function monthDayText(text: string): string {
  return formatDate(`2000-${text}`);
}

function windowsOf(blackouts: readonly BlackoutWindow[]): Window[] {
  return blackouts.map((w) => ({ from: parseMonthDay(w.from), to: parseMonthDay(w.to), text: `${monthDayText(w.from)} to ${monthDayText(w.to)}` }));
}

/** Both ends included; a window ending before it starts runs over New Year. */
function windowHolding(windows: readonly Window[], dayNumber: number): Window | null {
  if (windows.length === 0) return null;
  const { month, day } = civilFromDays(dayNumber);
  const md = monthDayNumber(month, day);
  for (const w of windows) {
    if (w.from <= w.to ? md >= w.from && md <= w.to : md >= w.from || md <= w.to) return w;
  }
  return null;
}

/** Whether a date falls inside any of the blackout windows (exported for tests and callers checking a date). */
export function inFertilizerBlackout(blackouts: readonly BlackoutWindow[], date: string): boolean {
  return windowHolding(windowsOf(blackouts), toDayNumber(date)) !== null;
}

/** 0 = Sunday. Day number 0 (1970-01-01) was a Thursday. */
export function weekdayOfDayNumber(dayNumber: number): number {
  return (((dayNumber + 4) % 7) + 7) % 7;
}

function listText(items: readonly string[]): string {
  if (items.length <= 1) return items.join("");
  return `${items.slice(0, -1).join(", ")} and ${items[items.length - 1]}`;
}

function weekdaysText(allowed: readonly number[]): string {
  // Monday first, as a week reads on a US calendar's watering schedule.
  return listText([1, 2, 3, 4, 5, 6, 0].filter((d) => allowed.includes(d)).map((d) => WEEKDAY_NAMES[d] ?? ""));
}

const withCaution = (cautions: readonly CautionId[], id: CautionId): readonly CautionId[] => (cautions.includes(id) ? cautions : [...cautions, id]);

function rekey(step: PlanStep, date: string): string {
  const old = dateOfKey(step.key);
  return old === null ? step.key : step.key.replace(old, date);
}

/** The last day offset of watering meant for a new lawn (germination and the taper after it, or new sod's own); null otherwise. */
function newLawnLastDay(ctx: PlanContext): number | null {
  if (isSodInstallation(ctx)) return Math.min(ctx.timeline.planEnd, SOD_WATERING.lastDay);
  const end = ctx.timeline.germinationEnd;
  if (end === null) return null;
  return Math.min(ctx.timeline.planEnd, end + TAPER_RULE.onceADayDays + TAPER_RULE.everyOtherDayDays);
}

function movedFeed(ctx: PlanContext, step: PlanStep, offset: number, window: Window, place: string): PlanStep {
  const date = ctx.dateOf(offset);
  return {
    ...step,
    key: rekey(step, date),
    date,
    phase: ctx.phaseOf(offset),
    detail: step.detail + TEXT.feedMoved(place, window.text, formatDate(step.date)),
    cautions: withCaution(step.cautions, "local_ordinances"),
  };
}

function droppedFeed(step: PlanStep, window: Window, place: string): PlanStep {
  return {
    key: oneOffKey("note", `no_feed_${step.key.replace(/:/g, "_")}`),
    date: step.date,
    phase: step.phase,
    kind: "note",
    title: TEXT.feedDroppedTitle,
    detail: TEXT.feedDroppedDetail(place, window.text, step.title),
    why: feedDroppedWhy,
    cautions: FEED_CAUTIONS,
  };
}

/** A feeding inside a blackout moves to the first day after it if still useful, else becomes a note. */
function placeFeed(ctx: PlanContext, step: PlanStep, windows: readonly Window[], place: string): PlanStep {
  const day = toDayNumber(step.date);
  const window = windowHolding(windows, day);
  if (window === null) return step;
  const limit = step.feed?.product === "starter" ? FEED_DELAY_LIMIT_DAYS.starter : FEED_DELAY_LIMIT_DAYS.other;
  const offset = day - ctx.visitDay;
  for (let wait = 1; wait <= limit && offset + wait <= ctx.timeline.planEnd; wait++) {
    // Never onto a day the season check closed to feeding (cold ground, end of the season).
    if (windowHolding(windows, day + wait) === null && inRanges(offset + wait, ctx.season.feedingClosed) === null) {
      return movedFeed(ctx, step, offset + wait, window, place);
    }
  }
  return droppedFeed(step, window, place);
}

/**
 * Deep watering on a day the place does not allow moves to the nearest allowed day of its week
 * that has no watering yet, later first; with none free it is left out (the week's others and
 * rain carry the lawn). Watering for a new lawn stays daily: seed must not dry out.
 */
function placeWatering(ctx: PlanContext, steps: readonly PlanStep[], rules: PlaceRules): PlanStep[] {
  const watering = rules.watering;
  if (!watering || watering.allowedWeekdays.length === 7) return [...steps];
  const allowed = new Array<boolean>(7).fill(false);
  for (const d of watering.allowedWeekdays) allowed[d] = true;
  const newLawnLast = newLawnLastDay(ctx) ?? -1;
  const exemptBefore = watering.newLawnExemptDays;
  const today = ctx.input.options.today;
  const firstDay = today === undefined ? 0 : Math.max(0, toDayNumber(today) - ctx.visitDay);
  const lastDay = ctx.frostDay !== null ? Math.min(ctx.timeline.planEnd, ctx.frostDay - 1) : ctx.timeline.planEnd;
  const daysText = weekdaysText(watering.allowedWeekdays);

  // Days that already have a watering (or a "rain did the job" note in its place).
  const taken = new Set<number>();
  for (const s of steps) if (s.kind === "water" || (s.kind === "note" && s.key.endsWith(":rain"))) taken.add(toDayNumber(s.date) - ctx.visitDay);

  const free = (offset: number) =>
    offset >= firstDay &&
    offset <= lastDay &&
    !taken.has(offset) &&
    allowed[weekdayOfDayNumber(ctx.visitDay + offset)] === true &&
    inRanges(offset, ctx.season.wateringClosed) === null;
  const deepStart = minutesOfLocalTime(ctx.program.deepWateringTime);

  const out: PlanStep[] = [];
  for (const step of steps) {
    if (step.kind !== "water") {
      out.push(step);
      continue;
    }
    const offset = toDayNumber(step.date) - ctx.visitDay;
    if (allowed[weekdayOfDayNumber(ctx.visitDay + offset)] === true) {
      out.push(step);
      continue;
    }
    if (offset <= newLawnLast) {
      out.push(offset < exemptBefore ? step : { ...step, detail: step.detail + TEXT.newLawnStep(rules.name), cautions: withCaution(step.cautions, "local_ordinances") });
      continue;
    }
    let target: number | null = null;
    for (let shift = WATERING_MOVE_LIMIT_DAYS.min; shift <= WATERING_MOVE_LIMIT_DAYS.max && target === null; shift++) {
      if (free(offset + shift)) target = offset + shift;
      else if (free(offset - shift)) target = offset - shift;
    }
    taken.delete(offset);
    if (target === null) continue;
    taken.add(target);
    const date = ctx.dateOf(target);
    const real = ctx.clock.nearestReal(ctx.visitDay + target, deepStart);
    out.push({
      ...step,
      key: rekey(step, date),
      date,
      phase: ctx.phaseOf(target),
      times: step.times && step.times.length > 0 ? [localTimeFromMinutes(real)] : step.times,
      detail: step.detail + TEXT.wateringMoved(rules.name, daysText),
      cautions: withCaution(step.cautions, "local_ordinances"),
    });
  }
  return out;
}

/** The plan's steps with the place's rules applied; the steps as given when the lawn's place has none. */
export function applyPlaceRules(ctx: PlanContext, steps: readonly PlanStep[]): PlanStep[] {
  const rules = ctx.input.placeRules;
  if (!rules) return steps as PlanStep[];
  const windows = windowsOf(rules.fertilizerBlackouts);
  const fed = windows.length === 0 ? steps : steps.map((s) => (s.kind === "feed" ? placeFeed(ctx, s, windows, rules.name) : s));
  // Sorted by date so moved waterings claim free days in order.
  const byDate = [...fed].sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  return placeWatering(ctx, byDate, rules);
}

function appliesFertilizer(ctx: PlanContext): boolean {
  return ctx.input.visit.products.length > 0 || ctx.services.has("starter_fertiliser") || ctx.services.has("fertiliser_only");
}

function newLawnWateringRestricted(ctx: PlanContext): { rules: PlaceRules; until: string } | null {
  const rules = ctx.input.placeRules;
  const last = newLawnLastDay(ctx);
  if (!rules?.watering || rules.watering.allowedWeekdays.length === 7 || last === null) return null;
  if (last < rules.watering.newLawnExemptDays) return null;
  return { rules, until: formatDate(ctx.dateOf(last)) };
}

/** Shared, never mutated: most plans have no place rules, and the engine runs 10,000 plans a batch. */
const NO_FINDINGS: readonly WarningFinding[] = [];

/** What the place's rules find about the visit itself, for the crew (and, for watering, the homeowner). */
export function placeRuleFindings(ctx: PlanContext): readonly WarningFinding[] {
  const rules = ctx.input.placeRules;
  if (!rules) return NO_FINDINGS;
  const findings: WarningFinding[] = [];
  const { visit } = ctx.input;

  const visitWindow = appliesFertilizer(ctx) ? windowHolding(windowsOf(rules.fertilizerBlackouts), ctx.visitDay) : null;
  if (visitWindow) {
    findings.push({
      code: "fertilizer_in_blackout",
      severity: "risk",
      message: TEXT.blackoutVisitMessage(rules.name, visitWindow.text),
      reason: TEXT.blackoutVisitReason,
      source: PLACE_RULES_SOURCE,
      provenance: "common practice",
    });
  }

  const withPhosphorus = visit.products.filter((p) => p.analysis.p > 0).map((p) => p.name);
  if (withPhosphorus.length === 0 && ctx.services.has("starter_fertiliser")) withPhosphorus.push("starter fertilizer");
  // Seed sown at the visit (new lawn or repair) is the "new seeding" reason such rules accept.
  const reason = ctx.seeding || visit.soilTestCallsForPhosphorus === true;
  if (rules.phosphorus === "needs_reason" && withPhosphorus.length > 0 && !reason) {
    findings.push({
      code: "phosphorus_without_reason",
      severity: "risk",
      message: TEXT.phosphorusMessage(rules.name, withPhosphorus.join(", ")),
      reason: TEXT.phosphorusReason,
      source: PLACE_RULES_SOURCE,
      provenance: "common practice",
    });
  }

  const restricted = newLawnWateringRestricted(ctx);
  if (restricted) {
    const { watering } = restricted.rules;
    findings.push({
      code: "watering_days_limit_new_lawn",
      severity: "caution",
      message: TEXT.newLawnCrew(
        restricted.rules.name,
        weekdaysText(watering?.allowedWeekdays ?? []),
        watering && watering.newLawnExemptDays > 0 ? TEXT.exemption(watering.newLawnExemptDays) : "",
        restricted.until,
      ),
      reason: TEXT.newLawnReason,
      source: PLACE_RULES_SOURCE,
      provenance: "common practice",
    });
  }
  return findings;
}

/** The homeowner's wording of watering_days_limit_new_lawn (rules/audiences.ts). */
export function newLawnWateringForHomeowner(ctx: PlanContext): { message: string; reason: string } | null {
  const restricted = newLawnWateringRestricted(ctx);
  if (!restricted) return null;
  return { message: TEXT.newLawnHomeowner(weekdaysText(restricted.rules.watering?.allowedWeekdays ?? []), restricted.until), reason: TEXT.newLawnReason };
}
