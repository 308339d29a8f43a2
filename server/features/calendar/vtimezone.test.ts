import { describe, expect, it } from "vitest";
import ICAL from "ical.js";
import { buildVTimezone } from "./vtimezone.ts";

/** Wall-clock time in `zone` → UTC, through ical.js reading our VTIMEZONE. */
function toUtc(zone: string, local: string, vtimezone: string): string {
  const tz = new ICAL.Timezone(new ICAL.Component(ICAL.parse(vtimezone)));
  const time = ICAL.Time.fromDateTimeString(local);
  time.zone = tz;
  return time.toJSDate().toISOString();
}

describe("VTIMEZONE from Intl zone rules", () => {
  it("New York: both changes of 2026", () => {
    const vtz = buildVTimezone("America/New_York", 2026, 2026);
    expect(vtz.match(/BEGIN:DAYLIGHT/g)).toHaveLength(1);
    expect(toUtc("America/New_York", "2026-01-15T06:00:00", vtz)).toBe("2026-01-15T11:00:00.000Z");
    expect(toUtc("America/New_York", "2026-07-15T06:00:00", vtz)).toBe("2026-07-15T10:00:00.000Z");
    expect(toUtc("America/New_York", "2026-12-15T06:00:00", vtz)).toBe("2026-12-15T11:00:00.000Z");
  });

  it("southern hemisphere and zones without daylight time", () => {
    const sydney = buildVTimezone("Australia/Sydney", 2026, 2027);
    expect(toUtc("Australia/Sydney", "2026-01-15T06:00:00", sydney)).toBe("2026-01-14T19:00:00.000Z");
    expect(toUtc("Australia/Sydney", "2026-07-15T06:00:00", sydney)).toBe("2026-07-14T20:00:00.000Z");
    const phoenix = buildVTimezone("America/Phoenix", 2026, 2026);
    expect(phoenix).not.toContain("DAYLIGHT");
    expect(toUtc("America/Phoenix", "2026-07-15T06:00:00", phoenix)).toBe("2026-07-15T13:00:00.000Z");
  });
});
