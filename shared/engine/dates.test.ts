import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { addDays, daysBetween, fromDayNumber, isValidIsoDate, localTimeFromMinutes, minutesOfLocalTime, toDayNumber } from "./dates.ts";

describe("calendar-date arithmetic", () => {
  it("agrees with Date.UTC's day count for any day from 1900 to 2200 (independent implementation)", () => {
    fc.assert(
      fc.property(fc.integer({ min: -25_567, max: 84_000 }), (dayNumber) => {
        const viaUtc = new Date(dayNumber * 86_400_000).toISOString().slice(0, 10);
        expect(fromDayNumber(dayNumber)).toBe(viaUtc);
        expect(toDayNumber(viaUtc)).toBe(dayNumber);
      }),
    );
  });

  it("adds days across a spring-forward weekend without losing or repeating a day", () => {
    // 2026-03-08 is the US clock change; calendar days are unaffected.
    expect(addDays("2026-03-07", 1)).toBe("2026-03-08");
    expect(addDays("2026-03-08", 1)).toBe("2026-03-09");
    expect(daysBetween("2026-03-01", "2026-04-01")).toBe(31);
  });

  it("knows leap years (2028 yes, 2100 no, 2000 yes)", () => {
    expect(addDays("2028-02-28", 1)).toBe("2028-02-29");
    expect(addDays("2100-02-28", 1)).toBe("2100-03-01");
    expect(isValidIsoDate("2000-02-29")).toBe(true);
    expect(isValidIsoDate("2100-02-29")).toBe(false);
  });

  it("parses exactly the texts the YYYY-MM-DD pattern accepts (independent check with the regex)", () => {
    const pattern = /^(\d{4})-(\d{2})-(\d{2})$/;
    const texts = ["2026-09-10", "2026-9-10", "2026-09-1a", "２０２６-09-10", "2026/09/10", "2026-09-10 ", "2026-02-29", "2028-02-29", "-026-09-10", "2026-13-01", "2026-00-10", "a026-09-10"];
    for (const text of texts) {
      const match = pattern.exec(text);
      const valid = match !== null && isValidIsoDate(text);
      if (valid) expect(toDayNumber(text)).toBe(Math.round(Date.UTC(Number(match[1]), Number(match[2]) - 1, Number(match[3])) / 86_400_000));
      else expect(() => toDayNumber(text)).toThrow(RangeError);
    }
  });

  it("reads exactly the HH:MM texts the local-time pattern accepts (independent check with the regex)", () => {
    const pattern = /^([01]\d|2[0-3]):([0-5]\d)$/;
    const texts = ["00:00", "06:00", "23:59", "24:00", "19:60", "9:00", "09:0", "09-00", "0a:00", "09:00 ", "２3:00", "12:5x"];
    for (let minute = 0; minute < 1440; minute += 7) texts.push(localTimeFromMinutes(minute));
    for (const text of texts) {
      const match = pattern.exec(text);
      if (match) expect(minutesOfLocalTime(text)).toBe(Number(match[1]) * 60 + Number(match[2]));
      else expect(() => minutesOfLocalTime(text)).toThrow(RangeError);
    }
  });

  it("rejects malformed and impossible dates", () => {
    for (const bad of ["2026-13-01", "2026-04-31", "2026-4-1", "20260401", "", "2026-02-30T00:00"]) {
      expect(isValidIsoDate(bad)).toBe(false);
    }
    expect(() => toDayNumber("2026-02-30")).toThrow(RangeError);
  });
});
