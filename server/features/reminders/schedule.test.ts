import { describe, expect, it } from "vitest";
import { localMomentAt, zonedTimeToUtc } from "./schedule.ts";

// Offsets and 2026 change dates from the IANA tz database (published): US clocks change on the second
// Sunday of March and the first Sunday of November at 02:00 local; the EU on the last Sundays of March
// and October at 01:00 UTC.
const iso = (date: Date) => date.toISOString().replace(".000", "");

describe("local wall-clock time to UTC", () => {
  it.each([
    // zone, date, time, expected UTC
    ["America/New_York", "2026-03-07", "08:00", "2026-03-07T13:00:00Z"], // EST, the day before
    ["America/New_York", "2026-03-08", "08:00", "2026-03-08T12:00:00Z"], // EDT, spring-forward day
    ["America/New_York", "2026-10-31", "08:00", "2026-10-31T12:00:00Z"], // EDT, the day before
    ["America/New_York", "2026-11-01", "08:00", "2026-11-01T13:00:00Z"], // EST, fall-back day
    ["America/Los_Angeles", "2026-03-08", "08:00", "2026-03-08T15:00:00Z"],
    ["America/Los_Angeles", "2026-11-01", "08:00", "2026-11-01T16:00:00Z"],
    ["Europe/Berlin", "2026-03-28", "08:00", "2026-03-28T07:00:00Z"], // CET
    ["Europe/Berlin", "2026-03-29", "08:00", "2026-03-29T06:00:00Z"], // CEST
    ["Europe/Berlin", "2026-10-25", "08:00", "2026-10-25T07:00:00Z"], // CET again
    ["Australia/Sydney", "2026-10-04", "08:00", "2026-10-03T21:00:00Z"], // southern spring forward (AEDT)
  ])("%s %s %s → %s", (zone, date, time, expected) => {
    expect(iso(zonedTimeToUtc(date, time, zone))).toBe(expected);
  });

  it("moves a time inside the spring-forward gap to the first minute after it", () => {
    // 02:30 does not happen in New York on 2026-03-08: clocks go 01:59 EST → 03:00 EDT (07:00Z).
    expect(iso(zonedTimeToUtc("2026-03-08", "02:30", "America/New_York"))).toBe("2026-03-08T07:00:00Z");
    expect(iso(zonedTimeToUtc("2026-03-08", "02:00", "America/Los_Angeles"))).toBe("2026-03-08T10:00:00Z");
    // Berlin skips 02:00–02:59 on 2026-03-29 (01:00Z).
    expect(iso(zonedTimeToUtc("2026-03-29", "02:30", "Europe/Berlin"))).toBe("2026-03-29T01:00:00Z");
  });

  it("takes the first of the two occurrences when clocks fall back", () => {
    // 01:30 happens twice in New York on 2026-11-01: 05:30Z (EDT) and 06:30Z (EST).
    expect(iso(zonedTimeToUtc("2026-11-01", "01:30", "America/New_York"))).toBe("2026-11-01T05:30:00Z");
    expect(iso(zonedTimeToUtc("2026-11-01", "01:30", "America/Los_Angeles"))).toBe("2026-11-01T08:30:00Z");
    // 02:30 happens twice in Berlin on 2026-10-25: 00:30Z (CEST) and 01:30Z (CET).
    expect(iso(zonedTimeToUtc("2026-10-25", "02:30", "Europe/Berlin"))).toBe("2026-10-25T00:30:00Z");
  });

  it("round-trips every quarter hour of both change days", () => {
    for (const [zone, days] of [["America/New_York", ["2026-03-08", "2026-11-01"]], ["Europe/Berlin", ["2026-03-29", "2026-10-25"]]] as const) {
      for (const date of days) {
        for (let m = 0; m < 1440; m += 15) {
          const time = `${String(Math.floor(m / 60)).padStart(2, "0")}:${String(m % 60).padStart(2, "0")}`;
          const local = localMomentAt(zonedTimeToUtc(date, time, zone), zone);
          expect(local.date).toBe(date);
          // Only times inside the gap come back different, and then later.
          expect(local.time >= time).toBe(true);
        }
      }
    }
  });

  it("reads the wall clock at an instant", () => {
    expect(localMomentAt(new Date("2026-11-01T05:30:00Z"), "America/New_York")).toEqual({ date: "2026-11-01", time: "01:30", minuteOfDay: 90 });
    expect(localMomentAt(new Date("2026-11-01T06:30:00Z"), "America/New_York")).toEqual({ date: "2026-11-01", time: "01:30", minuteOfDay: 90 });
    expect(localMomentAt(new Date("2026-12-01T23:30:00Z"), "Europe/Berlin").date).toBe("2026-12-02");
  });
});
