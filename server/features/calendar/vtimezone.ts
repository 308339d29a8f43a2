import { offsetChanges, offsetMinutesAt } from "./zone-offsets.ts";

const MS_PER_MINUTE = 60_000;

const pad = (n: number, width = 2) => String(n).padStart(width, "0");

/** RFC 5545 UTC-OFFSET: "+HHMM" / "-HHMM". */
function utcOffset(minutes: number): string {
  const abs = Math.abs(minutes);
  return `${minutes < 0 ? "-" : "+"}${pad(Math.floor(abs / 60))}${pad(abs % 60)}`;
}

/** Local date-time (no zone designator) of an instant, given the offset in force. */
function localStamp(epochMs: number, offsetMinutes: number): string {
  const d = new Date(epochMs + offsetMinutes * MS_PER_MINUTE);
  return `${d.getUTCFullYear()}${pad(d.getUTCMonth() + 1)}${pad(d.getUTCDate())}T${pad(d.getUTCHours())}${pad(d.getUTCMinutes())}${pad(d.getUTCSeconds())}`;
}

/**
 * A VTIMEZONE for `zone` covering the given years, built from the zone rules Node's Intl
 * knows. Each offset change is listed as its own observance (no RRULE), which RFC 5545
 * allows and every client reads, and which stays right in years when a zone changed its rules.
 */
export function buildVTimezone(zone: string, fromYear: number, toYear: number): string {
  // From local midnight on 1 January of the first year to the end of the last.
  const approxStart = Date.UTC(fromYear, 0, 1);
  const initial = offsetMinutesAt(zone, approxStart);
  const startMs = approxStart - initial * MS_PER_MINUTE;
  const endMs = Date.UTC(toYear + 1, 0, 2);
  const changes = offsetChanges(zone, startMs, endMs);
  const standard = Math.min(initial, ...changes.map((c) => c.toMinutes));
  const observance = (onsetLocal: string, from: number, to: number) => {
    const kind = to > standard ? "DAYLIGHT" : "STANDARD";
    return [`BEGIN:${kind}`, `DTSTART:${onsetLocal}`, `TZOFFSETFROM:${utcOffset(from)}`, `TZOFFSETTO:${utcOffset(to)}`, `END:${kind}`];
  };
  return [
    "BEGIN:VTIMEZONE",
    `TZID:${zone}`,
    `X-LIC-LOCATION:${zone}`,
    // The offset already in force when the range starts, so times before the first change resolve too.
    ...observance(localStamp(startMs, initial), initial, initial),
    // DTSTART of an observance is the local time just before the change, in the old offset.
    ...changes.flatMap((c) => observance(localStamp(c.atMs, c.fromMinutes), c.fromMinutes, c.toMinutes)),
    "END:VTIMEZONE",
  ].join("\r\n");
}
