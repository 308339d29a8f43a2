import { civilFromDays, daysFromCivil, isValidIsoDate, isValidLocalTime, localTimeFromMinutes, minutesOfLocalTime, toDayNumber } from "./dates.ts";

/*
 * Watering times are wall-clock times in the property's zone. On the night
 * clocks spring forward some wall times never happen (02:30 in New York on the
 * second Sunday of March); a reminder for such a time would fire at a
 * surprising hour or not at all. Intl is the only source of zone rules here,
 * so this module asks it once per zone and year for that year's offset
 * changes and remembers the "gaps" (wall-clock minutes that are skipped).
 * Checking a time is then plain arithmetic. The cache is pure memoisation:
 * a zone's rules for a given year do not change while the process runs.
 */

const MS_PER_MINUTE = 60_000;
const MS_PER_DAY = 86_400_000;
const MINUTES_PER_DAY = 1440;
const formatters = new Map<string, Intl.DateTimeFormat>();

function formatterFor(zone: string): Intl.DateTimeFormat {
  let formatter = formatters.get(zone);
  if (!formatter) {
    formatter = new Intl.DateTimeFormat("en-US", {
      timeZone: zone,
      hourCycle: "h23",
      year: "numeric",
      month: "numeric",
      day: "numeric",
      hour: "numeric",
      minute: "numeric",
    });
    formatters.set(zone, formatter);
  }
  return formatter;
}

export function isValidTimeZone(zone: unknown): zone is string {
  if (typeof zone !== "string" || zone.length === 0) return false;
  if (formatters.has(zone)) return true;
  try {
    formatterFor(zone);
    return true;
  } catch {
    return false;
  }
}

/** Wall clock at an instant, as minutes since 1970-01-01 00:00 local. */
export function localMinutesAt(zone: string, epochMs: number): number {
  const fields: Record<string, number> = {};
  for (const part of formatterFor(zone).formatToParts(epochMs)) {
    if (part.type !== "literal") fields[part.type] = Number(part.value);
  }
  const dayNumber = daysFromCivil(fields.year ?? 1970, fields.month ?? 1, fields.day ?? 1);
  return dayNumber * MINUTES_PER_DAY + (fields.hour ?? 0) * 60 + (fields.minute ?? 0);
}

/** UTC offset in minutes at an instant (local wall clock minus UTC). */
function offsetMinutesAt(zone: string, epochMs: number): number {
  const minute = Math.floor(epochMs / MS_PER_MINUTE);
  return localMinutesAt(zone, minute * MS_PER_MINUTE) - minute;
}

/** A run of wall-clock minutes that never happens: [start, end) in local minutes since the epoch. */
interface Gap {
  readonly start: number;
  readonly end: number;
}

const gapCache = new Map<string, Map<number, readonly Gap[]>>();

/**
 * The zone's spring-forward gaps during `year`. Samples the offset weekly and
 * bisects each change to the minute; two changes less than a week apart would
 * be missed, which no current zone does. Fall-back changes repeat an hour
 * instead of skipping one, so they leave every wall time real.
 */
function gapsInYear(zone: string, year: number): readonly Gap[] {
  let byYear = gapCache.get(zone);
  if (!byYear) {
    byYear = new Map();
    gapCache.set(zone, byYear);
  }
  const cached = byYear.get(year);
  if (cached) return cached;
  const gaps: Gap[] = [];
  const weekMs = 7 * MS_PER_DAY;
  const start = (daysFromCivil(year, 1, 1) - 2) * MS_PER_DAY;
  let previousAt = start;
  let previousOffset = offsetMinutesAt(zone, start);
  for (let at = start + weekMs; at <= start + 54 * weekMs; at += weekMs) {
    const offset = offsetMinutesAt(zone, at);
    if (offset !== previousOffset) {
      let low = previousAt;
      let high = at;
      while (high - low > MS_PER_MINUTE) {
        const mid = Math.floor((low + high) / 2 / MS_PER_MINUTE) * MS_PER_MINUTE;
        if (offsetMinutesAt(zone, mid) === previousOffset) low = mid;
        else high = mid;
      }
      if (offset > previousOffset) {
        const changeMinute = high / MS_PER_MINUTE;
        gaps.push({ start: changeMinute + previousOffset, end: changeMinute + offset });
      }
    }
    previousAt = at;
    previousOffset = offset;
  }
  byYear.set(year, gaps);
  return gaps;
}

