import { fromDayNumber, localTimeFromMinutes, minutesOfLocalTime, toDayNumber } from "#shared/engine/dates";
import { localMinutesAt } from "#shared/engine/zone-time";

/*
 * Wall-clock time in a property's IANA zone ⇄ instants, with the two daylight-saving cases decided
 * the way a homeowner would expect:
 *  - spring forward (a wall time that never happens, e.g. 02:30 in New York on the second Sunday
 *    of March): the reminder goes at the first minute that does happen, the end of the gap (03:00);
 *  - fall back (a wall time that happens twice, e.g. 01:30 on the first Sunday of November): the
 *    first occurrence, so a reminder is never an hour late.
 * Intl (through shared/engine/zone-time) is the only source of zone rules; nothing here reads the
 * server's own zone.
 */

const MS_PER_MINUTE = 60_000;
const MINUTES_PER_DAY = 1440;
const TWO_DAYS_MS = 2 * 86_400_000;

/** UTC offset in minutes (local minus UTC) at an instant. */
function offsetAt(zone: string, epochMs: number): number {
  const minute = Math.floor(epochMs / MS_PER_MINUTE);
  return localMinutesAt(zone, minute * MS_PER_MINUTE) - minute;
}

/** The instant at which local date `date` ("YYYY-MM-DD"), time `time` ("HH:MM") happens in `zone`. */
export function zonedTimeToUtc(date: string, time: string, zone: string): Date {
  const wanted = toDayNumber(date) * MINUTES_PER_DAY + minutesOfLocalTime(time);
  const naive = wanted * MS_PER_MINUTE;
  // Every offset in force within two days either side; a zone changes at most once in that span.
  const offsets = [...new Set([offsetAt(zone, naive - TWO_DAYS_MS), offsetAt(zone, naive), offsetAt(zone, naive + TWO_DAYS_MS)])];
  const matches = offsets.map((o) => wanted - o).filter((minute) => localMinutesAt(zone, minute * MS_PER_MINUTE) === wanted);
  if (matches.length > 0) return new Date(Math.min(...matches) * MS_PER_MINUTE);

  // In a gap: local time jumps past `wanted`. Find the first instant whose wall clock is at or after it.
  let low = wanted - Math.max(...offsets);
  let high = wanted - Math.min(...offsets);
  while (high - low > 1) {
    const mid = Math.floor((low + high) / 2);
    if (localMinutesAt(zone, mid * MS_PER_MINUTE) >= wanted) high = mid;
    else low = mid;
  }
  return new Date(high * MS_PER_MINUTE);
}

export type LocalMoment = { date: string; time: string; minuteOfDay: number };

/** The wall clock in `zone` at an instant, to the minute. */
export function localMomentAt(instant: Date, zone: string): LocalMoment {
  const minutes = localMinutesAt(zone, instant.getTime());
  const day = Math.floor(minutes / MINUTES_PER_DAY);
  const minuteOfDay = minutes - day * MINUTES_PER_DAY;
  return { date: fromDayNumber(day), time: localTimeFromMinutes(minuteOfDay), minuteOfDay };
}
