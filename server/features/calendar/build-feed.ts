import ical, { ICalEventTransparency } from "ical-generator";
import { addDays } from "#shared/engine/dates";
import { wateringsOf } from "#shared/engine/waterings";
import { holdOffSchema, type StoredHoldOff } from "#shared/schemas/plans";
import { followUpReasonLabels, type FollowUpReason } from "#shared/schemas/follow-ups";
import type { FeedPlan, FeedStep, FeedVisit } from "./repo.ts";
import { buildVTimezone } from "./vtimezone.ts";
import { wallClock } from "./wall-clock.ts";

export type FeedInput = { companyName: string; plans: readonly FeedPlan[]; steps: readonly FeedStep[]; visits?: readonly FeedVisit[] };

/** Calendar apps poll subscribed feeds; a few hours is what they honour anyway. */
const REFRESH_SECONDS = 4 * 60 * 60;
/** When a watering step gives no minutes per cycle, show a short slot rather than none. */
const DEFAULT_CYCLE_MINUTES = 15;

const holdOffTitles: Record<string, string> = {
  weed_and_feed: "No weed-and-feed",
  broadleaf_herbicide: "No broadleaf weed killer",
  crabgrass_pre_emergent: "No crabgrass pre-emergent",
  high_n_quick_release: "No high-nitrogen quick-release feed",
  heavy_traffic: "Keep heavy traffic off the new grass",
  new_seed: "No more seed: the earlier weed preventer may still be active",
};
const holdOffTitle = (kind: string) => holdOffTitles[kind] ?? `Hold off: ${kind.replaceAll("_", " ")}`;

function stepDescription(content: Record<string, unknown>): string | null {
  const parts: string[] = [];
  if (typeof content.detail === "string") parts.push(content.detail);
  const why = content.why as { text?: unknown; source?: unknown } | undefined;
  if (why && typeof why.text === "string") parts.push(`Why: ${why.text}${typeof why.source === "string" ? ` (${why.source})` : ""}`);
  return parts.length > 0 ? parts.join("\n\n") : null;
}

const isClock = (t: unknown): t is string => typeof t === "string" && /^([01]\d|2[0-3]):[0-5]\d$/.test(t);

function wateringTimes(content: Record<string, unknown>): string[] {
  const times = content.times;
  return Array.isArray(times) ? times.filter(isClock) : [];
}

/** Stored cycle-and-soak (slopes), when it is whole enough to group the runs by watering. */
function cycleAndSoakOf(content: Record<string, unknown>): { runsPerCycle: number; soakMinutes: number; cycleStarts: string[] } | undefined {
  const c = content.cycleAndSoak as { runsPerCycle?: unknown; soakMinutes?: unknown; cycleStarts?: unknown } | undefined;
  if (!c || typeof c.runsPerCycle !== "number" || typeof c.soakMinutes !== "number" || !Array.isArray(c.cycleStarts)) return undefined;
  const cycleStarts = c.cycleStarts.filter(isClock);
  return cycleStarts.length > 0 ? { runsPerCycle: c.runsPerCycle, soakMinutes: c.soakMinutes, cycleStarts } : undefined;
}

/** "In 4 short runs of 2 minutes, about 30 minutes apart to soak in: 7:00, 7:32, 8:04, 8:36." */
const runsLine = (runs: readonly string[], minutes: number, soak: number) =>
  `In ${runs.length} short runs of ${minutes} ${minutes === 1 ? "minute" : "minutes"} for each zone or spot, with about ${soak} minutes' pause between runs so the water soaks in instead of running down the slope. Start each run at ${runs.map(clockLabel).join(", ")}.`;

/** "7:00 am" for "07:00": calendar descriptions are plain text. */
function clockLabel(time: string): string {
  const [h, m] = time.split(":").map(Number) as [number, number];
  return `${h % 12 === 0 ? 12 : h % 12}:${String(m).padStart(2, "0")} ${h < 12 ? "am" : "pm"}`;
}

/** "HH:MM" plus minutes, kept on the same day (a cycle is never longer than the evening). */
function addMinutes(time: string, minutes: number): string {
  const [h, m] = time.split(":").map(Number) as [number, number];
  const total = Math.min(h * 60 + m + Math.max(1, Math.round(minutes)), 23 * 60 + 59);
  return `${String(Math.floor(total / 60)).padStart(2, "0")}:${String(total % 60).padStart(2, "0")}`;
}

const yearOf = (date: string) => Number(date.slice(0, 4));

/**
 * The homeowner's care plans as an iCalendar feed (RFC 5545): an all-day event per daily
 * step, a timed event per watering (on a slope spanning its short runs) (in the lawn's own time zone, with its VTIMEZONE),
 * and each hold-off window as a multi-day all-day event. UIDs come from the steps' stable
 * keys, so a recomputed plan updates events in place instead of duplicating them.
 */
/*
 * The reason, then where it comes from. A value still marked "from memory" was recalled, not
 * re-read, so it is never cited to a homeowner (the portal's "Why?" does the same).
 */