/** Local days (around 1 January of the year) a year's scan can find gaps in, with a day's margin each side. */
const YEAR_SCAN_FIRST_DAY = 4;
const YEAR_SCAN_LAST_DAY = 54 * 7 + 4;

/** Gaps that touch local days `fromDay`..`toDay` (day numbers, inclusive). */
function gapsBetween(zone: string, fromDay: number, toDay: number): Gap[] {
  const firstMinute = fromDay * MINUTES_PER_DAY;
  const lastMinute = (toDay + 1) * MINUTES_PER_DAY;
  const out: Gap[] = [];
  // A gap can sit in the neighbouring year only around New Year's midnight.
  for (let y = civilFromDays(fromDay).year - 1; y <= civilFromDays(toDay).year + 1; y++) {
    // gapsInYear(y) samples from 2 days before 1 January for 54 weeks, and offsets are under a
    // day: its gaps all lie within these local days. A year that cannot reach the plan's days is
    // skipped rather than asked of Intl (same answer, fewer Intl calls on a cold start).
    const newYear = daysFromCivil(y, 1, 1);
    if (newYear + YEAR_SCAN_LAST_DAY < fromDay || newYear - YEAR_SCAN_FIRST_DAY > toDay) continue;
    for (const gap of gapsInYear(zone, y)) if (gap.end > firstMinute && gap.start < lastMinute) out.push(gap);
  }
  return out;
}

const isOutsideGaps = (gaps: readonly Gap[], wanted: number) => {
  for (const gap of gaps) if (wanted >= gap.start && wanted < gap.end) return false;
  return true;
};

/** Clock questions for one plan's date range, answered without Intl after set-up. */
export interface ZoneClock {
  /** No wall-clock minute is skipped anywhere in the plan's days: every time is real as given. */
  readonly gapFree: boolean;
  isReal(dayNumber: number, minuteOfDay: number): boolean;
  /** The minute if real, else the first real quarter-hour after it that day. */
  nearestReal(dayNumber: number, minuteOfDay: number): number;
}

/*
 * A class rather than closures: one is made per plan, and under tsx (keepNames) every named
 * closure costs an Object.defineProperty when it is created.
 */
class GapClock implements ZoneClock {
  readonly gapFree: boolean;
  constructor(private readonly gaps: readonly Gap[]) {
    this.gapFree = gaps.length === 0;
  }

  isReal(dayNumber: number, minuteOfDay: number): boolean {
    return this.gapFree || isOutsideGaps(this.gaps, dayNumber * MINUTES_PER_DAY + minuteOfDay);
  }

  nearestReal(dayNumber: number, minuteOfDay: number): number {
    if (this.isReal(dayNumber, minuteOfDay)) return minuteOfDay;
    // Controllers run a start skipped by the clock change as soon as the clock allows.
    for (let m = minuteOfDay + 15; m < MINUTES_PER_DAY; m += 15) if (this.isReal(dayNumber, m)) return m;
    return minuteOfDay;
  }
}

export function zoneClock(zone: string, fromDay: number, toDay: number): ZoneClock {
  return new GapClock(gapsBetween(zone, fromDay, toDay));
}

function isRealLocalMinute(zone: string, dayNumber: number, minuteOfDay: number): boolean {
  return isOutsideGaps(gapsBetween(zone, dayNumber, dayNumber), dayNumber * MINUTES_PER_DAY + minuteOfDay);
}

/**
 * True when the wall-clock time `time` on local date `date` actually occurs in
 * `zone` (false inside a spring-forward gap, and for malformed input).
 */
export function isRealLocalTime(date: string, time: string, zone: string): boolean {
  if (!isValidIsoDate(date) || !isValidLocalTime(time) || !isValidTimeZone(zone)) return false;
  return isRealLocalMinute(zone, toDayNumber(date), minutesOfLocalTime(time));
}

/** The time if real, otherwise the first real quarter-hour after it on the same day. */
export function nearestRealLocalTime(date: string, time: string, zone: string): string {
  if (!isValidIsoDate(date) || !isValidLocalTime(time) || !isValidTimeZone(zone)) return time;
  const day = toDayNumber(date);
  return localTimeFromMinutes(zoneClock(zone, day, day).nearestReal(day, minutesOfLocalTime(time)));
}
