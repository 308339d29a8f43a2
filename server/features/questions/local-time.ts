import { fromDayNumber, toDayNumber } from "#shared/engine/dates";
import { localMinutesAt } from "#shared/engine/zone-time";

const MS_PER_MINUTE = 60_000;
const MINUTES_PER_DAY = 1440;

/** The local date ("YYYY-MM-DD") in `zone` at an instant. */
export function localDateAt(zone: string, at: Date): string {
  return fromDayNumber(Math.floor(localMinutesAt(zone, at.getTime()) / MINUTES_PER_DAY));
}

/** The instant a local wall-clock time happens in `zone` (two passes settle the offset around changes). */
export function instantOfLocalTime(date: string, time: string, zone: string): Date {
  const [hours, minutes] = time.split(":").map(Number) as [number, number];
  const wallMinutes = toDayNumber(date) * MINUTES_PER_DAY + hours * 60 + minutes;
  let utcMinutes = wallMinutes;
  for (let pass = 0; pass < 2; pass += 1) {
    const offset = localMinutesAt(zone, utcMinutes * MS_PER_MINUTE) - utcMinutes;
    utcMinutes = wallMinutes - offset;
  }
  return new Date(utcMinutes * MS_PER_MINUTE);
}