function holdOffDescription(holdOff: StoredHoldOff): string {
  const basis = holdOff.provenance === "from memory" ? "Based on common lawn-care practice." : `Source: ${holdOff.source}.`;
  return `${holdOff.why}\n\n${basis} Always read and follow the product label.`;
}

export function buildFeed(input: FeedInput): string {
  const holdOffs = input.plans.flatMap((plan) =>
    plan.holdOffs.flatMap((raw) => {
      const parsed = holdOffSchema.safeParse(raw);
      return parsed.success ? [{ plan, holdOff: parsed.data as StoredHoldOff }] : [];
    }),
  );
  const visits = input.visits ?? [];
  const years = [...input.steps.map((s) => yearOf(s.date)), ...visits.map((v) => yearOf(v.date)), ...holdOffs.flatMap(({ holdOff }) => [yearOf(holdOff.start), yearOf(holdOff.end)])];
  const fromYear = years.length ? Math.min(...years) : new Date().getUTCFullYear();
  const toYear = years.length ? Math.max(...years) : fromYear;

  const calendar = ical({
    name: `${input.companyName} – lawn care plan`,
    description: `Your day-by-day lawn care steps from ${input.companyName}.`,
    prodId: { company: "Sproutline", product: "care-plan", language: "EN" },
    // No calendar-wide zone: each timed event names its lawn's zone; the generator adds its VTIMEZONE.
    timezone: { name: null, generator: (zone) => buildVTimezone(zone, fromYear, toYear) },
    ttl: REFRESH_SECONDS,
  });
  const plansById = new Map(input.plans.map((p) => [p.planId, p]));

  for (const step of input.steps) {
    const plan = plansById.get(step.planId);
    if (!plan) continue;
    const common = {
      summary: step.title,
      description: stepDescription(step.content),
      location: plan.street,
      transparency: ICalEventTransparency.TRANSPARENT,
    };
    const times = wateringTimes(step.content);
    if (times.length === 0) {
      calendar.createEvent({ ...common, id: `${step.planId}.${step.key}@sproutline`, allDay: true, start: step.date, end: addDays(step.date, 1) });
      continue;
    }
    const minutes = typeof step.content.minutesPerCycle === "number" ? step.content.minutesPerCycle : DEFAULT_CYCLE_MINUTES;
    // On a slope one event per watering, from its first run to the end of its last, its runs in the description.
    const cycleAndSoak = cycleAndSoakOf(step.content);
    for (const { start, runs } of wateringsOf({ times, cycleAndSoak })) {
      const last = runs[runs.length - 1]!;
      const description = cycleAndSoak && runs.length > 1 ? [runsLine(runs, minutes, cycleAndSoak.soakMinutes), common.description].filter(Boolean).join("\n\n") : common.description;
      calendar.createEvent({
        ...common,
        description,
        id: `${step.planId}.${step.key}.${start.replace(":", "")}@sproutline`,
        timezone: plan.timeZone,
        start: wallClock(step.date, start, plan.timeZone),
        end: wallClock(step.date, addMinutes(last, minutes), plan.timeZone),
      });
    }
  }

  for (const { plan, holdOff } of holdOffs) {
    calendar.createEvent({
      id: `${plan.planId}.hold-off.${holdOff.kind}.${holdOff.start}@sproutline`,
      summary: holdOffTitle(holdOff.kind),
      description: holdOffDescription(holdOff),
      location: plan.street,
      allDay: true,
      start: holdOff.start,
      // All-day DTEND is exclusive; the hold-off's end date is its last day.
      end: addDays(holdOff.end, 1),
      transparency: ICalEventTransparency.TRANSPARENT,
    });
  }
  for (const visit of visits) addVisit(calendar, input.companyName, visit);
  return calendar.toString();
}

function visitDescription(companyName: string, visit: FeedVisit): string {
  const reason = followUpReasonLabels[visit.reason as FollowUpReason] ?? visit.reason;
  const parts = [`${visit.technicianName ? `${visit.technicianName} from ${companyName}` : companyName} comes back to look at the lawn (${reason.toLowerCase()}).`];
  if (visit.customerPrep) parts.push(`Before the visit: ${visit.customerPrep}`);
  return parts.join("\n\n");
}

/**
 * A booked follow-up visit: a timed event over the arrival window in the lawn's zone, or an
 * all-day event while no window is set. Busy, unlike plan steps: someone has to be there.
 */
function addVisit(calendar: ReturnType<typeof ical>, companyName: string, visit: FeedVisit) {
  const common = {
    id: `follow-up.${visit.id}@sproutline`,
    summary: `Lawn visit from ${companyName}`,
    description: visitDescription(companyName, visit),
    location: visit.street,
    transparency: ICalEventTransparency.OPAQUE,
  };
  if (visit.arrivalStart && visit.arrivalEnd) {
    calendar.createEvent({
      ...common,
      timezone: visit.timeZone,
      start: wallClock(visit.date, visit.arrivalStart, visit.timeZone),
      end: wallClock(visit.date, visit.arrivalEnd, visit.timeZone),
    });
  } else {
    calendar.createEvent({ ...common, allDay: true, start: visit.date, end: addDays(visit.date, 1) });
  }
}
