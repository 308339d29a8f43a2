import type { ICalTemporalPlainDateStub, ICalTemporalPlainDateTimeStub, ICalTemporalZonedDateTimeStub } from "ical-generator";
import { instantOfWallClock } from "./zone-offsets.ts";

/**
 * A local wall-clock time for ical-generator, so a timed event prints as
 * `DTSTART;TZID=<zone>:20261005T060000`. Plain JS Dates would be formatted with the server
 * process's own time zone; Node 20 has no Temporal, so this passes the small Temporal-shaped
 * objects ical-generator accepts (its ICalTemporal*Stub types). Only the fields and methods
 * ical-generator calls are real.
 */
export function wallClock(date: string, time: string, zone: string): ICalTemporalPlainDateTimeStub {
  const [year, month, day] = date.split("-").map(Number) as [number, number, number];
  const [hour, minute] = time.split(":").map(Number) as [number, number];
  const iso = `${date}T${time}:00`;
  const wallAsUtcMs = Date.UTC(year, month - 1, day, hour, minute);

  const plainDate: ICalTemporalPlainDateStub & { toPlainDateTime(): ICalTemporalPlainDateTimeStub } = {
    year, month, day,
    toJSON: () => date,
    toString: () => date,
    toPlainDateTime: () => plain,
  };
  const plain: ICalTemporalPlainDateTimeStub = {
    year, month, day, hour, minute, second: 0,
    toJSON: () => iso,
    toString: () => iso,
    toPlainDate: () => plainDate,
    toZonedDateTime: () => zoned,
  };
  const zoned: ICalTemporalZonedDateTimeStub = {
    year, month, day, hour, minute, second: 0,
    timeZoneId: zone,
    toJSON: () => `${iso}[${zone}]`,
    toString: () => `${iso}[${zone}]`,
    toPlainDateTime: () => plain,
    withTimeZone: () => zoned,
    toInstant: () => {
      const epochMilliseconds = instantOfWallClock(zone, wallAsUtcMs);
      const text = new Date(epochMilliseconds).toISOString();
      return { epochMilliseconds, toJSON: () => text, toString: () => text, toZonedDateTimeISO: () => zoned };
    },
  };
  return plain;
}
