import { describe, expect, it } from "vitest";
import { isRealLocalTime, isValidTimeZone, nearestRealLocalTime } from "./zone-time.ts";

// Clock-change dates are from the zones' rules as shipped in Node's ICU data:
// US second Sunday of March / first Sunday of November, EU last Sunday of
// March / October, New South Wales first Sunday of October / April.
describe("isRealLocalTime across daylight-saving changes", () => {
  it("America/New_York: 02:30 does not exist on 2026-03-08, 01:30 and 03:30 do", () => {
    expect(isRealLocalTime("2026-03-08", "02:30", "America/New_York")).toBe(false);
    expect(isRealLocalTime("2026-03-08", "01:30", "America/New_York")).toBe(true);
    expect(isRealLocalTime("2026-03-08", "03:30", "America/New_York")).toBe(true);
    expect(isRealLocalTime("2026-03-09", "02:30", "America/New_York")).toBe(true);
  });

  it("America/New_York: 01:30 on the autumn change (2026-11-01) happens (twice) and is real", () => {
    expect(isRealLocalTime("2026-11-01", "01:30", "America/New_York")).toBe(true);
  });

  it("Europe/Berlin: 02:30 does not exist on 2026-03-29; 02:30 on 2026-10-25 does", () => {
    expect(isRealLocalTime("2026-03-29", "02:30", "Europe/Berlin")).toBe(false);
    expect(isRealLocalTime("2026-03-29", "03:00", "Europe/Berlin")).toBe(true);
    expect(isRealLocalTime("2026-10-25", "02:30", "Europe/Berlin")).toBe(true);
  });

  it("Australia/Sydney: 02:30 does not exist on 2026-10-04 (spring, southern hemisphere); 02:30 on 2026-04-05 does", () => {
    expect(isRealLocalTime("2026-10-04", "02:30", "Australia/Sydney")).toBe(false);
    expect(isRealLocalTime("2026-04-05", "02:30", "Australia/Sydney")).toBe(true);
  });

  it("Australia/Lord_Howe: a half-hour change skips only 02:00–02:29 on 2026-10-04", () => {
    expect(isRealLocalTime("2026-10-04", "02:15", "Australia/Lord_Howe")).toBe(false);
    expect(isRealLocalTime("2026-10-04", "02:30", "Australia/Lord_Howe")).toBe(true);
  });

  it("is false for malformed times, dates and zones instead of throwing", () => {
    expect(isRealLocalTime("2026-03-08", "24:00", "America/New_York")).toBe(false);
    expect(isRealLocalTime("2026-02-30", "07:00", "America/New_York")).toBe(false);
    expect(isRealLocalTime("2026-03-08", "07:00", "Mars/Olympus_Mons")).toBe(false);
  });
});

describe("nearestRealLocalTime", () => {
  it("moves a start inside the New York gap to the first real quarter-hour (03:00), leaves others alone", () => {
    expect(nearestRealLocalTime("2026-03-08", "02:30", "America/New_York")).toBe("03:00");
    expect(nearestRealLocalTime("2026-03-08", "07:00", "America/New_York")).toBe("07:00");
    expect(isRealLocalTime("2026-03-08", nearestRealLocalTime("2026-03-08", "02:00", "America/New_York"), "America/New_York")).toBe(true);
  });
});

describe("isValidTimeZone", () => {
  it("accepts IANA names and rejects made-up ones", () => {
    expect(isValidTimeZone("Europe/Berlin")).toBe(true);
    expect(isValidTimeZone("UTC")).toBe(true);
    expect(isValidTimeZone("Europe/Atlantis")).toBe(false);
    expect(isValidTimeZone("")).toBe(false);
  });
});

describe("isRealLocalTime agrees with a brute-force Intl round trip", () => {
  // Oracle: a wall time is real when some instant formats back to exactly it.
  // Independent of the engine's gap table; slow, so only used here.
  function realByRoundTrip(date: string, time: string, zone: string): boolean {
    const format = new Intl.DateTimeFormat("en-CA", {
      timeZone: zone,
      hourCycle: "h23",
      year: "numeric",
      month: "2-digit",
      day: "2-digit",
      hour: "2-digit",
      minute: "2-digit",
    });
    const asUtc = Date.parse(`${date}T${time}:00Z`);
    for (let offsetMinutes = -14 * 60; offsetMinutes <= 14 * 60; offsetMinutes += 15) {
      const parts = Object.fromEntries(format.formatToParts(asUtc - offsetMinutes * 60_000).map((p) => [p.type, p.value]));
      if (`${parts.year}-${parts.month}-${parts.day}` === date && `${parts.hour}:${parts.minute}` === time) return true;
    }
    return false;
  }

  it("for early-morning times on every day around the 2026 changes in New York, Berlin, Sydney and Lord Howe", () => {
    const cases: [string, string[]][] = [
      ["America/New_York", ["2026-03-07", "2026-03-08", "2026-03-09", "2026-10-31", "2026-11-01"]],
      ["Europe/Berlin", ["2026-03-28", "2026-03-29", "2026-03-30", "2026-10-25"]],
      ["Australia/Sydney", ["2026-04-05", "2026-10-03", "2026-10-04", "2026-10-05"]],
      ["Australia/Lord_Howe", ["2026-04-05", "2026-10-04"]],
    ];
    for (const [zone, dates] of cases) {
      for (const date of dates) {
        for (let minutes = 0; minutes < 5 * 60; minutes += 15) {
          const time = `${String(Math.floor(minutes / 60)).padStart(2, "0")}:${String(minutes % 60).padStart(2, "0")}`;
          expect(isRealLocalTime(date, time, zone), `${zone} ${date} ${time}`).toBe(realByRoundTrip(date, time, zone));
        }
      }
    }
  });
});
